import { describe, expect, it } from 'vitest';
import { previewEstimate } from '../../../src/lib/consolidation/preview';
import type { EstimatePreviewResult } from '../../../src/lib/consolidation/preview-result';
import { type EstimatePreviewBody, estimatePreviewSchema } from '../../../src/lib/schemas/estimate-preview';

// Exact unit definitions, written out here independently of the engine's units.ts
// (source: NIST SP 811 Appendix B: 1 ft = 0.3048 m, 1 in = 0.0254 m, 1 lbf = 4.4482216152605 N).
const FT = 0.3048;
const LBF_KN = 4.4482216152605e-3;
const PSF = LBF_KN / (FT * FT);
const PCF = LBF_KN / (FT * FT * FT);
const FT2_PER_DAY = FT * FT * 365.25;
const IN_TO_MM = 25.4;

// Worked example (our own): 15 ft of soft organic clay over 20 ft of silty clay, water table 3 ft down,
// a 10 ft high embankment (120 pcf fill, 60 ft crest, 20 ft side slopes), point 10 ft off the centreline,
// pervious top and bottom.
const usBody: EstimatePreviewBody = {
  unitSystem: 'US',
  waterTableDepth: 3,
  layers: [
    {
      name: 'Soft organic clay',
      thickness: 15,
      unitWeightAboveWater: 100,
      unitWeightBelowWater: 102,
      cc: { type: 'normal', mean: 1.1, sd: 0.2 },
      cr: 0.11,
      e0: { type: 'normal', mean: 2.6, sd: 0.3 },
      ccE0Correlation: 0.7,
      ocr: 1.2,
      cv: { type: 'lognormal', mean: 0.05, sd: 0.02 },
      cAlphaOverCc: 'organic-clay-silt',
    },
    {
      name: 'Silty clay',
      thickness: 20,
      unitWeightAboveWater: 112,
      unitWeightBelowWater: 115,
      cc: 0.4,
      cr: 0.05,
      e0: 1.1,
      sigmaP: { type: 'p10p50p90', p10: 1800, p50: 2400, p90: 3400 },
      cv: 0.12,
      cAlpha: 0.01,
    },
  ],
  load: { type: 'embankment', fillHeight: 10, fillUnitWeight: 120, crestWidth: 60, sideSlopeWidth: 20, pointOffset: 10 },
  drainage: { top: 'pervious', bottom: 'pervious' },
  options: { designLifeYears: 30, timePointsYears: [1, 5, 20], monteCarlo: { realisations: 2000, seed: 7 } },
};

// The same example converted to SI by hand.
const siBody: EstimatePreviewBody = {
  unitSystem: 'SI',
  waterTableDepth: 3 * FT,
  layers: [
    {
      name: 'Soft organic clay',
      thickness: 15 * FT,
      unitWeightAboveWater: 100 * PCF,
      unitWeightBelowWater: 102 * PCF,
      cc: { type: 'normal', mean: 1.1, sd: 0.2 },
      cr: 0.11,
      e0: { type: 'normal', mean: 2.6, sd: 0.3 },
      ccE0Correlation: 0.7,
      ocr: 1.2,
      cv: { type: 'lognormal', mean: 0.05 * FT2_PER_DAY, sd: 0.02 * FT2_PER_DAY },
      cAlphaOverCc: 'organic-clay-silt',
    },
    {
      name: 'Silty clay',
      thickness: 20 * FT,
      unitWeightAboveWater: 112 * PCF,
      unitWeightBelowWater: 115 * PCF,
      cc: 0.4,
      cr: 0.05,
      e0: 1.1,
      sigmaP: { type: 'p10p50p90', p10: 1800 * PSF, p50: 2400 * PSF, p90: 3400 * PSF },
      cv: 0.12 * FT2_PER_DAY,
      cAlpha: 0.01,
    },
  ],
  load: {
    type: 'embankment',
    fillHeight: 10 * FT,
    fillUnitWeight: 120 * PCF,
    crestWidth: 60 * FT,
    sideSlopeWidth: 20 * FT,
    pointOffset: 10 * FT,
  },
  drainage: { top: 'pervious', bottom: 'pervious' },
  // The US default γw is 62.4 pcf; the SI run is told the same water unit weight.
  options: {
    designLifeYears: 30,
    timePointsYears: [1, 5, 20],
    monteCarlo: { realisations: 2000, seed: 7 },
    waterUnitWeight: 62.4 * PCF,
  },
};

function close(a: number, b: number): void {
  expect(Math.abs(a - b)).toBeLessThanOrEqual(1e-6 * Math.max(Math.abs(a), Math.abs(b), 1e-9));
}

