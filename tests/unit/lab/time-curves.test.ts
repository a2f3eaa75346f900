import { describe, expect, it } from 'vitest';
import { casagrandeLogTime } from '../../../src/lib/lab/casagrande-log-time';
import { taylorRootTime } from '../../../src/lib/lab/taylor-root-time';
import type { TimeReading } from '../../../src/lib/lab/test-input';
import { MINUTES_PER_YEAR, TAYLOR_FACTOR } from '../../../src/lib/lab/time-factors';
import { prepareReadings } from '../../../src/lib/lab/time-readings';
import { seriesDegree } from './support';

// One increment: 0.05 mm at once, then 0.80 mm of primary consolidation with cv = 1.5 m²/yr over a drainage
// path of 9.5 mm, read at the usual times; optionally secondary compression after Tv = 2.
const HDR_MM = 9.5;
const CV = 1.5;
const TIMES = [0.1, 0.25, 0.5, 1, 2, 4, 8, 15, 30, 60, 120, 240, 480, 1440];
const tv = (tMin: number) => (CV * (tMin / MINUTES_PER_YEAR)) / (HDR_MM / 1000) ** 2;

function readings({ secondaryMmPerCycle = 0, lastMin = 1440 } = {}): TimeReading[] {
  const tp = (2 * (HDR_MM / 1000) ** 2 * MINUTES_PER_YEAR) / CV;
  return [0, ...TIMES.filter((t) => t <= lastMin)].map((t) => ({
    elapsedMin: t,
    deformationMm: t === 0 ? 2 : 2.05 + 0.8 * seriesDegree(tv(t)) + (t > tp ? secondaryMmPerCycle * Math.log10(t / tp) : 0),
  }));
}

function prepared(list: TimeReading[]) {
  const p = prepareReadings('cvRootTime', list, 1);
  if (!p.ok) throw new Error(p.message);
  return p.value;
}

describe("cv by Taylor's root-time method (Taylor 1948; UFC 3-220-10 Fig. 5-21)", () => {
  const result = taylorRootTime(prepared(readings()), HDR_MM);
  if (!result.ok) throw new Error(result.message);
  const t = result.value;

  it('places the corrected zero d0 where the early straight line meets √t = 0', () => {
    // the immediate 0.05 mm is not consolidation: d0 = 2.05 mm
    expect(t.d0Mm).toBeCloseTo(2.05, 3);
    expect(t.initialLine.from).toEqual({ timeMin: 0, deformationMm: t.d0Mm });
  });

  it('draws the second line with abscissae 1.15 times the first', () => {
    // source: Taylor (1948): the factored line's slope in √t is the initial line's divided by the factor
    const slope = (s: { from: { timeMin: number; deformationMm: number }; to: { timeMin: number; deformationMm: number } }) =>
      (s.to.deformationMm - s.from.deformationMm) / (Math.sqrt(s.to.timeMin) - Math.sqrt(s.from.timeMin));
    expect(slope(t.factoredLine)).toBeCloseTo(slope(t.initialLine) / TAYLOR_FACTOR, 9);
  });

  it('reads t90 and gives cv = T90·Hdr²/t90 back within 1 %', () => {
    // the readings follow Terzaghi's exact series with cv = 1.5 m²/yr
    expect(Math.abs(t.cvM2PerYear / CV - 1)).toBeLessThan(0.01);
    expect(Math.abs(seriesDegree(tv(t.t90Min)) - 0.9)).toBeLessThan(0.005);
    expect(t.d100Mm).toBeCloseTo(2.85, 2);
  });

  it('takes a steward’s fitting range and records it', () => {
    const chosen = taylorRootTime(prepared(readings()), HDR_MM, { fitRangeMin: { fromMin: 0.25, toMin: 2 } });
    expect(chosen.ok && chosen.value.chosenBy).toBe('person');
    expect(chosen.ok && chosen.value.fitRange).toEqual({ fromMin: 0.25, toMin: 2 });
  });

  it('is refused when the readings end before 90 % consolidation', () => {
    const short = taylorRootTime(prepared(readings({ lastMin: 15 })), HDR_MM);
    expect(short).toMatchObject({ ok: false, reason: 'incomplete' });
  });
});

