// The ranges you give are the ranges you get: a parameter given as P10/P50/P90 comes back with
// those percentiles in a result that depends on it alone and monotonically.
import { describe, expect, it } from 'vitest';
import { fitPercentiles, valueAtScore } from '../../../src/lib/consolidation/distributions';
import { previewEstimate } from '../../../src/lib/consolidation/preview';
import { normalQuantile } from '../../../src/lib/consolidation/special-functions';
import { type EstimatePreviewBody, estimatePreviewSchema } from '../../../src/lib/schemas/estimate-preview';

const REALISATIONS = 20_000;

type Layer = EstimatePreviewBody['layers'][number];

/** A normally consolidated clay under a wide fill: settlement = K·Cc (UFC 3-220-10 Eq. 5-12), t90 = T90·Hdr²/cv. */
const body = (layer: Partial<Layer>): EstimatePreviewBody => ({
  unitSystem: 'SI',
  waterTableDepth: 0,
  layers: [
    {
      name: 'Clay',
      thickness: 8,
      unitWeightAboveWater: 17,
      unitWeightBelowWater: 17,
      cc: 0.5,
      cr: 0.05,
      e0: 1.4,
      ocr: 1,
      cv: 2,
      ...layer,
    },
  ],
  load: { type: 'wideFill', pressure: 60 },
  drainage: { top: 'pervious', bottom: 'impervious' },
  options: { sublayers: { mode: 'fixed', perLayer: 4 }, monteCarlo: { realisations: REALISATIONS, seed: 11 } },
});

/**
 * Interval that holds the sample p-quantile of n draws with probability ≈ 1 − 6e-5: the fitted
 * distribution's quantiles at p ± 4·√(p(1−p)/n), since F(sample p-quantile) is asymptotically
 * normal with that standard deviation (source: David & Nagaraja (2003) Order Statistics, 3rd ed.,
 * §10.2, asymptotic distribution of a central order statistic). The run is seeded, so the test
 * is reproducible; the bound says how far a correct engine may stray.
 */
function quantileBand(p10: number, p50: number, p90: number, p: number, n = REALISATIONS) {
  const d = fitPercentiles(p10, p50, p90);
  const half = 4 * Math.sqrt((p * (1 - p)) / n);
  return { low: valueAtScore(d, normalQuantile(p - half)), high: valueAtScore(d, normalQuantile(p + half)) };
}

describe('P10/P50/P90 round trip through the Monte Carlo ranges', () => {
  it.each([
    ['Cc skewed to high values', 0.4, 0.5, 0.7],
    ['Cc skewed to low values', 0.3, 0.5, 0.55],
    ['Cc nearly symmetric', 0.45, 0.5, 0.56],
  ])('%s (%s / %s / %s): settlement ∝ Cc gives back the given P10, P50 and P90', (_, p10, p50, p90) => {
    const result = previewEstimate(estimatePreviewSchema.parse(body({ cc: { type: 'p10p50p90', p10, p50, p90 } })));
    const ranges = result.ranges;
    if (!ranges) throw new Error('expected ranges');
    // The likely estimate uses Cc = P50, so K = likely settlement / P50 and Cc implied = settlement / K.
    const k = result.settlement.primary / p50;
    const implied = {
      p10: ranges.finalPrimary.p10 / k,
      p50: ranges.finalPrimary.p50 / k,
      p90: ranges.finalPrimary.p90 / k,
    };
    for (const [p, given, got] of [
      [0.1, p10, implied.p10],
      [0.5, p50, implied.p50],
      [0.9, p90, implied.p90],
    ] as const) {
      const band = quantileBand(p10, p50, p90, p);
      expect(got).toBeGreaterThanOrEqual(band.low);
      expect(got).toBeLessThanOrEqual(band.high);
      // the band is narrow (within ±2.5 % of the value), so a fit missing by ~5 % cannot pass
      expect((band.high - band.low) / given).toBeLessThan(0.05);
    }
  });

  it('Cc 0.4 / 0.5 / 0.7: a log-normal keeping only P50 and the P10–P90 log spread would miss both ends', () => {
    // The fit this engine used before: median P50, σ(ln) = ln(P90/P10)/(2·1.2816).
    const lognormalP10 = 0.5 * Math.sqrt(0.4 / 0.7);
    const lognormalP90 = 0.5 * Math.sqrt(0.7 / 0.4);
    expect(lognormalP10).toBeLessThan(quantileBand(0.4, 0.5, 0.7, 0.1).low);
    expect(lognormalP90).toBeLessThan(quantileBand(0.4, 0.5, 0.7, 0.9).low);
  });

  it('cv 1 / 1.5 / 3: t90 = T90·Hdr²/cv gives back T90·Hdr² divided by the given P90, P50 and P10', () => {
    const result = previewEstimate(estimatePreviewSchema.parse(body({ cv: { type: 'p10p50p90', p10: 1, p50: 1.5, p90: 3 } })));
    const ranges = result.ranges;
    if (!ranges) throw new Error('expected ranges');
    // source: Terzaghi (1943); UFC 3-220-10 Eq. 5-15 — t = Tv·Hdr²/cv with T90 = 0.848 for U = 90 %.
    const t90TimesCv = 0.848 * 8 * 8;
    expect(result.t90Years * 1.5).toBeCloseTo(t90TimesCv, 1);
    // t90 falls as cv rises: its P10 comes from cv's P90 and its P90 from cv's P10.
    const cvBand = (p: number) => quantileBand(1, 1.5, 3, p);
    const k = result.t90Years * 1.5;
    expect(k / ranges.t90Years.p10).toBeGreaterThanOrEqual(cvBand(0.9).low);
    expect(k / ranges.t90Years.p10).toBeLessThanOrEqual(cvBand(0.9).high);
    expect(k / ranges.t90Years.p50).toBeGreaterThanOrEqual(cvBand(0.5).low);
    expect(k / ranges.t90Years.p50).toBeLessThanOrEqual(cvBand(0.5).high);
    expect(k / ranges.t90Years.p90).toBeGreaterThanOrEqual(cvBand(0.1).low);
    expect(k / ranges.t90Years.p90).toBeLessThanOrEqual(cvBand(0.1).high);
  });
});
