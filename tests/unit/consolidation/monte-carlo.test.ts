import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { runDeterministic } from '../../../src/lib/consolidation/deterministic';
import { toEngineInput } from '../../../src/lib/consolidation/input-conversion';
import { runMonteCarlo } from '../../../src/lib/consolidation/monte-carlo';
import { type EstimatePreviewBody, estimatePreviewSchema } from '../../../src/lib/schemas/estimate-preview';
import { embankmentBody } from './fixtures';

const deterministicFor = (body: EstimatePreviewBody) => runDeterministic(toEngineInput(estimatePreviewSchema.parse(body)));
const TIMES = [0.05, 0.3, 1, 3, 10, 40, 120];

/** Asserts that a zero-spread run reproduces the deterministic estimate (published Cα/Cc groups carry a range, so use a value). */
function expectReproduces(input: EstimatePreviewBody, timeTolerance = 1e-3) {
  const body = {
    ...input,
    layers: input.layers.map((l) => (typeof l.cAlphaOverCc === 'string' ? { ...l, cAlphaOverCc: 0.05 } : l)),
  };
  const det = deterministicFor(body);
  const run = runMonteCarlo(det, TIMES, 50, 3);
  const secondaryAtLife = det.settlementAt(det.input.designLifeYears).secondaryM;
  for (let r = 0; r < run.realisations; r++) {
    expect(run.finalPrimaryM[r] as number).toBeCloseTo(det.primaryM, 12);
    expect(run.finalM[r] as number).toBeCloseTo(det.primaryM + secondaryAtLife, 5);
    expect(Math.abs((run.t90Years[r] as number) / det.t90Years - 1)).toBeLessThan(1e-4);
  }
  TIMES.forEach((t, i) => {
    const s = det.settlementAt(t);
    const expected = s.primaryM + s.secondaryM;
    expect(Math.abs((run.settlementAtTimesM[i * run.realisations] as number) - expected)).toBeLessThan(
      timeTolerance * det.primaryM,
    );
  });
  expect(run.varying).toHaveLength(0);
}

describe('Monte Carlo', () => {
  it('with zero-spread distributions reproduces the deterministic result: embankment, two layers, solver', () => {
    expectReproduces(
      embankmentBody({
        layers: embankmentBody().layers.map((l) => ({ ...l, cv: { type: 'lognormal', mean: l.cv as number, sd: 0 } })),
      }),
    );
  });

  it('reproduces the deterministic result for a single layer (series), with ramp loading, and with drains', () => {
    const single = embankmentBody({
      layers: [embankmentBody().layers[0] as EstimatePreviewBody['layers'][number]],
      load: { type: 'wideFill', pressure: 50 },
      drainage: { top: 'pervious', bottom: 'impervious' },
    });
    expectReproduces(single);
    expectReproduces({ ...single, constructionTimeYears: 0.8 });
    expectReproduces({
      ...embankmentBody(),
      verticalDrains: { pattern: 'triangular', spacing: 1.5, drain: { type: 'band', width: 100, thickness: 4 }, chOverCv: 2 },
    });
    expectReproduces({
      ...embankmentBody(),
      constructionTimeYears: 0.5,
      verticalDrains: {
        pattern: 'square',
        spacing: 1.8,
        drain: { type: 'circular', diameter: 60 },
        ch: 3,
        smear: { ratio: 2, khOverKs: 2 },
        dischargeCapacity: 100,
      },
    });
  });

  it('reproduces the deterministic result for random single-value profiles (property)', () => {
    fc.assert(
      fc.property(
        fc.record({
          cc: fc.double({ min: 0.1, max: 2, noNaN: true }),
          crRatio: fc.double({ min: 0.05, max: 0.3, noNaN: true }),
          e0: fc.double({ min: 0.5, max: 4, noNaN: true }),
          ocr: fc.double({ min: 1, max: 3, noNaN: true }),
          cv: fc.double({ min: 0.1, max: 20, noNaN: true }),
          q: fc.double({ min: 10, max: 150, noNaN: true }),
          bottom: fc.constantFrom('pervious', 'impervious'),
        }),
        ({ cc, crRatio, e0, ocr, cv, q, bottom }) => {
          const base = embankmentBody();
          const [first, second] = base.layers as [EstimatePreviewBody['layers'][number], EstimatePreviewBody['layers'][number]];
          expectReproduces({
            ...base,
            layers: [{ ...first, cc, cr: cc * crRatio, e0, ocr, cv }, second],
            load: { type: 'strip', pressure: q, width: 12, pointOffset: 1 },
            drainage: { top: 'pervious', bottom },
          });
          return true;
        },
      ),
      { seed: 42, numRuns: 15 },
    );
  });

  const uncertain = () =>
    deterministicFor(
      embankmentBody({
        layers: [
          {
            name: 'Soft clay',
            thickness: 6,
            unitWeightAboveWater: 16,
            unitWeightBelowWater: 16.5,
            cc: { type: 'normal', mean: 0.9, sd: 0.15 },
            cr: 0.09,
            e0: { type: 'normal', mean: 2.1, sd: 0.2 },
            ccE0Correlation: 0.8,
            ocr: 1.3,
            cv: { type: 'lognormal', mean: 1.5, sd: 0.8 },
          },
        ],
      }),
    );

  it('gives the same result for the same seed and a different one for another seed', () => {
    const det = uncertain();
    const a = runMonteCarlo(det, TIMES, 500, 11);
    const b = runMonteCarlo(det, TIMES, 500, 11);
    const c = runMonteCarlo(det, TIMES, 500, 12);
    expect(Array.from(a.finalM)).toEqual(Array.from(b.finalM));
    expect(Array.from(a.settlementAtTimesM)).toEqual(Array.from(b.settlementAtTimesM));
    expect(Array.from(a.t90Years)).toEqual(Array.from(b.t90Years));
    expect(Array.from(a.finalM)).not.toEqual(Array.from(c.finalM));
  });

  it('correlates Cc and e0 through normal scores as requested', () => {
    const run = runMonteCarlo(uncertain(), TIMES, 20000, 5);
    const cc = run.varying.find((v) => v.parameter === 'Cc')?.values as Float64Array;
    const e0 = run.varying.find((v) => v.parameter === 'e0')?.values as Float64Array;
    const mean = (x: Float64Array) => x.reduce((s, v) => s + v, 0) / x.length;
    const mc = mean(cc);
    const me = mean(e0);
    let sxy = 0;
    let sxx = 0;
    let syy = 0;
    for (let i = 0; i < cc.length; i++) {
      sxy += ((cc[i] as number) - mc) * ((e0[i] as number) - me);
      sxx += ((cc[i] as number) - mc) ** 2;
      syy += ((e0[i] as number) - me) ** 2;
    }
    expect(sxy / Math.sqrt(sxx * syy)).toBeCloseTo(0.8, 1);
  });

  it('makes t90 scale with 1/cv exactly for a single layer', () => {
    const det = uncertain();
    const run = runMonteCarlo(det, TIMES, 300, 8);
    const cv = run.varying.find((v) => v.parameter === 'cv')?.values as Float64Array;
    for (let r = 0; r < run.realisations; r++) {
      // Single layer: Tv = cv·t/Hdr², so t90·cv is the same for every realisation (source: UFC 3-220-10 Eq. 5-15).
      const product = (run.t90Years[r] as number) * (cv[r] as number);
      expect(product / ((run.t90Years[0] as number) * (cv[0] as number))).toBeCloseTo(1, 3);
    }
  });
});
