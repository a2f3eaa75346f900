import { describe, expect, it } from 'vitest';
import { deficitTable, lookupDeficit } from '../../../src/lib/consolidation/deficit-table';
import { lookupDegree, tableFromFunction } from '../../../src/lib/consolidation/degree-table';
import { equivalentLayerTauYears } from '../../../src/lib/consolidation/drainage-groups';
import { olsonRampDegree } from '../../../src/lib/consolidation/ramp-loading';
import { degreeOfConsolidation, integratedDegree } from '../../../src/lib/consolidation/terzaghi';

describe('dense U(ln t) table', () => {
  it('reproduces the Terzaghi series within 1e-4 everywhere, including outside its range', () => {
    const cv = 2;
    const hdr = 4;
    const exact = (t: number) => degreeOfConsolidation((cv * t) / (hdr * hdr));
    const tau = (hdr * hdr) / cv;
    const table = tableFromFunction(exact, 1e-6 * tau, 100 * tau);
    let worst = 0;
    for (let lnT = Math.log(1e-9 * tau); lnT < Math.log(1e3 * tau); lnT += 0.0037) {
      worst = Math.max(worst, Math.abs(lookupDegree(table, lnT) - exact(Math.exp(lnT))));
    }
    expect(worst).toBeLessThan(1e-4);
  });
});

describe('running deficit ∫(1 − U)dt for ramp loading', () => {
  it('matches the series integral and gives Olson ramp degrees within 1e-4', () => {
    // source: ∫U dTv in closed form (Olson 1977 series), here compared with the tabulated version
    const tau = 10;
    const table = tableFromFunction((t) => degreeOfConsolidation(t / tau), 1e-6 * tau, 100 * tau);
    const deficit = deficitTable(table);
    for (const t of [1e-4, 0.05, 1, 4, 15, 60, 3000]) {
      const exact = t - tau * integratedDegree(t / tau);
      expect(Math.abs(lookupDeficit(deficit, Math.log(t)) - exact) / exact).toBeLessThan(1e-4);
    }
    for (const [t, tc] of [
      [2, 5],
      [8, 5],
      [40, 0.01],
    ] as const) {
      const start = t - tc;
      const window = start > 0 ? tc : t;
      const atStart = start > 0 ? lookupDeficit(deficit, Math.log(start)) : 0;
      const ramp = (window - (lookupDeficit(deficit, Math.log(t)) - atStart)) / tc;
      expect(Math.abs(ramp - olsonRampDegree(t / tau, tc / tau))).toBeLessThan(1e-4);
    }
  });
});

describe('equivalent single layer', () => {
  it('transforms thicknesses by √(cv′/cv): 4 m at cv 1 and 6 m at cv 4 m²/yr → H′ = 7 m, τ = 49 years one-way', () => {
    // source: UFC 3-220-10 Eqs. 5-16, 5-17, worked by hand with cv′ = 1 m²/yr: H′ = 4 + 6·√(1/4) = 7 m
    expect(equivalentLayerTauYears([4, 6], [1, 4], false)).toBeCloseTo(49, 12);
    expect(equivalentLayerTauYears([4, 6], [1, 4], true)).toBeCloseTo(49 / 4, 12);
  });
});
