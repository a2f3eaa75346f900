// The unit switch goes back only to a path on this site.
// source: RFC 3986 §3.3 (path characters), §4.2 (a "//" reference names another host);
// WHATWG URL Standard §4.4 (tab and newline are stripped, "\" is read as "/" in special URLs);
// OWASP Unvalidated Redirects and Forwards cheat sheet (allow-list the destination).
import { describe, expect, it } from 'vitest';
import { safeReturnPath } from '../../../src/lib/server/http/return-path';

describe('safeReturnPath', () => {
  it.each([
    ['/', '/'],
    ['/contribute', '/contribute'],
    ['/review/0190a8a0-1234-7abc-8def-0123456789ab?tab=records', '/review/0190a8a0-1234-7abc-8def-0123456789ab?tab=records'],
    ['/bank?q=clay%20estuarine&page=2', '/bank?q=clay%20estuarine&page=2'],
  ])('keeps the same-site path %s', (value, expected) => {
    expect(safeReturnPath(value)).toBe(expected);
  });

  it.each([
    ['another host', 'https://other.example/'],
    ['a scheme-relative reference', '//other.example/'],
    ['a backslash that browsers read as a slash', '/\\other.example/'],
    ['a tab that browsers strip', '/\t/other.example/'],
    ['a newline', '/x\ny'],
    ['a carriage return', '/x\rSet-Cookie:a=b'],
    ['a NUL', '/x\u0000'],
    ['a javascript: URL', 'javascript:alert(1)'],
    ['a relative path', 'contribute'],
    ['a non-ASCII character', '/bänk'],
    ['nothing', undefined],
    ['an empty string', ''],
  ])('sends %s home', (_label, value) => {
    expect(safeReturnPath(value)).toBe('/');
  });
});
