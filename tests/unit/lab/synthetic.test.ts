import { describe, expect, it } from 'vitest';
import { compressionCurve } from '../../../src/lib/lab/compression-curve';
import { withDialSlip } from '../../../src/lib/lab/synthetic/planted-problem';
import { checkSyntheticCurve, scheduleVoidRatios } from '../../../src/lib/lab/synthetic/synthetic-curve';
import { syntheticIncrementalTest } from '../../../src/lib/lab/synthetic/synthetic-test';
import { MINUTES_PER_YEAR } from '../../../src/lib/lab/time-factors';
import { seriesDegree } from './support';

const curve = { e0: 1.4, cc: 0.5, cr: 0.06, sigmaPKpa: 100, sigmaV0Kpa: 50, deltaEOverE0: 0.02, bendLogCycles: 0.03 };
const stresses = [25, 50, 100, 200, 400, 100];
const options = { curve, stressesKpa: stresses, cvM2PerYear: 2, seed: 9, noiseMm: 0, initialHeightMm: 20 };

describe('synthetic readings with known parameters', () => {
  it('end each increment on the chosen curve, with a dry mass that gives e0', () => {
    const curveBack = compressionCurve(syntheticIncrementalTest(options));
    if (!curveBack.ok) throw new Error(curveBack.message);
    expect(curveBack.value.initial.basis).toBe('dry-mass');
    expect(curveBack.value.initial.e0).toBeCloseTo(1.4, 12);
    const expected = scheduleVoidRatios(curve, stresses);
    for (const [i, s] of curveBack.value.states.entries()) expect(s.voidRatio).toBeCloseTo(expected[i] as number, 10);
  });

  it("follow Terzaghi's series within each increment", () => {
    // source: Terzaghi (1943): d(t) − d(0) = primary × U(Tv)/U(Tv at the last reading), Tv = cv·t/Hdr²,
    // Hdr = half the mean height of the increment (both faces drained); the series is summed in the test
    const test = syntheticIncrementalTest(options);
    const inc = test.increments[3];
    const readings = inc?.readings ?? [];
    const start = readings[0]?.deformationMm ?? 0;
    const end = readings[readings.length - 1]?.deformationMm ?? 0;
    const hdrM = (20 - (start + end) / 2) / 2 / 1000;
    const tv = (t: number) => (2 * (t / MINUTES_PER_YEAR)) / (hdrM * hdrM);
    const last = readings[readings.length - 1]?.elapsedMin ?? 0;
    for (const r of readings.slice(1)) {
      expect((r.deformationMm - start) / (end - start)).toBeCloseTo(seriesDegree(tv(r.elapsedMin)) / seriesDegree(tv(last)), 9);
    }
  });

  it('are the same for the same seed and differ with another', () => {
    const noisy = { ...options, noiseMm: 0.002 };
    expect(syntheticIncrementalTest(noisy)).toEqual(syntheticIncrementalTest(noisy));
    expect(syntheticIncrementalTest({ ...noisy, seed: 10 })).not.toEqual(syntheticIncrementalTest(noisy));
  });

  it('refuse parameters no specimen could have', () => {
    expect(() => checkSyntheticCurve({ ...curve, cr: 0.6 })).toThrow(RangeError);
    expect(() => checkSyntheticCurve({ ...curve, sigmaPKpa: 40 })).toThrow(RangeError);
  });

  it('plant a slipped gauge: that increment’s later readings and every later deformation fall back', () => {
    const test = syntheticIncrementalTest(options);
    const slipped = withDialSlip(test, 4, 0.3, 60);
    const before = test.increments[3]?.readings ?? [];
    const after = slipped.increments[3]?.readings ?? [];
    after.forEach((r, i) => {
      const shift = (before[i]?.deformationMm ?? 0) - r.deformationMm;
      expect(shift).toBeCloseTo(r.elapsedMin >= 60 ? 0.3 : 0, 12);
    });
    expect((test.increments[4]?.deformationMm ?? 0) - (slipped.increments[4]?.deformationMm ?? 0)).toBeCloseTo(0.3, 12);
    expect(slipped.increments[2]?.deformationMm).toBe(test.increments[2]?.deformationMm);
  });
});
