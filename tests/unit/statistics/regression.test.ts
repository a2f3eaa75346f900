import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import tQuantile from '@stdlib/stats-base-dists-t-quantile';
import { linearRegression, rSquared } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { regressionBands } from '../../../src/lib/statistics/bands';
import { fitLine } from '../../../src/lib/statistics/regression';
import { studentTQuantile, twoSidedT } from '../../../src/lib/statistics/student-t';
import { normalFrom, seededRandom } from './support/simulated-selection';

const csv = readFileSync(join(import.meta.dirname, '../../fixtures/statistics/nist-norris.csv'), 'utf8')
  .trim()
  .split('\n')
  .slice(1);
const norrisY = csv.map((line) => Number(line.split(',')[0]));
const norrisX = csv.map((line) => Number(line.split(',')[1]));

const relative = (actual: number, expected: number) => Math.abs(actual - expected) / Math.abs(expected);

describe('ordinary least squares against NIST StRD Norris', () => {
  // source: NIST Statistical Reference Datasets, linear regression, "Norris" — certified values
  const fit = fitLine(norrisX, norrisY);
  it('has 36 observations', () => {
    expect(norrisX).toHaveLength(36);
    expect(fit?.n).toBe(36);
  });
  it.each([
    ['slope B1', () => fit?.slope, 1.00211681802045],
    ['intercept B0', () => fit?.intercept, -0.262323073774029],
    ['sd of B1', () => fit?.slopeStandardError, 4.29796848199937e-4],
    ['sd of B0', () => fit?.interceptStandardError, 0.232818234301152],
    ['residual sd', () => fit?.residualSd, 0.884796396144373],
    ['R²', () => fit?.rSquared, 0.999993745883712],
  ])('%s to 1e-9 relative', (_name, value, certified) => {
    expect(relative(value() as number, certified)).toBeLessThan(1e-9);
  });
  it('r is the signed root of R²', () => {
    expect(fit?.r).toBeCloseTo(Math.sqrt(0.999993745883712), 12);
  });
  it('agrees with simple-statistics on slope, intercept and R²', () => {
    // source: simple-statistics 7.12.1 linearRegression / rSquared (an independent implementation)
    const pairs = norrisX.map((x, i) => [x, norrisY[i] as number]);
    const { m, b } = linearRegression(pairs);
    expect(relative(fit?.slope as number, m)).toBeLessThan(1e-9);
    expect(relative(fit?.intercept as number, b)).toBeLessThan(1e-9);
    expect(
      relative(
        fit?.rSquared as number,
        rSquared(pairs, (x) => m * x + b),
      ),
    ).toBeLessThan(1e-9);
  });
  it('refuses fewer than 3 pairs and x without spread', () => {
    expect(fitLine([1, 2], [3, 4])).toBeNull();
    expect(fitLine([2, 2, 2], [1, 2, 3])).toBeNull();
  });
});

describe('Student t quantiles', () => {
  // source: @stdlib/stats-base-dists-t-quantile 0.2.3 (independent of jstat, which the core uses)
  it.each([1, 2, 3, 5, 8, 10, 20, 34, 100, 1000])('df %i: 0.9, 0.95, 0.975, 0.995 to 1e-7 relative', (df) => {
    for (const p of [0.9, 0.95, 0.975, 0.995]) expect(relative(studentTQuantile(p, df), tQuantile(p, df))).toBeLessThan(1e-7);
  });
  it('matches printed table values', () => {
    // source: Fisher & Yates, Statistical Tables (1963), Table III — t(0.95, 10) = 1.812, t(0.975, 5) = 2.571 (from memory)
    expect(studentTQuantile(0.95, 10)).toBeCloseTo(1.812, 3);
    expect(studentTQuantile(0.975, 5)).toBeCloseTo(2.571, 3);
  });
  it('gives the two-sided value of a band level', () => {
    expect(twoSidedT(0.9, 34)).toBeCloseTo(tQuantile(0.95, 34), 6);
  });
});

describe('confidence and prediction bands', () => {
  const fit = fitLine(norrisX, norrisY);
  if (!fit) throw new Error('no fit');
  it('at the mean of x are ± t·s/√n and ± t·s·√(1 + 1/n)', () => {
    // source: Draper & Smith (1998) §1.4 — at x = x̄ the leverage is 1/n
    const [band] = regressionBands(fit, [fit.xMean], 0.9);
    const t = tQuantile(0.95, 34);
    expect(relative((band?.confidenceHigh as number) - (band?.fit as number), (t * fit.residualSd) / 6)).toBeLessThan(1e-7);
    expect(
      relative((band?.predictionHigh as number) - (band?.fit as number), t * fit.residualSd * Math.sqrt(1 + 1 / 36)),
    ).toBeLessThan(1e-7);
  });

  it('cover the true line and new observations about 90 % of the time', () => {
    // source: the sampling theory of the normal linear model — a 90 % interval covers in 90 % of repeats;
    // 2000 seeded repeats give a binomial sd of 0.67 %, so ±2.5 % is a 3.7-sd allowance
    const random = seededRandom(42);
    const normal = normalFrom(random);
    let meanCovered = 0;
    let newCovered = 0;
    const repeats = 2000;
    const xs = Array.from({ length: 12 }, (_, i) => 20 + 6 * i);
    for (let r = 0; r < repeats; r++) {
      const ys = xs.map((x) => 0.009 * (x - 10) + 0.05 * normal());
      const f = fitLine(xs, ys);
      if (!f) throw new Error('no fit');
      const x0 = 20 + 66 * random();
      const [band] = regressionBands(f, [x0], 0.9);
      const truth = 0.009 * (x0 - 10);
      const fresh = truth + 0.05 * normal();
      if (band && truth >= band.confidenceLow && truth <= band.confidenceHigh) meanCovered++;
      if (band && fresh >= band.predictionLow && fresh <= band.predictionHigh) newCovered++;
    }
    expect(Math.abs(meanCovered / repeats - 0.9)).toBeLessThan(0.025);
    expect(Math.abs(newCovered / repeats - 0.9)).toBeLessThan(0.025);
  });
});