describe("cv by Casagrande's log-time method (Casagrande & Fadum 1940; UFC 3-220-10 Fig. 5-21)", () => {
  const result = casagrandeLogTime(prepared(readings({ secondaryMmPerCycle: 0.06 })), HDR_MM);
  if (!result.ok) throw new Error(result.message);
  const c = result.value;

  it('places d0 from times t and 4t on the early parabola', () => {
    // source: d0 = d(t) − (d(4t) − d(t)); on the early curve d − d0 ∝ √t this returns the true zero, 2.05 mm
    expect(c.d0Pairs.length).toBeGreaterThan(0);
    for (const p of c.d0Pairs) expect(p.t2Min).toBe(4 * p.t1Min);
    expect(c.d0Mm).toBeCloseTo(2.05, 3);
  });

  it('meets the tangent at the inflection with the straight tail at d100, and reads t50 halfway', () => {
    expect(c.tail.range.toMin).toBe(1440);
    // the tail's slope is the secondary compression put in (0.06 mm per log cycle), within 5 %
    expect(Math.abs(c.tail.mmPerLogCycle / 0.06 - 1)).toBeLessThan(0.05);
    expect(c.d50Mm).toBeCloseTo((c.d0Mm + c.d100Mm) / 2, 12);
    expect(c.t100Min).toBeGreaterThan(c.inflection.timeMin);
  });

  it('gives cv = T50·Hdr²/t50 back within 1 % when there is no secondary compression', () => {
    const pure = casagrandeLogTime(prepared(readings()), HDR_MM);
    expect(pure.ok && Math.abs(pure.value.cvM2PerYear / CV - 1)).toBeLessThan(0.01);
    expect(pure.ok && pure.value.d100Mm).toBeCloseTo(2.85, 2);
  });

  it('reads cv somewhat high when secondary compression starts only at Tv = 2 (the tail meets the tangent early)', () => {
    // a property of the construction on these readings, not a tolerance: cv within +2 % … +20 %
    expect(c.cvM2PerYear / CV).toBeGreaterThan(1.02);
    expect(c.cvM2PerYear / CV).toBeLessThan(1.2);
  });

  it('is refused when the readings stop before the tail', () => {
    const short = casagrandeLogTime(prepared(readings({ lastMin: 60 })), HDR_MM);
    expect(short).toMatchObject({ ok: false, reason: 'incomplete' });
  });
});

describe('readings that cannot be fitted', () => {
  it('are refused when they go backwards, are too few, or hardly move', () => {
    const slipped = readings().map((r) => (r.elapsedMin >= 60 ? { ...r, deformationMm: r.deformationMm - 0.3 } : r));
    const back = prepareReadings('cvRootTime', slipped, 1);
    expect(!back.ok && back.message).toMatch(
      /^cannot determine cv \(root time\): the reading at 60 min \([\d.]+ mm\) goes back past the one at 30 min/,
    );
    expect(prepareReadings('cvLogTime', readings().slice(0, 4), 1)).toMatchObject({ ok: false, reason: 'too-few-points' });
    const still = readings().map((r) => ({ ...r, deformationMm: 2 + r.elapsedMin * 1e-6 }));
    expect(prepareReadings('cvLogTime', still, 1)).toMatchObject({ ok: false, reason: 'too-noisy' });
    expect(prepareReadings('cvLogTime', undefined, 1)).toMatchObject({ ok: false, reason: 'no-readings' });
  });

  it('is refused as too noisy when the early readings scatter about their line', () => {
    const bumps: Record<number, number> = { 0.1: 0.04, 0.5: -0.04, 1: 0.04, 2: -0.02 };
    const noisy = readings().map((r) => ({ ...r, deformationMm: r.deformationMm + (bumps[r.elapsedMin] ?? 0) }));
    const result = taylorRootTime(prepared(noisy), HDR_MM);
    expect(!result.ok && result.message).toMatch(/^cannot determine cv \(root time\): the early readings scatter by/);
  });
});
