import { describe, expect, it } from 'vitest';
import { parseCsv } from '../../../src/lib/import/parse-csv';
import { fixture } from '../../fixtures/import/pipeline';

function table(input: Uint8Array | string, options = {}) {
  const result = parseCsv(input, options);
  if (!result.ok) throw new Error(`${result.error.code}: ${result.error.message}`);
  return result.table;
}

describe('reading CSV files', () => {
  it('reads a clean comma-separated file with quoted cells', () => {
    const t = table(fixture('good.csv'));
    expect(t.delimiter).toBe(',');
    expect(t.newline).toBe('\r\n');
    expect(t.headers).toHaveLength(18);
    expect(t.rows.map((r) => r.row)).toEqual([2, 3, 4, 5]);
    expect(t.rows[0]?.cells.at(-1)).toBe('Soft, grey; fissured at base');
    expect(t.rows[3]?.cells.at(-1)).toBe('Stiff, "varved"');
    expect(t.rowErrors).toEqual([]);
  });

  it('reads a file with a byte-order mark and semicolons, counting the blank row', () => {
    const t = table(fixture('bom-semicolon-decimal-comma.csv'));
    expect(t.delimiter).toBe(';');
    expect(t.headers[0]).toBe('Borehole');
    expect(t.rows.map((r) => r.row)).toEqual([2, 3, 5]);
    expect(t.rows[0]?.cells[8]).toBe('49');
    expect(t.rows[0]?.cells[9]).toBe('3,65');
  });

  it('keeps tabs inside quoted cells of a comma-separated file', () => {
    const t = table(fixture('tabs-in-quoted-cells.csv'));
    expect(t.delimiter).toBe(',');
    expect(t.rows[0]?.cells[7]).toBe('col A\tcol B\ttabs inside');
    expect(t.rows[2]?.cells[7]).toBe('line one\nline two\twith tab');
    expect(t.rows.map((r) => r.row)).toEqual([2, 3, 4, 5]);
    expect(t.rowErrors).toEqual([]);
  });

  it('reports an unbalanced quote on the row where it opens', () => {
    const t = table(fixture('unbalanced-quotes.csv'));
    expect(t.rows.map((r) => r.row)).toEqual([2, 3, 4]);
    expect(t.rowErrors).toEqual([
      {
        row: 4,
        field: null,
        message: expect.stringContaining('a quote is opened but never closed; check for a stray " in this row'),
      },
    ]);
  });

  it.each([
    ['header-only.csv', 'NO_ROWS', 'no data rows'],
    ['empty.csv', 'EMPTY_FILE', 'The file is empty.'],
  ])('refuses %s with %s', (name, code, phrase) => {
    const result = parseCsv(fixture(name));
    expect(result).toMatchObject({ ok: false, error: { code } });
    if (!result.ok) expect(result.error.message).toContain(phrase);
  });

  it('refuses a binary file named .csv', () => {
    const binary = new Uint8Array([0x42, 0x6f, 0x72, 0x65, 0x00, 0x00, 0x01, 0x02, 0xff, 0x00, 0x2c, 0x0a]);
    expect(parseCsv(binary)).toMatchObject({ ok: false, error: { code: 'BINARY_FILE' } });
  });

  it.each([
    ['Borehole,,Cc\n1,2,3\n', 'HEADER_EMPTY_NAME', 'no name in column 2 (B)'],
    ['Borehole,Cc, cc \n1,2,3\n', 'HEADER_DUPLICATE_NAME', 'column 2 (B) and column 3 (C) both "cc"'],
    ['"Borehole,Cc\n1,2\n', 'HEADER_UNCLOSED_QUOTE', 'never closed'],
    ['Borehole and Cc\n1\n', 'DELIMITER_NOT_FOUND', 'no commas, semicolons or tabs'],
  ])('refuses a bad header %j with %s', (text, code, phrase) => {
    const result = parseCsv(text);
    expect(result).toMatchObject({ ok: false, error: { code } });
    if (!result.ok) expect(result.error.message).toContain(phrase);
  });

  it('reports rows with too many or too few cells without stopping', () => {
    const t = table('a,b,c\n1,2,3\n1,2,3,4\n1,2\n1,2,3,,\n');
    expect(t.rows.map((r) => r.cells)).toEqual([
      ['1', '2', '3'],
      ['1', '2', '3'],
      ['1', '2', ''],
      ['1', '2', '3'],
    ]);
    expect(t.rowErrors.map((e) => [e.row, e.message.slice(0, 45)])).toEqual([
      [3, 'this row has 4 cells but the header has 3 col'],
      [4, 'this row has 2 cells but the header has 3 col'],
    ]);
  });

  it('numbers rows as a spreadsheet does: blank rows count, a multi-line cell is one row', () => {
    const t = table('a,b\n1,"two\nlines"\n\n ,  \n3,4\n,\n5,6');
    expect(t.rows.map((r) => [r.row, r.cells[0]])).toEqual([
      [2, '1'],
      [5, '3'],
      [7, '5'],
    ]);
  });

  it('uses the delimiter the person chose, and says when it does not fit', () => {
    expect(table('a;b\n1,5;2\n', { delimiter: ';' }).rows[0]?.cells).toEqual(['1,5', '2']);
    expect(parseCsv('a,b\n1,2\n', { delimiter: '\t' })).toMatchObject({ ok: false, error: { code: 'DELIMITER_MISMATCH' } });
  });

  it('stops at the row limit with TOO_MANY_ROWS', () => {
    const result = parseCsv('a,b\n1,2\n3,4\n5,6\n', { maxRows: 2 });
    expect(result).toMatchObject({ ok: false, error: { code: 'TOO_MANY_ROWS' } });
    if (!result.ok) expect(result.error.message).toContain('more than 2 data rows');
    expect(parseCsv('a,b\n1,2\n3,4\n', { maxRows: 2 })).toMatchObject({ ok: true });
  });

  it('reads old Mac line breaks (CR only)', () => {
    expect(table('a,b\r1,2\r3,4').rows.map((r) => r.row)).toEqual([2, 3]);
  });
});