describe('worked example in US customary units, entered again in SI', () => {
  const us: EstimatePreviewResult = previewEstimate(estimatePreviewSchema.parse(usBody));
  const si: EstimatePreviewResult = previewEstimate(estimatePreviewSchema.parse(siBody));

  it('reports its units', () => {
    expect(us.units).toMatchObject({ depth: 'ft', stress: 'psf', settlement: 'in' });
    expect(si.units).toMatchObject({ depth: 'm', stress: 'kPa', settlement: 'mm' });
  });

  it('gives the same settlements (in × 25.4 = mm) within 1e-6', () => {
    close(us.settlement.primary * IN_TO_MM, si.settlement.primary);
    close(us.settlement.secondary * IN_TO_MM, si.settlement.secondary);
    close(us.settlement.total * IN_TO_MM, si.settlement.total);
    us.settlement.layers.forEach((layer, i) => {
      close(layer.total * IN_TO_MM, si.settlement.layers[i]?.total as number);
    });
    expect(us.sublayering.countsPerLayer).toEqual(si.sublayering.countsPerLayer);
    expect(us.settlement.total).toBeGreaterThan(0);
  });

  it('gives the same stresses (psf → kPa) and depths (ft → m) at every sublayer', () => {
    us.sublayers.forEach((s, i) => {
      const t = si.sublayers[i] as (typeof si.sublayers)[number];
      close(s.mid * FT, t.mid);
      close(s.sigmaV0 * PSF, t.sigmaV0);
      close(s.deltaSigma * PSF, t.deltaSigma);
      close((s.sigmaP as number) * PSF, t.sigmaP as number);
      expect(s.state).toBe(t.state);
    });
  });

  it('gives the same time curve and times', () => {
    close(us.t50Years, si.t50Years);
    close(us.t90Years, si.t90Years);
    us.timeCurve.total.forEach((v, i) => {
      close(v * IN_TO_MM, si.timeCurve.total[i] as number);
    });
    us.atTimes.forEach((a, i) => {
      close(a.total * IN_TO_MM, si.atTimes[i]?.total as number);
    });
  });

  it('gives the same ranges and drivers', () => {
    const a = us.ranges;
    const b = si.ranges;
    expect(a && b).toBeTruthy();
    if (!a || !b) return;
    for (const key of ['p10', 'p50', 'p90'] as const) {
      close(a.finalSettlement[key] * IN_TO_MM, b.finalSettlement[key]);
      close(a.t90Years[key], b.t90Years[key]);
      a.atTimes.forEach((t, i) => {
        close(t[key] * IN_TO_MM, b.atTimes[i]?.[key] as number);
      });
    }
    expect(a.finalSettlement.p10).toBeLessThan(a.finalSettlement.p50);
    expect(a.finalSettlement.p50).toBeLessThan(a.finalSettlement.p90);
    expect(a.drivers.finalSettlement.map((d) => d.parameter)).toEqual(b.drivers.finalSettlement.map((d) => d.parameter));
    expect(a.drivers.t90[0]?.parameter).toBe('cv');
  });
});

describe('worked example checked by hand on the centreline with one sublayer per layer', () => {
  it("matches a hand calculation with Osterberg's chart formula and UFC Eqs. 5-12 to 5-14", () => {
    const body = estimatePreviewSchema.parse({
      ...usBody,
      layers: [
        { ...usBody.layers[0], cc: 1.1, e0: 2.6, cv: 0.05, ccE0Correlation: undefined },
        { ...usBody.layers[1], sigmaP: undefined, ocr: 1.2 },
      ],
      load: { ...usBody.load, pointOffset: 0 },
      options: { designLifeYears: 30, sublayers: { mode: 'fixed', perLayer: 1 } },
    });
    const result = previewEstimate(body);
    // Hand calculation, US units. Osterberg (1957) centreline: 2 × (q/π)[((a+b)/a)(α1+α2) − (b/a)α2] (from memory).
    const q = 10 * 120;
    const osterberg = (z: number) => {
      const a = 20;
      const b = 30;
      const alpha2 = Math.atan(b / z);
      const alpha1 = Math.atan((a + b) / z) - alpha2;
      return ((2 * q) / Math.PI) * (((a + b) / a) * (alpha1 + alpha2) - (b / a) * alpha2);
    };
    // Layer 1 mid-point 7.5 ft: σv = 3×100 + 4.5×102, u = 4.5×62.4. Layer 2 mid-point 25 ft: σv = 3×100 + 12×102 + 10×112... below water: 115.
    const s1v0 = 3 * 100 + 4.5 * 102 - 4.5 * 62.4;
    const s2v0 = 3 * 100 + 12 * 102 + 10 * 115 - 22 * 62.4;
    const strain = (cc: number, cr: number, e0: number, v0: number, d: number, p: number) =>
      p <= v0
        ? (cc / (1 + e0)) * Math.log10((v0 + d) / v0)
        : v0 + d <= p
          ? (cr / (1 + e0)) * Math.log10((v0 + d) / v0)
          : (cr * Math.log10(p / v0) + cc * Math.log10((v0 + d) / p)) / (1 + e0);
    const s1 = strain(1.1, 0.11, 2.6, s1v0, osterberg(7.5), 1.2 * s1v0) * 15 * 12;
    const s2 = strain(0.4, 0.05, 1.1, s2v0, osterberg(25), 1.2 * s2v0) * 20 * 12;
    expect(result.sublayers[0]?.sigmaV0).toBeCloseTo(s1v0, 8);
    expect(result.sublayers[1]?.deltaSigma).toBeCloseTo(osterberg(25), 8);
    expect(result.settlement.layers[0]?.primary).toBeCloseTo(s1, 8);
    expect(result.settlement.layers[1]?.primary).toBeCloseTo(s2, 8);
  });
});
