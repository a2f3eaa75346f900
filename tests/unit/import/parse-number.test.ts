import { describe, expect, it } from 'vitest';
import { parseNumberCell } from '../../../src/lib/import/parse-number';

describe('reading numbers from cells', () => {
  it.each([
    ['1.25', false, 1.25],
    ['  -0.5 ', false, -0.5],
    ['4.1E-10', false, 4.1e-10],
    ['.5', false, 0.5],
    ['+12', false, 12],
    ['', false, null],
    ['-', false, null],
    ['n/a', false, null],
    ['NA', true, null],
    ['1,5', true, 1.5],
    ['0,125', true, 0.125],
    ['1,2E-9', true, 1.2e-9],
    ['1.5', true, 1.5],
  ])('"%s" (decimal comma allowed: %s) → %s', (text, decimalComma, value) => {
    expect(parseNumberCell(text, { decimalComma })).toEqual({ ok: true, value });
  });

  it('takes a trailing % on percentage fields only', () => {
    expect(parseNumberCell('45 %', { decimalComma: false, percent: true })).toEqual({ ok: true, value: 45 });
    expect(parseNumberCell('45 %', { decimalComma: false })).toMatchObject({ ok: false });
  });

  it.each([
    ['1,5', false, 'in a comma-separated file write numbers with a decimal point'],
    ['1,234.5', false, 'both a point and a comma'],
    ['1.234,5', true, 'both a point and a comma'],
    ['1.234.567', true, 'more than one point'],
    ['1,234,567', true, 'more than one comma'],
    ['1 234', true, 'digits in groups'],
    ["1'234", false, 'digits in groups'],
    ['abc', false, 'is not a number'],
    ['<0.01', false, 'is not a number'],
    ['Infinity', false, 'is not a number'],
    ['0x1F', false, 'is not a number'],
    ['1e999', false, 'too large'],
  ])('refuses "%s" (decimal comma allowed: %s): %s', (text, decimalComma, phrase) => {
    const result = parseNumberCell(text, { decimalComma });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toContain(phrase);
  });
});
