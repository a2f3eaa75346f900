import { describe, expect, it } from 'vitest';
import { type CurveState, compressionCurve } from '../../../src/lib/lab/compression-curve';
import { strainEnergyPreconsolidation, workCurve } from '../../../src/lib/lab/strain-energy-preconsolidation';
import type { IncrementalTestInput } from '../../../src/lib/lab/test-input';
import { bilinear, ladder, voidRatioTest } from './support';

function construct(test: IncrementalTestInput, choice = {}) {
  const curve = compressionCurve(test);
  if (!curve.ok) throw new Error(curve.message);
  return strainEnergyPreconsolidation(curve.value, choice);
}

const state = (stressKpa: number, strain: number): CurveState => ({
  incrementNo: 0,
  stressKpa,
  strain,
  voidRatio: 1,
  deformationMm: null,
  heightMm: null,
  branch: 'loading',
});

// Cr = 0.04 below σ′p = 100 kPa, Cc = 0.4 above; e0 = 1.25; loads doubling from 12.5 kPa
const e0 = 1.25;
const loading = ladder(12.5, 1600, 2).map((s) => [s, bilinear(1.0, 100, 0.04, 0.4)(s)] as const);

describe('σ′p by the strain-energy method (Becker, Crooks, Been & Jefferies 1987)', () => {
  it('sums the work per unit volume with the trapezoidal rule', () => {
    // source: Becker et al. (1987), W = Σ ½(σ′ᵢ₋₁ + σ′ᵢ)(εᵢ − εᵢ₋₁). By hand: 0.05, 0.05 + 0.15 = 0.2, 0.2 + 0.9 = 1.1 kJ/m³
    const work = workCurve([state(10, 0.01), state(20, 0.02), state(40, 0.05)]);
    expect(work.map((p) => p.workKjPerM3)).toEqual([0, 0.05, expect.closeTo(0.2, 12), expect.closeTo(1.1, 12)]);
  });

  it('draws straight pre- and post-yield lines whose slopes follow from Cr and Cc', () => {
    // source: on a straight e–log σ′ line of slope C, a load doubling adds ΔW = 1.5σ′·C·log10 2/(1 + e0) over
    // Δσ′ = σ′, so W rises linearly with slope 1.5·log10 2·C/(1 + e0) (trapezoidal rule of Becker et al. 1987)
    const result = construct(voidRatioTest(e0, loading));
    if (!result.ok) throw new Error(result.message);
    const rate = (c: number) => (1.5 * Math.log10(2) * c) / (1 + e0);
    expect(result.value.postYield.line.slope).toBeCloseTo(rate(0.4), 10);
    expect(result.value.preYield.line.slope).toBeCloseTo(rate(0.04), 10);
  });

  it('puts σ′p where the two lines meet: at the corner of an ideal curve loaded through it', () => {
    // both lines pass through the work at the corner (100 kPa), so they meet there
    const result = construct(voidRatioTest(e0, loading));
    expect(result.ok && result.value.sigmaPKpa).toBeCloseTo(100, 6);
    expect(result.ok && result.value.intersection.workKjPerM3).toBeCloseTo(
      result.ok ? (result.value.workCurve.find((p) => p.stressKpa === 100)?.workKjPerM3 ?? 0) : 0,
      9,
    );
    expect(result.ok && result.value.preYield.range).toEqual({ fromKpa: 12.5, toKpa: 50 });
    expect(result.ok && result.value.postYield.range).toEqual({ fromKpa: 100, toKpa: 400 });
  });

  it("recomputes from a steward's ranges, and records them", () => {
    const result = construct(voidRatioTest(e0, loading), {
      preYieldRange: { fromKpa: 25, toKpa: 50 },
      postYieldRange: { fromKpa: 400, toKpa: 1600 },
    });
    expect(result.ok && result.value.preYield.chosenBy).toBe('person');
    expect(result.ok && result.value.postYield.points.map((p) => p.stressKpa)).toEqual([400, 800, 1600]);
    expect(result.ok && result.value.sigmaPKpa).toBeCloseTo(100, 6);
  });

  it('is refused when the lines do not meet within the test', () => {
    const result = construct(voidRatioTest(e0, loading), {
      preYieldRange: { fromKpa: 400, toKpa: 1600 },
      postYieldRange: { fromKpa: 12.5, toKpa: 50 },
    });
    expect(!result.ok && result.message).toMatch(
      /^cannot determine σ′p \(strain energy\): the pre- and post-yield lines do not meet/,
    );
  });
});
