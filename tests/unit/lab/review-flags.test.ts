import { describe, expect, it } from 'vitest';
import { KPA_PER_PSF } from '../../../src/lib/consolidation/units';
import { interpretIncrementalTest } from '../../../src/lib/lab/interpret-incremental';
import { REVIEW_TOLERANCES, reviewFlags } from '../../../src/lib/lab/review-flags';
import { withDialSlip } from '../../../src/lib/lab/synthetic/planted-problem';
import { syntheticIncrementalTest } from '../../../src/lib/lab/synthetic/synthetic-test';

const curve = { e0: 1.8, cc: 0.7, cr: 0.08, sigmaPKpa: 90, sigmaV0Kpa: 60, deltaEOverE0: 0.02, bendLogCycles: 0.02 };
const test = syntheticIncrementalTest({
  curve,
  stressesKpa: [12.5, 25, 50, 100, 200, 400, 800, 200, 50],
  cvM2PerYear: 2,
  cAlphaOverCc: 0.04,
  seed: 11,
  noiseMm: 0.0005,
});
const interpretation = interpretIncrementalTest(test, {}, { verticalEffectiveStressKpa: 60 });
const truthful = {
  initialVoidRatio: 1.8,
  compressionIndex: 0.7,
  recompressionIndex: 0.08,
  preconsolidationStress: 90,
  cvNc: 2,
  secondaryCompressionIndex: 0.028,
};

describe('review flags: submitted values against the readings', () => {
  it('raises none when the submitted values are what the readings give', () => {
    expect(reviewFlags(interpretation, truthful)).toEqual([]);
  });

  it('flags σ′p typed in psf as if kPa, naming both constructions', () => {
    const flags = reviewFlags(interpretation, { ...truthful, preconsolidationStress: Math.round(90 / KPA_PER_PSF) });
    expect(flags).toHaveLength(1);
    expect(flags[0]).toMatchObject({
      parameter: 'preconsolidationStress',
      kind: 'disagrees',
      submitted: 1880,
      tolerance: { relative: 0.2 },
    });
    expect(flags[0]?.derived).toHaveLength(2);
    expect(flags[0]?.message).toMatch(
      /^σ′p was submitted as 1880; the readings give \d+(\.\d+)? and \d+(\.\d+)?, outside ±20 %\.$/,
    );
  });

  it('holds each value to its stated tolerance, at its edge', () => {
    const cc = interpretation.cc.ok ? interpretation.cc.value.value : 0;
    const { relative } = REVIEW_TOLERANCES.compressionIndex as { relative: number };
    // |derived/submitted − 1| ≤ 0.15 passes; just beyond it is flagged
    expect(reviewFlags(interpretation, { compressionIndex: cc / (1 + relative) + 1e-9 })).toEqual([]);
    expect(reviewFlags(interpretation, { compressionIndex: cc / (1 + relative) - 1e-6 })).toHaveLength(1);
    expect(reviewFlags(interpretation, { initialVoidRatio: 1.8 + 0.049 })).toEqual([]);
    expect(reviewFlags(interpretation, { initialVoidRatio: 1.8 + 0.051 })[0]?.message).toBe(
      'e0 was submitted as 1.85; the readings give 1.8, outside ±0.05.',
    );
    expect(reviewFlags(interpretation, { cvNc: 3.9 })).toEqual([]);
    expect(reviewFlags(interpretation, { cvNc: 5.5 })[0]).toMatchObject({ parameter: 'cvNc', tolerance: { factor: 2 } });
  });

  it('flags a submitted value the readings refuse, with the reason', () => {
    const slipped = interpretIncrementalTest(withDialSlip(test, 5, 2.5, 60));
    const flags = reviewFlags(slipped, truthful);
    const sigmaP = flags.find((f) => f.parameter === 'preconsolidationStress');
    expect(sigmaP?.kind).toBe('not-derivable');
    expect(sigmaP?.message).toMatch(
      /^σ′p was submitted as 90, but the readings do not support it: cannot determine σ′p \(Casagrande\): increment 5/,
    );
  });

  it('raises nothing for values the readings simply do not cover', () => {
    const noUnloading = syntheticIncrementalTest({
      curve,
      stressesKpa: [12.5, 25, 50, 100, 200, 400],
      cvM2PerYear: 2,
      seed: 1,
      readingTimesMin: null,
    });
    const flags = reviewFlags(interpretIncrementalTest(noUnloading), { recompressionIndex: 0.3, cvNc: 50 });
    expect(flags).toEqual([]);
  });
});
