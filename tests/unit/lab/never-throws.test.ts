import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { interpretCrsTest } from '../../../src/lib/lab/crs-test';
import { interpretIncrementalTest } from '../../../src/lib/lab/interpret-incremental';
import { readReadingsCsv } from '../../../src/lib/lab/readings-csv/read-readings';
import { reviewFlags } from '../../../src/lib/lab/review-flags';
import { syntheticIncrementalTest } from '../../../src/lib/lab/synthetic/synthetic-test';

const anyNumber = fc.oneof(fc.double(), fc.double({ min: -10, max: 1000, noNaN: true }), fc.constant(Number.NaN));
const maybe = fc.option(anyNumber, { nil: null });

const testArbitrary = fc.record({
  specimen: fc.record({
    initialHeightMm: maybe,
    diameterMm: maybe,
    waterContentPct: maybe,
    specificGravity: maybe,
    dryMassG: maybe,
    initialVoidRatio: maybe,
  }),
  increments: fc.array(
    fc.record({
      incrementNo: fc.integer({ min: -2, max: 12 }),
      stressKpa: anyNumber,
      deformationMm: maybe,
      voidRatio: maybe,
      readings: fc.option(fc.array(fc.record({ elapsedMin: anyNumber, deformationMm: anyNumber }), { maxLength: 16 }), {
        nil: undefined,
      }),
    }),
    { maxLength: 12 },
  ),
});

describe('the lab core on arbitrary input', () => {
  it('never throws: every outcome is a value or a stated refusal', () => {
    fc.assert(
      fc.property(testArbitrary, (test) => {
        const r = interpretIncrementalTest(test, {}, { verticalEffectiveStressKpa: 50 });
        reviewFlags(r, { compressionIndex: 0.5, preconsolidationStress: 100, cvNc: 1 });
        for (const d of [r.curve, r.cc, r.cr, r.sigmaPCasagrande, r.sigmaPStrainEnergy, r.sampleQuality]) {
          if (!d.ok) expect(d.message).toMatch(/^cannot determine /);
        }
      }),
      { numRuns: 300, seed: 20260103 },
    );
  });

  it('never throws on real-looking tests spoiled by heavy noise, whatever a steward chooses', () => {
    const curve = { e0: 1.5, cc: 0.6, cr: 0.07, sigmaPKpa: 90, sigmaV0Kpa: 50, deltaEOverE0: 0.03, bendLogCycles: 0.03 };
    const stress = fc.double({ min: 1, max: 5000, noNaN: true });
    const range = fc.record({ fromKpa: stress, toKpa: stress });
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 0.5, noNaN: true }),
        fc.integer({ min: 1, max: 1000 }),
        fc.record({
          cc: fc.option(fc.record({ range }), { nil: undefined }),
          casagrande: fc.option(fc.record({ maxCurvatureStressKpa: stress }), { nil: undefined }),
          strainEnergy: fc.option(fc.record({ preYieldRange: range, postYieldRange: range }), { nil: undefined }),
          increments: fc.option(
            fc.constant({
              5: {
                rootTime: { fitRangeMin: { fromMin: 0.1, toMin: 30 } },
                logTime: { inflectionMin: 4, tailRangeMin: { fromMin: 100, toMin: 2000 } },
              },
            }),
            { nil: undefined },
          ),
        }),
        (noiseMm, seed, choices) => {
          const test = syntheticIncrementalTest({
            curve,
            stressesKpa: [12.5, 25, 50, 100, 200, 400, 800, 200],
            cvM2PerYear: 1,
            seed,
            noiseMm,
          });
          const r = interpretIncrementalTest(test, choices, { verticalEffectiveStressKpa: 50 });
          for (const inc of r.increments)
            for (const d of [inc.rootTime, inc.logTime, inc.cAlpha, inc.mv])
              if (!d.ok) expect(d.message).toMatch(/^cannot determine /);
        },
      ),
      { numRuns: 200, seed: 20260106 },
    );
  });

  it('reads any text as a readings file without throwing', () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 300 }), fc.option(fc.string({ maxLength: 200 }), { nil: undefined }), (a, b) => {
        const r = readReadingsCsv(b === undefined ? { increments: a } : { increments: a, timeReadings: b });
        expect(typeof r.ok).toBe('boolean');
      }),
      { numRuns: 300, seed: 20260104 },
    );
  });

  it('takes any CRS readings without throwing', () => {
    const reading = fc.record({
      elapsedMin: anyNumber,
      axialStressKpa: anyNumber,
      basePorePressureKpa: anyNumber,
      deformationMm: anyNumber,
    });
    fc.assert(
      fc.property(fc.array(reading, { maxLength: 30 }), maybe, (readings, e0) => {
        const r = interpretCrsTest({ specimen: { initialHeightMm: 20, diameterMm: 63.5, initialVoidRatio: e0 }, readings });
        expect(typeof r.points.ok).toBe('boolean');
      }),
      { numRuns: 300, seed: 20260105 },
    );
  });
});
