import { describe, expect, it } from 'vitest';
import {
  columnsFromRecords,
  compareWithPublished,
  PUBLISHED_CORRELATIONS,
  publishedCorrelation,
  type StatisticsRecord,
  statisticsContext,
} from '../../../src/lib/statistics';
import { normalFrom, seededRandom } from './support/simulated-selection';

function at(id: string, inputs: number[]): number {
  const correlation = publishedCorrelation(id);
  if (!correlation) throw new Error(`no correlation ${id}`);
  return correlation.evaluate(inputs);
}

describe('each published correlation at one point', () => {
  it.each([
    // source: Skempton (1944) Q. J. Geol. Soc. 100:119–135, Cc = 0.007(LL − 10) — from memory
    ['skempton-1944', [60], 0.35],
    // source: Terzaghi & Peck (1967) Soil Mechanics in Engineering Practice, Cc = 0.009(LL − 10) — from memory
    ['terzaghi-peck-1967', [60], 0.45],
    // source: Azzouz, Krizek & Corotis (1976) Soils and Foundations 16(2), Cc = 0.006(LL − 9) — from memory
    ['azzouz-1976-ll', [59], 0.3],
    // source: Azzouz, Krizek & Corotis (1976), Cc = 0.40(e0 − 0.25) — from memory
    ['azzouz-1976-e0', [1.5], 0.5],
    // source: Azzouz, Krizek & Corotis (1976), Cc = 0.01(wn − 5) — from memory
    ['azzouz-1976-wn', [55], 0.5],
    // source: Azzouz, Krizek & Corotis (1976), Cc = 0.37(e0 + 0.003LL + 0.0004wn − 0.34): 0.37·(1.5 + 0.18 + 0.02 − 0.34) — from memory
    ['azzouz-1976-multi', [1.5, 60, 50], 0.37 * 1.36],
    // source: Nishida (1956), Cc = 1.15(e0 − 0.35) — from memory
    ['nishida-1956', [1.35], 1.15],
    // source: Hough (1957), Cc = 0.30(e0 − 0.27) — from memory
    ['hough-1957', [1.27], 0.3],
    // source: Cozzolino (1961), Cc = 0.0046(LL − 9) — from memory
    ['cozzolino-1961', [109], 0.46],
    // source: Koppula (1981), Cc = 0.01wn — from memory
    ['koppula-1981', [80], 0.8],
    // source: Mayne (1980), Cc = (LL − 13)/109 — from memory
    ['mayne-1980', [122], 1],
    // source: Wroth & Wood (1978) Can. Geotech. J. 15:137–145, Cc = ½·Gs·PI: Gs 2.7, PI 74 % → 0.999 — from memory
    ['wroth-wood-1978', [74, 2.7], 0.999],
    // source: Kulhawy & Mayne (1990) EPRI EL-6800, Cc = PI/74 — from memory
    ['kulhawy-mayne-1990-cc', [37], 0.5],
    // source: Kulhawy & Mayne (1990) EPRI EL-6800, Cr = PI/370 — from memory
    ['kulhawy-mayne-1990-cr', [37], 0.1],
    // source: UFC 3-220-10 §5-5.2.1 (after Leonards 1976), Cr 5–10 % of Cc; central 7.5 %
    ['ufc-leonards-cr', [0.8], 0.06],
    // source: Mesri & Godlewski (1977); UFC 3-220-10 Table 5-6, Cα/Cc = 0.04 inorganic, 0.05 organic, 0.06 peat
    ['mesri-godlewski-1977-inorganic', [0.5], 0.02],
    ['mesri-godlewski-1977-organic', [0.5], 0.025],
    ['mesri-godlewski-1977-peat', [4], 0.24],
    // source: Mesri (1973); UFC 3-220-10 Eq. 5-19, Cεα = 10⁻⁴·wn, so Cα = 10⁻⁴·wn·(1 + e0): wn 80 %, e0 2 → 0.024
    ['mesri-1973-wn', [80, 2], 0.024],
    // source: Burland (1990) Géotechnique 40(3); UFC 3-220-10 Eqs. 8-27–8-30, C*c = 0.256·eL − 0.04, eL = Gs·LL: LL 100 %, Gs 2.7 → 0.6512
    ['burland-1990', [100, 2.7], 0.6512],
  ])('%s', (id, inputs, expected) => {
    expect(at(id, inputs)).toBeCloseTo(expected, 10);
  });

  it('every correlation is checked above, has a source, a caution and its inputs', () => {
    expect(PUBLISHED_CORRELATIONS).toHaveLength(20);
    for (const c of PUBLISHED_CORRELATIONS) {
      expect(c.source).toMatch(/\(\d{4}\)|\d{4}/);
      expect(c.caution.length).toBeGreaterThan(10);
      expect(c.inputs.length).toBeGreaterThan(0);
    }
  });
});

