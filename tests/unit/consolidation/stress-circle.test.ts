import { describe, expect, it, test } from 'vitest';
import { circleCentreStressKpa, circleStressKpa } from '../../../src/lib/consolidation/stress-circle';
import { integrateCircle } from './boussinesq-reference';

describe('uniformly loaded circle', () => {
  it('gives 0.6464q below the centre at z = a', () => {
    // source: Boussinesq (1885) integrated over a circle, q[1 − (1 + (a/z)²)^(−3/2)] (e.g. Poulos & Davis 1974,
    // from memory); worked by hand at z = a: 1 − 2^(−3/2) = 0.64645
    expect(circleCentreStressKpa(1, 2, 2)).toBeCloseTo(0.6464, 4);
  });

  test.each([
    [0.5, 1],
    [1, 1],
    [1.5, 1],
    [3, 2],
    [0.9, 0.3],
    [1.2, 0.4],
  ])('off centre at d/a = %f, z/a = %f matches a polar integration of the Boussinesq point load', (d, z) => {
    // Independent check: midpoint integration in polar coordinates about the circle's centre.
    expect(circleStressKpa(100, 1, d, z)).toBeCloseTo(integrateCircle(100, 1, d, z), 2);
  });

  it('is continuous at the centre and tends to a point load far away', () => {
    expect(circleStressKpa(100, 1, 1e-9, 1.3)).toBeCloseTo(circleCentreStressKpa(100, 1, 1.3), 9);
    const z = 100;
    const pointLoad = (3 * (100 * Math.PI) * z ** 3) / (2 * Math.PI * (z * z + 20 * 20) ** 2.5);
    expect(circleStressKpa(100, 1, 20, z) / pointLoad).toBeCloseTo(1, 3);
  });

  it('tends to q for a very large circle (wide-fill limit) and gives q/2 at the edge near the surface', () => {
    expect(circleStressKpa(70, 1e5, 10, 5)).toBeCloseTo(70, 3);
    expect(circleStressKpa(70, 2, 2, 1e-4)).toBeCloseTo(35, 2);
  });
});
