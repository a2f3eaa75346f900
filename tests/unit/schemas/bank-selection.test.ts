import { describe, expect, it } from 'vitest';
import { BANK_PARAMETER_KEYS } from '../../../src/lib/schemas/bank-parameters';
import { parseBankSelection, selectionToSearchParams, splitSelectionParams } from '../../../src/lib/schemas/bank-selection';

const parse = (query: string) => parseBankSelection(new URLSearchParams(query));

describe('bank selection in a query string', () => {
  it('reads repeated facets, comma lists and open-ended ranges', () => {
    const result = parse(
      'unit=saltreach-estuarine-clay&unit=vennmoor-peat&uscs=CH,CL&depth=5..15&cc=..0.8&ocr=1.5..&quality=1&quality=2',
    );
    expect(result.success).toBe(true);
    expect(result.data).toEqual({
      unit: ['saltreach-estuarine-clay', 'vennmoor-peat'],
      uscs: ['CH', 'CL'],
      quality: [1, 2],
      depth: { min: 5, max: 15 },
      cc: { max: 0.8 },
      ocr: { min: 1.5 },
    });
  });

  it.each([
    ['depth=15..5', 'depth', 'above the upper end'],
    ['depth=5', 'depth', 'min..max'],
    ['depth=..', 'depth', 'min..max'],
    ['cc=a..b', 'cc', 'min..max'],
    ['quality=5', 'quality.0', '1 to 4'],
    ['uscs=XX', 'uscs.0', 'ASTM D2487'],
    ['unit=Not%20A%20Slug', 'unit.0', 'lower-case'],
    ['origin=mine', 'origin.0', 'own'],
    ['version=0', 'version.0', '1 or more'],
    ['colour=red', '', 'colour'],
  ])('refuses %s with a message on %s', (query, path, words) => {
    const result = parse(query);
    expect(result.success).toBe(false);
    const issue = result.error?.issues.find((i) => i.path.join('.') === path || (path === '' && i.code === 'unrecognized_keys'));
    expect(issue, JSON.stringify(result.error?.issues)).toBeDefined();
    expect(JSON.stringify(issue)).toContain(words);
  });

  it('gives the same canonical string for the same selection written two ways', () => {
    const a = parse('unit=vennmoor-peat&unit=saltreach-estuarine-clay&depth=5..15&quality=2,1');
    const b = parse('quality=1&depth=5.0..15&unit=saltreach-estuarine-clay&quality=2&unit=vennmoor-peat&unit=vennmoor-peat');
    expect(a.success && b.success).toBe(true);
    const canonical = selectionToSearchParams(a.data ?? {}).toString();
    expect(selectionToSearchParams(b.data ?? {}).toString()).toBe(canonical);
    expect(canonical).toBe('unit=saltreach-estuarine-clay&unit=vennmoor-peat&quality=1&quality=2&depth=5..15');
  });

  it('round-trips every range parameter through its canonical string', () => {
    const query = BANK_PARAMETER_KEYS.map((key, i) => `${key}=${i}..${i + 0.5}`).join('&');
    const first = parse(query);
    expect(first.success).toBe(true);
    const again = parseBankSelection(selectionToSearchParams(first.data ?? {}));
    expect(again.data).toEqual(first.data);
  });

  it('leaves paging and sort keys to the caller', () => {
    const { selection, rest } = splitSelectionParams(new URLSearchParams('unit=vennmoor-peat&page=2&sort=cc:desc'));
    expect(selection).toEqual({ unit: ['vennmoor-peat'] });
    expect(rest.toString()).toBe('page=2&sort=cc%3Adesc');
  });
});
