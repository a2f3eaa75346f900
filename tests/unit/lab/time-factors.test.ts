import { describe, expect, it } from 'vitest';
import { T50, T90, TAYLOR_FACTOR } from '../../../src/lib/lab/time-factors';
import { seriesDegree } from './support';

/** Tv at which the series gives U, by bisection on the series itself. */
function tvFor(u: number): number {
  let lo = 0.001;
  let hi = 3;
  for (let k = 0; k < 80; k++) {
    const mid = (lo + hi) / 2;
    if (seriesDegree(mid) < u) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

describe('time factors of the fitting methods, from the exact series', () => {
  it('T50 is the Tv at which the exact series gives U = 50 %', () => {
    // source: Terzaghi (1943), U = 1 − Σ (2/M²)·exp(−M²Tv); the series is summed in the test, not read from a table
    expect(T50).toBeCloseTo(tvFor(0.5), 9);
    expect(seriesDegree(T50)).toBeCloseTo(0.5, 10);
  });

  it('T90 is the Tv at which the exact series gives U = 90 %', () => {
    // source: Terzaghi (1943), as above
    expect(T90).toBeCloseTo(tvFor(0.9), 9);
    expect(seriesDegree(T90)).toBeCloseTo(0.9, 10);
  });

  it('round to the published 0.197 and 0.848', () => {
    // source: Casagrande's 0.197 and Taylor's 0.848, UFC 3-220-10 §5-5.3.4.1 and Fig. 5-16
    expect(T50.toFixed(3)).toBe('0.197');
    expect(T90.toFixed(3)).toBe('0.848');
  });

  it("Taylor's factor is √(T90 / ((π/4)·0.9²)) ≈ 1.15", () => {
    // source: Taylor (1948), Fundamentals of Soil Mechanics: the 90 % point lies at 1.15 times the abscissa of the
    // initial straight line U = 2√(Tv/π); here from the exact series
    expect(TAYLOR_FACTOR).toBeCloseTo(Math.sqrt(tvFor(0.9) / ((Math.PI / 4) * 0.81)), 9);
    expect(TAYLOR_FACTOR.toFixed(2)).toBe('1.15');
  });

  it('the initial straight line U = 2√(Tv/π) holds to within 0.1 % of U up to U = 50 %', () => {
    // source: Terzaghi (1943) small-time solution, the straight line both constructions rest on: exact to 1e-10
    // below Tv = 0.05, 0.0005 short of the series at T50 (values computed here)
    for (const tv of [0.01, 0.05]) expect(Math.abs(seriesDegree(tv) - 2 * Math.sqrt(tv / Math.PI))).toBeLessThan(1e-10);
    expect(Math.abs(seriesDegree(T50) - 2 * Math.sqrt(T50 / Math.PI))).toBeLessThan(0.001);
    expect(Math.abs(seriesDegree(0.287) - 2 * Math.sqrt(0.287 / Math.PI))).toBeGreaterThan(0.003);
  });
});
