import { describe, expect, it } from 'vitest';
import { type StressLevel, splitByStressRange, stressLevelRange } from '../../../src/lib/statistics';

const level = (from: number, to: number, declared: 'NC' | 'OC', cv: number | null, ca: number | null): StressLevel => ({
  stressFromKpa: from,
  stressToKpa: to,
  stressRange: declared,
  cvM2PerYear: cv,
  secondaryCompressionIndex: ca,
});

describe('NC/OC split of per-increment cv and Cα', () => {
  const levels = [
    level(25, 50, 'OC', 8, 0.004),
    level(50, 100, 'OC', 2, 0.01),
    level(100, 200, 'NC', 1, 0.03),
    level(200, 400, 'NC', 0.5, 0.028),
  ];

  it('classifies by the final stress against σ′p when σ′p is known', () => {
    // σ′p 90 kPa: the 50→100 kPa increment ends beyond σ′p, so it is normally consolidated
    expect(levels.map((l) => stressLevelRange(l, 90))).toEqual(['OC', 'NC', 'NC', 'NC']);
    expect(levels.map((l) => stressLevelRange(l, null))).toEqual(['OC', 'OC', 'NC', 'NC']);
  });

  it('gives one value per range: mean Cα, geometric mean cv', () => {
    const split = splitByStressRange(levels, 90);
    expect(split.cvOcM2PerYear).toBeCloseTo(8, 12);
    expect(split.cvNcM2PerYear).toBeCloseTo(Math.cbrt(2 * 1 * 0.5), 12);
    expect(split.secondaryCompressionIndexOc).toBeCloseTo(0.004, 12);
    expect(split.secondaryCompressionIndexNc).toBeCloseTo((0.01 + 0.03 + 0.028) / 3, 12);
  });

  it('is null for a range without levels', () => {
    expect(splitByStressRange([level(100, 200, 'NC', null, 0.02)], null)).toEqual({
      cvNcM2PerYear: null,
      cvOcM2PerYear: null,
      secondaryCompressionIndexNc: 0.02,
      secondaryCompressionIndexOc: null,
    });
  });
});
