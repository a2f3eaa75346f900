import { describe, expect, it } from 'vitest';
import { isCrossSiteWrite } from '../../../src/lib/server/http/same-origin';

const app = 'http://127.0.0.1:4321';
const request = (method: string, headers: Record<string, string>) => new Request(`${app}/api/x`, { method, headers });

describe('cross-site write check', () => {
  it.each([
    ['POST from the app itself', request('POST', { origin: app }), false],
    ['POST from another site', request('POST', { origin: 'http://evil.example' }), true],
    ['POST from another port of the same host', request('POST', { origin: 'http://127.0.0.1:9999' }), true],
    ['DELETE from another site', request('DELETE', { origin: 'http://evil.example' }), true],
    ['POST by a script (no Origin, no fetch metadata)', request('POST', {}), false],
    ['POST from a browser marked cross-site without Origin', request('POST', { 'sec-fetch-site': 'cross-site' }), true],
    ['GET from another site (reads are not writes)', request('GET', { origin: 'http://evil.example' }), false],
  ])('%s → refused: %s', (_label, req, refused) => {
    expect(isCrossSiteWrite(req, app)).toBe(refused);
  });
});
