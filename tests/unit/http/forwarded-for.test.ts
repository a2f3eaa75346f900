import { describe, expect, it } from 'vitest';
import { trustedForwardedFor } from '../../../scripts/lib/forwarded.mjs';

describe('client address behind proxies', () => {
  it.each([
    ['no proxy trusted: a client-written header is ignored', '203.0.113.9', 0, null],
    ['one proxy: the entry it appended', '203.0.113.9, 198.51.100.7', 1, '198.51.100.7'],
    ['one proxy, client sent nothing: the proxy saw the client', '198.51.100.7', 1, '198.51.100.7'],
    ['two proxies: the outer one of the two', '203.0.113.9, 198.51.100.7, 10.0.0.2', 2, '198.51.100.7'],
    ['header shorter than the trusted chain', '198.51.100.7', 2, null],
    ['no header', undefined, 1, null],
  ])('%s', (_label, header, hops, expected) => {
    expect(trustedForwardedFor(header, hops)).toBe(expected);
  });
});
