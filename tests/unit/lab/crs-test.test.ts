import { describe, expect, it } from 'vitest';
import { crsPoints, interpretCrsTest } from '../../../src/lib/lab/crs-test';
import { syntheticCrsTest } from '../../../src/lib/lab/synthetic/synthetic-crs';

const curve = { e0: 1.6, cc: 0.6, cr: 0.07, sigmaPKpa: 120, sigmaV0Kpa: 70, deltaEOverE0: 0.02, bendLogCycles: 0.02 };
const test = syntheticCrsTest({
  curve,
  cvM2PerYear: 1.5,
  strainRatePerHour: 0.01,
  finalStrain: 0.22,
  readingEveryMin: 6,
  seed: 4,
  noiseMm: 0.0005,
  noiseKpa: 0.02,
});

describe('constant-rate-of-strain test by linear theory (Wissa et al. 1971; ASTM D4186/D4186M)', () => {
  it('takes σ′v = σv − (2/3)·ub and k = ε̇·H²·γw/(2·ub)', () => {
    // by hand: 0.5 %/h for 60 min, then to 0.55 % in the next 6 min: ε̇ = 0.0005/360 s = 1.389e-6 1/s;
    // mean height 19.895 mm; ub mean 15 kPa: k = 1.389e-6 × 0.019895² × 9.81/(2 × 15) = 1.798e-10 m/s
    const points = crsPoints({
      specimen: { initialHeightMm: 20, diameterMm: 63.5, initialVoidRatio: 1.2 },
      readings: [
        { elapsedMin: 54, axialStressKpa: 90, basePorePressureKpa: 14, deformationMm: 0.09 },
        { elapsedMin: 60, axialStressKpa: 100, basePorePressureKpa: 15, deformationMm: 0.1 },
        { elapsedMin: 66, axialStressKpa: 110, basePorePressureKpa: 15, deformationMm: 0.11 },
        { elapsedMin: 72, axialStressKpa: 120, basePorePressureKpa: 15, deformationMm: 0.12 },
        { elapsedMin: 78, axialStressKpa: 130, basePorePressureKpa: 15, deformationMm: 0.13 },
      ],
    });
    if (!points.ok) throw new Error(points.message);
    expect(points.value[1]?.effectiveStressKpa).toBe(90);
    expect(points.value[2]?.kMPerS).toBeCloseTo(((0.01 / 20 / 360) * 0.019895 ** 2 * 9.81) / (2 * 15), 15);
    expect(points.value[2]?.porePressureRatio).toBeCloseTo(15 / 110, 12);
    expect(points.value[2]?.inRecommendedRange).toBe(true);
  });

  it('gives back the cv the readings were made with, where ub/σv is in the recommended range', () => {
    const points = crsPoints(test);
    if (!points.ok) throw new Error(points.message);
    const usable = points.value.filter(
      (p) => p.inRecommendedRange && p.cvM2PerYear !== null && p.effectiveStressKpa > 1.5 * curve.sigmaPKpa,
    );
    expect(usable.length).toBeGreaterThan(10);
    for (const p of usable) expect(Math.abs((p.cvM2PerYear ?? 0) / 1.5 - 1)).toBeLessThan(0.05);
  });

  it('reads Cc and both σ′p from its e–log σ′v curve', () => {
    const r = interpretCrsTest(test);
    expect(r.cc.ok && Math.abs(r.cc.value.value / 0.6 - 1)).toBeLessThan(0.05);
    expect(r.sigmaPCasagrande.ok && Math.abs(r.sigmaPCasagrande.value.sigmaPKpa / 120 - 1)).toBeLessThan(0.1);
    expect(r.sigmaPStrainEnergy.ok && Math.abs(r.sigmaPStrainEnergy.value.sigmaPKpa / 120 - 1)).toBeLessThan(0.1);
  });

  it('refuses readings whose deformation falls back, and too few readings', () => {
    const back = {
      ...test,
      readings: test.readings.map((r, i) => (i === 20 ? { ...r, deformationMm: r.deformationMm - 0.5 } : r)),
    };
    expect(interpretCrsTest(back).sigmaPCasagrande).toMatchObject({ ok: false, reason: 'goes-backwards' });
    expect(crsPoints({ ...test, readings: test.readings.slice(0, 3) })).toMatchObject({ ok: false, reason: 'too-few-points' });
  });
});
