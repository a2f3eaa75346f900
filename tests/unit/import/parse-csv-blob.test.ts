import fc from 'fast-check';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { MAX_FILE_BYTES } from '../../../src/lib/import/limits';
import { parseCsv } from '../../../src/lib/import/parse-csv';
import { type CsvProgress, parseCsvBlob } from '../../../src/lib/import/parse-csv-blob';
import { fixture } from '../../fixtures/import/pipeline';

const FIXTURES = [
  'good.csv',
  'bom-semicolon-decimal-comma.csv',
  'tabs-in-quoted-cells.csv',
  'unbalanced-quotes.csv',
  'header-only.csv',
  'empty.csv',
  'duplicates.csv',
];

describe('reading a File or Blob slice by slice', () => {
  it.each(FIXTURES)('gives the same result as the whole-text reader for %s, at any slice size', async (name) => {
    const bytes = fixture(name);
    const expected = parseCsv(bytes);
    for (const sliceBytes of [1, 2, 3, 7, 64, 1 << 20]) {
      expect(await parseCsvBlob(new Blob([bytes]), { sliceBytes })).toEqual(expected);
    }
  });

  it('joins a character split across two slices (papaparse’s own file reader would corrupt it)', async () => {
    const text = "Borehole,σ'p (kPa),Notes\nQF-1,72,grès schisteux 中文\n";
    const result = await parseCsvBlob(new Blob([text]), { sliceBytes: 1 });
    expect(result).toMatchObject({ ok: true, table: { headers: ['Borehole', "σ'p (kPa)", 'Notes'] } });
    if (result.ok) expect(result.table.rows[0]?.cells[2]).toBe('grès schisteux 中文');
  });

  it('reports progress by bytes, ending at 1', async () => {
    const rows = Array.from({ length: 2000 }, (_, i) => `BH-${i},${i % 7},0.5`);
    const blob = new Blob([`Borehole,Depth top,Cc\n${rows.join('\n')}\n`]);
    const seen: CsvProgress[] = [];
    const result = await parseCsvBlob(blob, { sliceBytes: 4096, onProgress: (p) => seen.push(p) });
    expect(result).toMatchObject({ ok: true });
    expect(seen.length).toBe(Math.ceil(blob.size / 4096));
    expect(seen.at(-1)).toMatchObject({ bytesRead: blob.size, totalBytes: blob.size, fraction: 1, rowsRead: 2000 });
    expect(seen.map((p) => p.fraction)).toEqual([...seen.map((p) => p.fraction)].sort((a, b) => a - b));
  });

  it('refuses an oversized Blob before reading it, and binary or non-UTF-8 content', async () => {
    const huge = new Blob([new Uint8Array(MAX_FILE_BYTES + 1)]);
    expect(await parseCsvBlob(huge)).toMatchObject({ ok: false, error: { code: 'TOO_LARGE' } });
    const binary = new Blob([new Uint8Array([0x61, 0x2c, 0x62, 0x0a, 0x00, 0x01])]);
    expect(await parseCsvBlob(binary)).toMatchObject({ ok: false, error: { code: 'BINARY_FILE' } });
    const latin1 = new Blob([new Uint8Array([0x61, 0x2c, 0x62, 0x0a, 0xe9, 0x2c, 0x31])]);
    expect(await parseCsvBlob(latin1, { sliceBytes: 2 })).toMatchObject({ ok: false, error: { code: 'NOT_UTF8' } });
  });

  it('stops when asked', async () => {
    const controller = new AbortController();
    controller.abort();
    expect(await parseCsvBlob(new Blob(['a,b\n1,2\n']), { signal: controller.signal })).toMatchObject({
      ok: false,
      error: { code: 'READ_FAILED' },
    });
  });

  it('agrees with the whole-text reader on random tables cut at random places', async () => {
    const cell = fc.string({
      unit: fc.constantFrom('a', 'é', '中', ' ', ',', ';', '\t', '"', '\n', '\r\n', '1', '.'),
      maxLength: 6,
    });
    await fc.assert(
      fc.asyncProperty(
        fc.array(fc.array(cell, { minLength: 2, maxLength: 4 }), { minLength: 1, maxLength: 6 }),
        fc.constantFrom(',', ';', '\t'),
        fc.integer({ min: 1, max: 40 }),
        async (rows, delimiter, sliceBytes) => {
          const text = Papa.unparse(rows, { delimiter });
          const expected = parseCsv(text, { delimiter: delimiter as ',' | ';' | '\t' });
          const actual = await parseCsvBlob(new Blob([text]), { delimiter: delimiter as ',' | ';' | '\t', sliceBytes });
          if (expected.ok && actual.ok) expect({ ...actual, byteLength: 0 }).toEqual({ ...expected, byteLength: 0 });
          else expect(actual).toEqual(expected);
        },
      ),
      { seed: 20261202, numRuns: 300 },
    );
  });
});
