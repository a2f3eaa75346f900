import { describe, expect, it, test } from 'vitest';
import { cornerInfluenceFactor, rectangleStressKpa } from '../../../src/lib/consolidation/stress-rectangle';
import { twoToOneStressKpa } from '../../../src/lib/consolidation/stress-two-to-one';
import { integrateRectangle } from './boussinesq-reference';

// source: Newmark (1935) corner formula, Boussinesq (1885) integrated over a rectangle; Fadum (1948) charts the
// same Iz. Values: Newmark's formula evaluated with mpmath 1.3 and confirmed by integrating the Boussinesq point
// load numerically (mpmath.quad), rounded to 4 decimals; textbook tables of Fadum's factor give the same
// (e.g. 0.1752 at m = n = 1; from memory).
const fadum: Array<[number, number, number]> = [
  [0.1, 0.1, 0.0047],
  [0.25, 0.25, 0.027],
  [0.5, 0.5, 0.084],
  [0.5, 1, 0.1202],
  [1, 1, 0.1752],
  [1, 2, 0.1999],
  [2, 2, 0.2325],
  [1, 10, 0.2046],
  [3, 3, 0.2439],
  [10, 10, 0.2498],
];

describe('rectangle corner influence factor (Fadum)', () => {
  test.each(fadum)('m = %f, n = %f gives Iz = %f', (m, n, iz) => {
    expect(cornerInfluenceFactor(m, n)).toBeCloseTo(iz, 4);
    expect(cornerInfluenceFactor(n, m)).toBeCloseTo(iz, 4);
  });

  it('tends to 0.25 for an infinite corner', () => {
    // source: limit of Newmark's (1935) formula as m, n → ∞; worked by hand: the four quarter-planes of an
    // infinite loaded area add up to q (Boussinesq 1885), so each corner gives q/4
    expect(cornerInfluenceFactor(1e7, 1e7)).toBeCloseTo(0.25, 6);
    expect(cornerInfluenceFactor(Number.POSITIVE_INFINITY, Number.POSITIVE_INFINITY)).toBe(0.25);
  });

  it('handles one infinite side as the strip-corner limit', () => {
    expect(cornerInfluenceFactor(1, Number.POSITIVE_INFINITY)).toBeCloseTo(cornerInfluenceFactor(1, 1e7), 8);
  });
});

describe('rectangle at any point by superposition', () => {
  it('gives 0.701q below the centre of a 2 × 2 m footing at 1 m, against 0.444q by the 2:1 method', () => {
    // source: four corners of 1 × 1 m at z = 1 m, 4 × Iz(1, 1) = 4 × 0.17522 = 0.7009 (Newmark 1935, value
    // above); 2:1 method q·B·L/((B + z)(L + z)) = 4/9 = 0.444 (common practice; worked by hand)
    expect(rectangleStressKpa(100, 2, 2, 0, 0, 1) / 100).toBeCloseTo(0.701, 3);
    expect(twoToOneStressKpa(100, 'rectangle', 2, 2, 1) / 100).toBeCloseTo(0.444, 3);
  });

  test.each([
    [0, 0, 1.5],
    [0.7, -0.4, 0.8],
    [1.5, 0, 2],
    [3, 4, 2.5],
    [-2.6, 1.2, 1],
  ])('matches numerical integration of the Boussinesq point load at x = %f, y = %f, z = %f', (x, y, z) => {
    // Independent check: midpoint integration of 3q·z³/(2πR⁵) over the 3 m × 2 m loaded area.
    const expected = integrateRectangle(80, -1.5, 1.5, -1, 1, x, y, z);
    expect(rectangleStressKpa(80, 3, 2, x, y, z)).toBeCloseTo(expected, 3);
  });

  it('tends to q as the rectangle grows (wide-fill limit) and to q inside, 0 outside at z = 0', () => {
    expect(rectangleStressKpa(50, 1e5, 1e5, 3, 2, 4)).toBeCloseTo(50, 4);
    expect(rectangleStressKpa(50, 2, 2, 0, 0, 0)).toBe(50);
    expect(rectangleStressKpa(50, 2, 2, 3, 0, 0)).toBe(0);
    expect(rectangleStressKpa(50, 2, 2, 1, 0, 0)).toBe(25);
  });
});
