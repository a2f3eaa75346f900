import { describe, expect, it } from 'vitest';
import { casagrandePreconsolidation } from '../../../src/lib/lab/casagrande-preconsolidation';
import { compressionCurve } from '../../../src/lib/lab/compression-curve';
import { firstLoadingVoidRatio, type SyntheticCurve } from '../../../src/lib/lab/synthetic/synthetic-curve';
import type { IncrementalTestInput } from '../../../src/lib/lab/test-input';
import { bilinear, ladder, voidRatioTest } from './support';

function construct(test: IncrementalTestInput, choice = {}) {
  const curve = compressionCurve(test);
  if (!curve.ok) throw new Error(curve.message);
  return casagrandePreconsolidation(curve.value, choice);
}

const logSlope = (a: { stressKpa: number; voidRatio: number }, b: { stressKpa: number; voidRatio: number }) =>
  (b.voidRatio - a.voidRatio) / Math.log10(b.stressKpa / a.stressKpa);

// a smooth curve with a known bend: asymptotes Cr = 0.06 and Cc = 0.5 meet at σ′p = 150 kPa
const smooth: SyntheticCurve = {
  e0: 1.6,
  cc: 0.5,
  cr: 0.06,
  sigmaPKpa: 150,
  sigmaV0Kpa: 60,
  deltaEOverE0: 0.02,
  bendLogCycles: 0.02,
};
const dense = voidRatioTest(
  1.6,
  ladder(10, 2000, 1.25).map((s) => [s, firstLoadingVoidRatio(smooth, s)]),
);

describe("σ′p by Casagrande's construction (Casagrande 1936)", () => {
  const result = construct(dense);
  if (!result.ok) throw new Error(result.message);
  const c = result.value;
  const toChart = (slope: number) =>
    (slope * Math.log10(c.chart.stressToKpa / c.chart.stressFromKpa)) / (c.chart.voidRatioTo - c.chart.voidRatioFrom);

  it('draws the horizontal and the tangent through the point of maximum curvature', () => {
    // source: Casagrande (1936), steps 1–3: the point of maximum curvature, a horizontal line and the tangent there
    expect(c.horizontal.from).toEqual({ stressKpa: c.maxCurvature.stressKpa, voidRatio: c.maxCurvature.voidRatio });
    expect(c.horizontal.to.voidRatio).toBeCloseTo(c.maxCurvature.voidRatio, 12);
    const tangentSlope = logSlope(c.tangent.from, c.tangent.to);
    expect(logSlope(c.tangent.from, c.maxCurvature)).toBeCloseTo(tangentSlope, 9);
    // the tangent is steeper than the recompression asymptote and flatter than the virgin line at the bend
    expect(-tangentSlope).toBeGreaterThan(smooth.cr);
    expect(-tangentSlope).toBeLessThan(smooth.cc);
  });

  it('bisects the angle between the horizontal and the tangent', () => {
    // source: Casagrande (1936), step 4, measured on the square chart the construction reports
    const tangent = Math.atan(toChart(logSlope(c.tangent.from, c.tangent.to)));
    const bisector = Math.atan(toChart(logSlope(c.bisector.from, c.bisector.to)));
    expect(bisector).toBeCloseTo(tangent / 2, 9);
  });

  it('reads σ′p where the virgin line, extended back, meets the bisector', () => {
    // source: Casagrande (1936), step 5; UFC 3-220-10 Fig. 3-12
    expect(c.intersection.stressKpa).toBeCloseTo(c.sigmaPKpa, 9);
    expect(logSlope(c.bisector.from, c.intersection)).toBeCloseTo(logSlope(c.bisector.from, c.bisector.to), 9);
    expect(logSlope(c.intersection, c.virginLine.to)).toBeCloseTo(-c.virgin.value, 9);
    expect(c.virgin.value).toBeCloseTo(smooth.cc, 3);
  });

  it('finds the bend of a closely loaded curve within 3 % of where its straight parts meet', () => {
    // the asymptotes meet at 150 kPa by construction of the curve
    expect(Math.abs(c.sigmaPKpa / 150 - 1)).toBeLessThan(0.03);
    expect(c.maxCurvature.chosenBy).toBe('auto');
  });

  it("recomputes from a steward's point of maximum curvature, and records it", () => {
    // a point on the virgin line itself: its bisector meets that line at the point (geometry)
    const stresses = ladder(10, 2000, 1.25);
    const kink = stresses[12] as number;
    const corner = voidRatioTest(
      1.3,
      stresses.map((s) => [s, bilinear(1.1, kink, 0.05, 0.45)(s)]),
    );
    const moved = construct(corner, { maxCurvatureStressKpa: kink });
    expect(moved.ok && moved.value.maxCurvature.chosenBy).toBe('person');
    expect(moved.ok && moved.value.sigmaPKpa).toBeCloseTo(kink, 6);
    const later = construct(dense, { maxCurvatureStressKpa: 200 });
    expect(later.ok && later.value.sigmaPKpa).not.toBeCloseTo(c.sigmaPKpa, 0);
  });

  it('refuses a chosen point outside the loading, and a curve with no virgin branch', () => {
    const outside = construct(dense, { maxCurvatureStressKpa: 5000 });
    expect(!outside.ok && outside.message).toMatch(
      /^cannot determine σ′p \(Casagrande\): the chosen point 5000 kPa lies outside the first loading \(10–\d+ kPa\)\.$/,
    );
    const flat = construct(
      voidRatioTest(
        1.3,
        ladder(10, 100, 2).map((s) => [s, bilinear(1.1, 160, 0.05, 0.45)(s)]),
      ),
    );
    expect(flat).toMatchObject({ ok: false, reason: 'no-virgin-branch' });
  });
});
