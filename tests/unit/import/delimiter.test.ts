import { describe, expect, it } from 'vitest';
import { chooseDelimiter, countDelimiters, findHeaderEnd } from '../../../src/lib/import/delimiter';

describe('deciding the delimiter from the header row', () => {
  it.each([
    ['Borehole,Sample,Depth top (m)', ','],
    ['Borehole;Sample;Depth top (m);Notes, remarks', ';'],
    ['Borehole\tSample\tDepth top (m)', '\t'],
    ['"Depth; top",LL', ','],
    ['"a,b";"c,d";e', ';'],
  ])('%j → %j', (header, delimiter) => {
    expect(chooseDelimiter(header)).toEqual({ ok: true, delimiter });
  });

  it('asks the person to choose when two delimiters are as frequent', () => {
    const result = chooseDelimiter('Depth, top;LL');
    expect(result).toMatchObject({ ok: false, error: { code: 'DELIMITER_AMBIGUOUS' } });
    if (!result.ok) expect(result.error.message).toContain('Choose the delimiter');
  });

  it('says when no delimiter separates the header names', () => {
    const result = chooseDelimiter('Just one column');
    expect(result).toMatchObject({ ok: false, error: { code: 'DELIMITER_NOT_FOUND' } });
    if (!result.ok) expect(result.error.message).toContain('choose the delimiter yourself');
  });

  it('checks a chosen delimiter against the header', () => {
    expect(chooseDelimiter('a;b', ';')).toEqual({ ok: true, delimiter: ';' });
    expect(chooseDelimiter('Depth, top;LL', ',')).toEqual({ ok: true, delimiter: ',' });
    const result = chooseDelimiter('a,b,c', ';');
    expect(result).toMatchObject({ ok: false, error: { code: 'DELIMITER_MISMATCH' } });
    if (!result.ok)
      expect(result.error.message).toBe(
        'Split by semicolons, the header row gives only one column. It seems to use commas; choose that instead.',
      );
  });

  it('counts only delimiters outside quoted names', () => {
    expect(countDelimiters('"a,b,c";"d"')).toEqual({ ',': 0, ';': 1, '\t': 0 });
    expect(countDelimiters('5" tube,LL')).toEqual({ ',': 1, ';': 0, '\t': 0 });
  });

  it('finds the end of the header row outside quotes and its line break', () => {
    expect(findHeaderEnd('a,b\r\n1,2')).toEqual({ end: 3, next: 5, newline: '\r\n' });
    expect(findHeaderEnd('"a\nb",c\n1,2')).toEqual({ end: 7, next: 8, newline: '\n' });
    expect(findHeaderEnd('a,b\r1,2')).toEqual({ end: 3, next: 4, newline: '\r' });
    expect(findHeaderEnd('a,b\r')).toBeNull();
    expect(findHeaderEnd('a,b')).toBeNull();
  });
});
