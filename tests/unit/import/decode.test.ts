import { describe, expect, it } from 'vitest';
import { decodeText, utf8Length } from '../../../src/lib/import/decode';
import { MAX_FILE_BYTES } from '../../../src/lib/import/limits';
import { parseCsv } from '../../../src/lib/import/parse-csv';
import { importErrorStatus } from '../../../src/lib/server/http/error-mapper';

const bytes = (...values: number[]) => new Uint8Array(values);
const utf8 = (text: string) => new TextEncoder().encode(text);

describe('decoding an upload', () => {
  it('refuses an empty file', () => {
    expect(decodeText(new Uint8Array())).toMatchObject({
      ok: false,
      error: { code: 'EMPTY_FILE', message: 'The file is empty.' },
    });
    expect(decodeText(utf8('  \r\n \n'))).toMatchObject({ ok: false, error: { code: 'EMPTY_FILE' } });
    expect(decodeText('')).toMatchObject({ ok: false, error: { code: 'EMPTY_FILE' } });
  });

  it('strips a UTF-8 byte-order mark', () => {
    expect(decodeText(bytes(0xef, 0xbb, 0xbf, 0x61, 0x2c, 0x62))).toEqual({ ok: true, text: 'a,b', byteLength: 6 });
    expect(decodeText('\uFEFFa,b')).toMatchObject({ ok: true, text: 'a,b' });
  });

  it('refuses binary content (NUL bytes)', () => {
    const result = decodeText(bytes(0x61, 0x2c, 0x62, 0x0a, 0x00, 0x13, 0x7f, 0x00, 0x31, 0x2c, 0x32));
    expect(result).toMatchObject({ ok: false, error: { code: 'BINARY_FILE' } });
    if (!result.ok) expect(result.error.message).toContain('not a text file');
  });

  it.each([
    ['little-endian with a mark', [0xff, 0xfe, 0x61, 0x00, 0x2c, 0x00, 0x62, 0x00]],
    ['big-endian with a mark', [0xfe, 0xff, 0x00, 0x61, 0x00, 0x2c, 0x00, 0x62]],
    ['little-endian without a mark', [...'Depth,LL\r\n1,2\r\n'].flatMap((c) => [c.charCodeAt(0), 0])],
  ])('refuses UTF-16 text (%s) asking for UTF-8 CSV', (_name, content) => {
    const result = decodeText(bytes(...content));
    expect(result).toMatchObject({ ok: false, error: { code: 'UTF16_FILE' } });
    if (!result.ok) expect(result.error.message).toContain('CSV UTF-8');
  });

  it('refuses an Excel workbook saved under a .csv name', () => {
    const xlsx = bytes(0x50, 0x4b, 0x03, 0x04, 0x14, 0x00, 0x06, 0x00, 0x08, 0x00, 0x00, 0x00);
    expect(decodeText(xlsx)).toMatchObject({ ok: false, error: { code: 'SPREADSHEET_FILE' } });
  });

  it('refuses text that is not UTF-8 (a Windows-1252 "σ" and "²")', () => {
    const result = decodeText(bytes(0x63, 0x76, 0x20, 0x28, 0x6d, 0xb2, 0x2f, 0x79, 0x72, 0x29, 0x2c, 0x4c, 0x4c));
    expect(result).toMatchObject({ ok: false, error: { code: 'NOT_UTF8' } });
    if (!result.ok) expect(result.error.message).toContain('not UTF-8');
  });

  it('refuses a file one byte over the limit as TOO_LARGE (HTTP 413)', () => {
    const oversized = new Uint8Array(MAX_FILE_BYTES + 1).fill(0x61);
    const result = parseCsv(oversized);
    expect(result).toMatchObject({ ok: false, error: { code: 'TOO_LARGE' } });
    if (!result.ok) {
      expect(result.error.message).toContain('20.0 MB');
      expect(importErrorStatus(result.error.code)).toBe(413);
    }
    expect(decodeText(new Uint8Array(MAX_FILE_BYTES).fill(0x61))).toMatchObject({ ok: true });
  });

  it('counts UTF-8 bytes of a string as an encoder would', () => {
    for (const text of ['abc', "σ'p", 'm²/yr', '😀 x', '\ud800']) expect(utf8Length(text)).toBe(utf8(text).byteLength);
  });
});
