import { describe, expect, it } from 'vitest';
import {
  ESTIMATE_PREFILL_PATH,
  estimatePrefillHref,
  estimatePrefillToSearchParams,
  parseEstimatePrefill,
} from '../../../src/lib/schemas/estimate-prefill';

const parse = (query: string) => parseEstimatePrefill(new URLSearchParams(query));

describe('estimate prefill in a query string', () => {
  it('reads the unit, depth range, version and P10/P50/P90 per parameter', () => {
    const result = parse('unit=saltreach-estuarine-clay&depth=5..15&bankVersion=3&basis=pooled&cc=0.5,0.8,1.2&cvNc=0.4,1,2.6');
    expect(result.success).toBe(true);
    expect(result.data).toEqual({
      unit: 'saltreach-estuarine-clay',
      depth: { min: 5, max: 15 },
      bankVersion: 3,
      basis: 'pooled',
      cc: { p10: 0.5, p50: 0.8, p90: 1.2 },
      cvNc: { p10: 0.4, p50: 1, p90: 2.6 },
    });
  });

  it('round-trips through its own link', () => {
    const prefill = {
      unit: 'vennmoor-peat',
      depth: { min: 1.5 },
      cc: { p10: 2.123456, p50: 3.5, p90: 5.25 },
      sigmaP: { p10: 20, p50: 35, p90: 61 },
    };
    const href = estimatePrefillHref(prefill);
    expect(href.startsWith(`${ESTIMATE_PREFILL_PATH}?unit=vennmoor-peat&depth=1.5..&cc=2.123%2C3.5%2C5.25`)).toBe(true);
    const again = parseEstimatePrefill(new URL(href, 'http://x').searchParams);
    expect(again.data).toEqual({ ...prefill, cc: { p10: 2.123, p50: 3.5, p90: 5.25 } });
    expect(estimatePrefillToSearchParams(again.data ?? prefill).toString()).toBe(href.split('?')[1]);
  });

  it.each([
    ['cc=0.5,0.8,1.2', 'unit'],
    ['unit=Saltreach%20Clay', 'unit'],
    ['unit=x&cc=0.8,0.5,1.2', 'reorder'],
    ['unit=x&cc=0.5,0.8', 'three numbers'],
    ['unit=x&cvNc=0,1,2', 'above 0'],
    ['unit=x&cc=a,b,c', 'three numbers'],
    ['unit=x&depth=15..5', 'above the upper end'],
    ['unit=x&colour=red', 'colour'],
  ])('refuses %s (%s)', (query, words) => {
    const result = parse(query);
    expect(result.success).toBe(false);
    expect(JSON.stringify(result.error?.issues)).toContain(words);
  });
});
