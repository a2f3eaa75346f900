import fc from 'fast-check';
import { describe, expect, it, test } from 'vitest';
import { indexStrain, mvStrain, settlementFromStrainM } from '../../../src/lib/consolidation/settlement-primary';

// Worked example: H = 4 m, Cc = 0.8, Cr = 0.08, e0 = 1.8, σ'v0 = 50 kPa, Δσ = 60 kPa.
// Expected values worked by hand (calculator) from the UFC equations named beside each row.
const cases: Array<[string, number, number, string]> = [
  // source: UFC 3-220-10 Eq. 5-12 (NC): 0.8/2.8 × 4 × log10(110/50) = 0.39134 m
  ['normally consolidated', 50, 0.3913402, 'normally consolidated'],
  // source: UFC 3-220-10 Eq. 5-13 (OC, final below σ'p): 0.08/2.8 × 4 × log10(110/50) = 0.039134 m
  ['overconsolidated', 150, 0.03913402, 'overconsolidated'],
  // source: UFC 3-220-10 Eq. 5-14 (crossing σ'p = 80): 4/2.8 × [0.08·log10(80/50) + 0.8·log10(110/80)] = 0.18139 m
  ['crossing', 80, 0.1813882, 'crossing preconsolidation'],
];

describe('primary settlement of a layer (UFC 3-220-10 Eqs. 5-12 to 5-14)', () => {
  test.each(cases)('%s', (_label, sigmaP, settlementM, state) => {
    const result = indexStrain(0.8, 0.08, 1.8, 50, 60, sigmaP);
    expect(settlementFromStrainM(result.strain, 4)).toBeCloseTo(settlementM, 6);
    expect(result.state).toBe(state);
  });

  it('treats σ′p below σ′v0 (OCR < 1) as normally consolidated from σ′v0', () => {
    expect(indexStrain(0.8, 0.08, 1.8, 50, 60, 30).strain).toBe(indexStrain(0.8, 0.08, 1.8, 50, 60, 50).strain);
  });

  it('gives ε = mv·Δσ for the mv form: mv = 0.5 m²/MN, Δσ = 60 kPa, H = 4 m → 0.12 m', () => {
    // source: mv definition (from memory; e.g. Terzaghi, Peck & Mesri 1996), worked by hand
    expect(settlementFromStrainM(mvStrain(0.5e-3, 60), 4)).toBeCloseTo(0.12, 12);
  });

  const params = fc.record({
    cc: fc.double({ min: 0.05, max: 3, noNaN: true }),
    crRatio: fc.double({ min: 0.02, max: 0.5, noNaN: true }),
    e0: fc.double({ min: 0.3, max: 6, noNaN: true }),
    sigmaV0: fc.double({ min: 1, max: 500, noNaN: true }),
    delta: fc.double({ min: 0.1, max: 500, noNaN: true }),
  });

  it('NC equals the crossing formula when σ′p = σ′v0 (property)', () => {
    fc.assert(
      fc.property(params, ({ cc, crRatio, e0, sigmaV0, delta }) => {
        const cr = cc * crRatio;
        const nc = (cc / (1 + e0)) * Math.log10((sigmaV0 + delta) / sigmaV0);
        const crossing = (cr * Math.log10(sigmaV0 / sigmaV0) + cc * Math.log10((sigmaV0 + delta) / sigmaV0)) / (1 + e0);
        const engine = indexStrain(cc, cr, e0, sigmaV0, delta, sigmaV0).strain;
        return Math.abs(engine - nc) <= 1e-12 * nc && Math.abs(engine - crossing) <= 1e-12 * nc;
      }),
      { seed: 42, numRuns: 200 },
    );
  });

  it('OC-below equals the Cr formula whenever σ′p exceeds the final stress (property)', () => {
    fc.assert(
      fc.property(params, fc.double({ min: 1, max: 10, noNaN: true }), ({ cc, crRatio, e0, sigmaV0, delta }, margin) => {
        const cr = cc * crRatio;
        const sigmaP = (sigmaV0 + delta) * margin;
        const expected = (cr / (1 + e0)) * Math.log10((sigmaV0 + delta) / sigmaV0);
        return Math.abs(indexStrain(cc, cr, e0, sigmaV0, delta, sigmaP).strain - expected) <= 1e-12 * Math.max(expected, 1e-12);
      }),
      { seed: 42, numRuns: 200 },
    );
  });

  it('is continuous in σ′p and never decreases with Δσ (property)', () => {
    fc.assert(
      fc.property(params, fc.double({ min: 0, max: 1, noNaN: true }), ({ cc, crRatio, e0, sigmaV0, delta }, f) => {
        const cr = cc * crRatio;
        const sigmaP = sigmaV0 + f * delta;
        const below = indexStrain(cc, cr, e0, sigmaV0, delta, sigmaP * (1 - 1e-9)).strain;
        const above = indexStrain(cc, cr, e0, sigmaV0, delta, sigmaP * (1 + 1e-9)).strain;
        const more = indexStrain(cc, cr, e0, sigmaV0, delta * 1.1, sigmaP).strain;
        return Math.abs(below - above) < 1e-8 && more >= indexStrain(cc, cr, e0, sigmaV0, delta, sigmaP).strain;
      }),
      { seed: 42, numRuns: 200 },
    );
  });
});
