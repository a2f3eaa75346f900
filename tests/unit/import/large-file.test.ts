import { describe, expect, it } from 'vitest';
import { autoMapColumns } from '../../../src/lib/import/column-match';
import { MAX_FILE_BYTES, MAX_ROWS } from '../../../src/lib/import/limits';
import { mapRows } from '../../../src/lib/import/map-rows';
import { parseCsv } from '../../../src/lib/import/parse-csv';
import { validateRows } from '../../../src/lib/import/validate-rows';
import { importErrorStatus } from '../../../src/lib/server/http/error-mapper';
import { VOCABULARY } from '../../fixtures/import/pipeline';

const HEADER =
  "Borehole,Sample,Depth top (m),Depth bottom (m),Region,Geological unit,wn (%),LL (%),PL (%),e0,Cc,Cr,σ'p (kPa),σ'v0 (kPa),cv (m²/yr)";

/** `rows` invented soft-clay tests (deterministic spread), as CSV bytes. */
function generate(rows: number): Uint8Array {
  const lines = [HEADER];
  for (let i = 0; i < rows; i++) {
    const depth = 1 + (i % 200) * 0.1;
    const ll = 50 + (i % 50);
    lines.push(
      `BH-${Math.floor(i / 200)},U${i % 200},${depth.toFixed(2)},${(depth + 0.45).toFixed(2)},Saltreach Estuary,Saltreach Estuarine Clay,${ll + 5},${ll},${25 + (i % 10)},${(1.4 + (i % 15) * 0.1).toFixed(2)},${(0.5 + (i % 8) * 0.1).toFixed(2)},0.07,${(40 + depth * 6).toFixed(0)},${(depth * 7).toFixed(1)},${(0.3 + (i % 27) * 0.1).toFixed(1)}`,
    );
  }
  return new TextEncoder().encode(`${lines.join('\n')}\n`);
}

describe('the largest uploads', () => {
  it(`reads, maps and validates ${MAX_ROWS.toLocaleString('en-GB')} rows`, () => {
    const bytes = generate(MAX_ROWS);
    expect(bytes.byteLength).toBeLessThan(MAX_FILE_BYTES);
    const started = performance.now();
    const parsed = parseCsv(bytes);
    if (!parsed.ok) throw new Error(parsed.error.message);
    const columns = autoMapColumns(parsed.table.headers);
    const mapped = mapRows(parsed.table, columns.mapping, columns.units);
    if (!mapped.ok) throw new Error(mapped.error.message);
    const result = validateRows(mapped.rows, VOCABULARY);
    const elapsedMs = performance.now() - started;
    expect(result.errors).toEqual([]);
    expect(result.valid).toHaveLength(MAX_ROWS);
    expect(result.valid.at(-1)?.row).toBe(MAX_ROWS + 1);
    expect(elapsedMs).toBeLessThan(10_000);
  });

  it('refuses one row more with TOO_MANY_ROWS (422)', () => {
    const result = parseCsv(generate(MAX_ROWS + 1));
    expect(result).toMatchObject({
      ok: false,
      error: { code: 'TOO_MANY_ROWS', message: expect.stringContaining('more than 100,000 data rows') },
    });
    if (!result.ok) expect(importErrorStatus(result.error.code)).toBe(422);
  });
});
