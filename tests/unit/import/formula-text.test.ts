// Cells a spreadsheet may run as formulas: flagged on import, prefixed with an apostrophe on export.
// source: OWASP www-community, "CSV Injection" (cells must not begin with = + - @, tab, CR or LF;
// prefix such a cell with a single quote); OWASP ASVS 5.0 §1.2.10 (adds NUL).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { splitRow } from '../../../src/lib/import/anonymise';
import { formulaFlagReason, looksLikeFormula, neutraliseCell } from '../../../src/lib/import/formula-text';
import { templateCsv } from '../../../src/lib/import/template';

const TRIGGERS = ['=', '+', '-', '@', '\t', '\r', '\n', '\u0000'];

describe('neutraliseCell', () => {
  it.each(TRIGGERS)('prefixes an apostrophe to text beginning with %j', (trigger) => {
    expect(neutraliseCell(`${trigger}HYPERLINK("http://x.example")`)).toBe(`'${trigger}HYPERLINK("http://x.example")`);
  });

  it('leaves other text, including a formula character later in the text, unchanged', () => {
    for (const text of ['piston', 'ASTM D2435', 'Cc = 0.85', "'quoted", '', ' =1+1']) expect(neutraliseCell(text)).toBe(text);
  });

  it('for any text: the result never begins with a trigger, and dropping the added apostrophe gives the text back', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary' }), (text) => {
        const cell = neutraliseCell(text);
        expect(looksLikeFormula(cell)).toBe(false);
        expect(cell === text || cell === `'${text}`).toBe(true);
        expect(cell !== text).toBe(looksLikeFormula(text));
      }),
      { numRuns: 1000, seed: 20261203 },
    );
  });
});

describe('the import flag', () => {
  it('says which field and which character, without refusing the value', () => {
    expect(formulaFlagReason('Sampling method', '=cmd|calc')).toContain('Sampling method begins with "="');
    expect(formulaFlagReason('Sampling method', 'piston')).toBeNull();
  });

  it('is raised by splitRow for a shared text field, and not for a private one', () => {
    const record = {
      projectName: '=private project',
      clientName: null,
      boreholeId: 'BH-1',
      sampleId: null,
      easting: null,
      northing: null,
      latitude: null,
      longitude: null,
      coordinateSystem: null,
      notes: null,
      samplingMethod: '@SUM(1+1)*cmd',
      testStandard: 'ASTM D2435',
      derived: [],
    };
    const { flags } = splitRow({ row: 2, record, increments: [] } as unknown as Parameters<typeof splitRow>[0]);
    expect(flags.filter((f) => f.reason.includes('formula')).map((f) => f.field)).toEqual(['samplingMethod']);
  });
});

describe('the CSV template download', () => {
  it('has no cell that a spreadsheet would run as a formula', () => {
    const cells = templateCsv()
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n')
      .flatMap((line) => line.split(','));
    expect(cells.length).toBeGreaterThan(30);
    expect(cells.filter((cell) => looksLikeFormula(cell.replace(/^"/, '')))).toEqual([]);
  });
});