describe("the bank's bias and scatter against a correlation", () => {
  const random = seededRandom(21);
  const normal = normalFrom(random);

  function onLine(factor: number, count: number, firm = 'mine', symbol = 'CH'): StatisticsRecord[] {
    return Array.from({ length: count }, (_, i) => {
      const ll = 40 + (60 * i) / count;
      return {
        firmId: firm,
        recordKey: Math.floor(random() * 2 ** 32),
        depthM: 5,
        uscsSymbol: symbol,
        liquidLimitPct: ll,
        compressionIndex: factor * 0.009 * (ll - 10),
      };
    });
  }
  const terzaghiPeck = publishedCorrelation('terzaghi-peck-1967');
  if (!terzaghiPeck) throw new Error('missing');

  it('tests exactly 20 % above the line: ratio 1.2, all within the stated ±30 %', () => {
    const result = compareWithPublished(
      statisticsContext(columnsFromRecords(onLine(1.2, 30)), { viewerFirmId: 'mine' }),
      terzaghiPeck,
    );
    expect(result.own?.meanRatio).toBeCloseTo(1.2, 12);
    expect(result.own?.medianRatio).toBeCloseTo(1.2, 12);
    expect(result.own?.withinStatedRange).toBe(1);
    expect(result.pooled.released).toBe(false);
  });

  it('leaves out tests outside the stated soil groups and ranges', () => {
    const records = [...onLine(1, 10), ...onLine(1, 5, 'mine', 'Pt')];
    const tp = compareWithPublished(statisticsContext(columnsFromRecords(records), { viewerFirmId: 'mine' }), terzaghiPeck);
    expect(tp.own?.n).toBe(10);
    const azzouz = publishedCorrelation('azzouz-1976-ll');
    if (!azzouz) throw new Error('missing');
    const high = onLine(1, 10).map((r) => ({ ...r, liquidLimitPct: 120 }));
    expect(compareWithPublished(statisticsContext(columnsFromRecords(high), { viewerFirmId: 'mine' }), azzouz).own).toBeNull();
  });

  it('pooled: bias from masked values, residual sd corrected for the masking', () => {
    // 600 tests, Cc = 1.1 × Terzaghi & Peck + N(0, 0.05): the true mean ratio is about 1.1 and the scatter 0.05
    const records: StatisticsRecord[] = Array.from({ length: 600 }, (_, i) => {
      const ll = 45 + 40 * random();
      return {
        firmId: `f${i % 3}`,
        recordKey: Math.floor(random() * 2 ** 32),
        depthM: 5,
        uscsSymbol: 'CH',
        liquidLimitPct: ll,
        compressionIndex: 1.1 * 0.009 * (ll - 10) + 0.05 * normal(),
      };
    });
    const result = compareWithPublished(statisticsContext(columnsFromRecords(records), { viewerFirmId: null }), terzaghiPeck);
    if (!result.pooled.released) throw new Error('expected release');
    expect(result.pooled.firms).toBe(3);
    expect(result.pooled.medianRatio).toBeGreaterThan(1.05);
    expect(result.pooled.medianRatio).toBeLessThan(1.15);
    expect(result.pooled.residualSd).toBeGreaterThan(0.04);
    expect(result.pooled.residualSd).toBeLessThan(0.06);
  });
});
