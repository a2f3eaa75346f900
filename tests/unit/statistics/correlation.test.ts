import { describe, expect, it } from 'vitest';
import { columnsFromRecords, correlatePair, type StatisticsRecord, statisticsContext } from '../../../src/lib/statistics';
import { fitLine } from '../../../src/lib/statistics/regression';
import { normalFrom, seededRandom, simulatedRecords } from './support/simulated-selection';

describe('correlation charts', () => {
  const records = simulatedRecords({ seed: 9, count: 300 });
  const context = statisticsContext(columnsFromRecords(records), { viewerFirmId: 'firm-1' });

  it('cv–LL is fitted on log10 cv, and its bands come back in m²/year', () => {
    const result = correlatePair(context, 'cv-ll');
    const own = records.filter((r) => r.firmId === 'firm-1');
    const direct = fitLine(
      own.map((r) => r.liquidLimitPct as number),
      own.map((r) => Math.log10(r.cvNcM2PerYear as number)),
    );
    expect(result.own?.line?.fit.slope).toBeCloseTo(direct?.slope as number, 12);
    const band = result.own?.line?.bands[0];
    const x = band?.x as number;
    expect(band?.fit).toBeCloseTo(10 ** ((direct?.intercept as number) + (direct?.slope as number) * x), 10);
    expect(band?.predictionLow).toBeLessThan(band?.confidenceLow as number);
    expect(band?.predictionHigh).toBeGreaterThan(band?.confidenceHigh as number);
  });

  it('the pooled cv–LL slope recovers the simulated −0.02 ln units per % (−0.0087 log10) within its 3 standard errors', () => {
    const result = correlatePair(context, 'cv-ll');
    if (!result.pooled.released || !result.pooled.line) throw new Error('expected a pooled line');
    const { slope, slopeStandardError } = result.pooled.line.fit;
    expect(Math.abs(slope - -0.02 / Math.LN10)).toBeLessThan(3 * slopeStandardError);
    expect(result.pooled.line.corrected).toBe(true);
  });

  it('lines span P5–P95 of x and carry the published correlations of the pair', () => {
    const result = correlatePair(context, 'cc-ll');
    if (!result.pooled.released || !result.pooled.line) throw new Error('expected a pooled line');
    const [from, to] = result.pooled.line.xRange;
    const xs = result.pooled.points?.x ?? [];
    expect(Math.min(...xs)).toBeLessThan(from);
    expect(Math.max(...xs)).toBeGreaterThan(to);
    const ids = result.published.map((p) => p.correlationId);
    expect(ids).toEqual([
      'skempton-1944',
      'terzaghi-peck-1967',
      'azzouz-1976-ll',
      'cozzolino-1961',
      'mayne-1980',
      'burland-1990',
    ]);
    const tp = result.published.find((p) => p.correlationId === 'terzaghi-peck-1967');
    expect(tp?.y[0]).toBeCloseTo(0.009 * ((tp?.x[0] as number) - 10), 12);
    expect(tp?.low?.[0]).toBeCloseTo(0.7 * (tp?.y[0] as number), 12);
  });

  it('withholds the pooled line below the rule and says why', () => {
    const few: StatisticsRecord[] = records.slice(0, 4);
    const result = correlatePair(statisticsContext(columnsFromRecords(few), { viewerFirmId: 'firm-0' }), 'cc-ll');
    expect(result.pooled).toMatchObject({ released: false, tests: 4, reasons: [{ code: 'TOO_FEW_TESTS' }] });
  });

  it('σ′p against depth: depth is not masked, the corrected fit finds the simulated 6 kPa/m', () => {
    const result = correlatePair(context, 'sigmap-depth');
    if (!result.pooled.released || !result.pooled.line) throw new Error('expected a pooled line');
    expect(result.pooled.line.reliability).toBe(1);
    expect(Math.abs(result.pooled.line.fit.slope - 6)).toBeLessThan(3 * result.pooled.line.fit.slopeStandardError);
  });

  it('corrects the flattening that masked x would cause', () => {
    // 2000 tests with Cc = 0.009(LL − 10) + N(0, 0.03): the plain fit of masked values flattens the slope
    const random = seededRandom(4);
    const normal = normalFrom(random);
    const many: StatisticsRecord[] = Array.from({ length: 2000 }, (_, i) => {
      const ll = 70 + 12 * normal();
      return {
        firmId: `f${i % 4}`,
        recordKey: Math.floor(random() * 2 ** 32),
        depthM: 5,
        liquidLimitPct: ll,
        compressionIndex: 0.009 * (ll - 10) + 0.03 * normal(),
      };
    });
    const result = correlatePair(statisticsContext(columnsFromRecords(many), { viewerFirmId: null }), 'cc-ll');
    if (!result.pooled.released || !result.pooled.line) throw new Error('expected a pooled line');
    const { fit, reliability } = result.pooled.line;
    expect(reliability).toBeLessThan(0.95);
    expect(Math.abs(fit.slope - 0.009)).toBeLessThan(3 * fit.slopeStandardError);
    expect(Math.abs(fit.slope * (reliability as number) - 0.009)).toBeGreaterThan(3 * fit.slopeStandardError);
    expect(fit.residualSd).toBeGreaterThan(0.02);
    expect(fit.residualSd).toBeLessThan(0.04);
  });
});
