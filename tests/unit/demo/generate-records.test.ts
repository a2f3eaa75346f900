import { median, sampleCorrelation, sampleRankCorrelation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { type DemoRecord, generateDemoRecords } from '../../../scripts/demo/generate-records';
import { DEMO_FIRMS } from '../../../scripts/demo/people';
import { DEMO_REGIONS, DEMO_UNITS } from '../../../scripts/demo/vocabulary';
import { IMPORT_FIELDS } from '../../../src/lib/import/fields';
import { sampleQualityClass } from '../../../src/lib/import/sample-quality';
import { testRecordRowSchema } from '../../../src/lib/import/test-record-row';

const records = generateDemoRecords();
const clean = records.filter((r) => r.plantedOutlier === null);
const ofUnit = (name: string, from: DemoRecord[] = clean) => from.filter((r) => r.geologicalUnit === name);
const num = (value: number | null): number => {
  if (value === null) throw new Error('expected a number');
  return value;
};
const mid = (r: DemoRecord) => (num(r.depthTop) + num(r.depthBottom)) / 2;
const estuarine = ofUnit('Saltreach Estuarine Clay');

// source: invented demo scenario (demo-scenario.md), typical values common practice
const UNIT_RATIOS: Record<string, { crOverCc: [number, number]; calphaOverCc: [number, number] }> = {
  'Saltreach Estuarine Clay': { crOverCc: [0.08, 0.15], calphaOverCc: [0.035, 0.05] },
  'Vennmoor Peat': { crOverCc: [0.08, 0.12], calphaOverCc: [0.05, 0.07] },
  'Vennmoor Organic Clay': { crOverCc: [0.08, 0.15], calphaOverCc: [0.045, 0.06] },
  'Orrin Glaciolacustrine Clay': { crOverCc: [0.1, 0.2], calphaOverCc: [0.03, 0.045] },
  'Tamsel Alluvial Silt': { crOverCc: [0.12, 0.2], calphaOverCc: [0.03, 0.04] },
};

/** Poor samples are the ones the generator disturbed; their notes say so (private, invented). */
const disturbed = (r: DemoRecord) => r.notes?.includes('disturbed') ?? false;

describe('generateDemoRecords: determinism and shape', () => {
  it('gives identical records for the same seed and different ones for another seed', () => {
    expect(generateDemoRecords({ seed: 7 })).toEqual(generateDemoRecords({ seed: 7 }));
    expect(generateDemoRecords({ seed: 8 })).not.toEqual(generateDemoRecords({ seed: 7 }));
    expect(generateDemoRecords()).toEqual(records);
  });

  it('makes about 320 records by default and exactly the count asked for', () => {
    expect(records).toHaveLength(320);
    expect(generateDemoRecords({ count: 90, seed: 3 })).toHaveLength(90);
  });

  it('splits the records 55 / 30 / 15 % between the invented firms (± 3 %)', () => {
    for (const firm of DEMO_FIRMS) {
      const share = records.filter((r) => r.firmSlug === firm.slug).length / records.length;
      expect(Math.abs(share - firm.share)).toBeLessThanOrEqual(0.03);
    }
    expect(new Set(records.map((r) => r.firmSlug))).toEqual(new Set(DEMO_FIRMS.map((f) => f.slug)));
  });

  it('covers every invented unit, each in its own region and from more than one firm', () => {
    for (const unit of DEMO_UNITS) {
      const ofThis = records.filter((r) => r.geologicalUnit === unit.name);
      expect(ofThis.length, unit.name).toBeGreaterThanOrEqual(20);
      expect(new Set(ofThis.map((r) => r.firmSlug)).size, unit.name).toBeGreaterThanOrEqual(2);
      const region = DEMO_REGIONS.find((r) => r.slug === unit.region)?.name;
      expect(new Set(ofThis.map((r) => r.region))).toEqual(new Set([region]));
    }
  });

  it('keys every record by the import fields, plus firm, quality class, increments and the outlier mark', () => {
    const expected = [
      ...IMPORT_FIELDS.map((f) => f.key),
      'firmSlug',
      'sampleQualityClass',
      'increments',
      'plantedOutlier',
    ].sort();
    for (const r of records) expect(Object.keys(r).sort()).toEqual(expected);
  });

  it('labels every private detail as invented and keeps coordinates in the invented rectangle', () => {
    for (const r of records) {
      expect(r.projectName).toMatch(/\(invented\)$/);
      expect(r.clientName).toMatch(/\(invented\)$/);
      expect(r.coordinateSystem).toMatch(/\(invented\)$/);
      expect(r.notes).toMatch(/^Invented demo record\./);
      expect(r.boreholeId).toMatch(/^(QF|EV|NM)-BH-\d{3}$/);
      expect(r.sampleId).toMatch(/^[PUB]-\d+$/);
      expect(num(r.easting)).toBeGreaterThanOrEqual(412000);
      expect(num(r.easting)).toBeLessThanOrEqual(448000);
      expect(num(r.northing)).toBeGreaterThanOrEqual(301000);
      expect(num(r.northing)).toBeLessThanOrEqual(329000);
    }
  });
});

describe('generateDemoRecords: every value passes the importer hard ranges, outliers included', () => {
  it.each([1, 2, 20261202])('seed %i', (seed) => {
    for (const r of generateDemoRecords({ seed })) {
      const where = `${r.boreholeId} ${r.sampleId}`;
      if (r.liquidLimitPct !== null) {
        expect(r.liquidLimitPct, where).toBeGreaterThanOrEqual(10);
        expect(r.liquidLimitPct, where).toBeLessThanOrEqual(500);
        expect(num(r.plasticLimitPct), where).toBeLessThanOrEqual(r.liquidLimitPct);
        expect(num(r.plasticityIndexPct), where).toBeGreaterThanOrEqual(0);
        expect(num(r.plasticityIndexPct), where).toBe(r.liquidLimitPct - num(r.plasticLimitPct));
      }
      expect(num(r.initialVoidRatio), where).toBeGreaterThanOrEqual(0.2);
      expect(num(r.initialVoidRatio), where).toBeLessThanOrEqual(15);
      expect(num(r.compressionIndex), where).toBeGreaterThanOrEqual(0.01);
      expect(num(r.compressionIndex), where).toBeLessThanOrEqual(10);
      expect(num(r.recompressionIndex), where).toBeLessThan(num(r.compressionIndex));
      expect(num(r.depthTop), where).toBeGreaterThanOrEqual(0);
      expect(num(r.depthBottom), where).toBeGreaterThan(num(r.depthTop));
      expect(num(r.cvNc), where).toBeGreaterThan(0);
      expect(num(r.cvOc), where).toBeGreaterThan(0);
      expect(num(r.waterContentPct), where).toBeGreaterThanOrEqual(0);
      expect(num(r.waterContentPct), where).toBeLessThanOrEqual(1500);
      expect(num(r.specificGravity), where).toBeGreaterThanOrEqual(1.5);
      expect(num(r.specificGravity), where).toBeLessThanOrEqual(3.5);
      expect(num(r.bulkUnitWeight), where).toBeGreaterThanOrEqual(8);
      expect(num(r.bulkUnitWeight), where).toBeLessThanOrEqual(25);
      expect(num(r.mv), where).toBeGreaterThan(0);
      expect(num(r.permeability), where).toBeGreaterThan(0);
      expect(num(r.secondaryCompressionIndex), where).toBeGreaterThan(0);
    }
  });
});

describe("generateDemoRecords: the importer's row schema accepts every record, outliers included", () => {
  const schema = testRecordRowSchema({
    regions: DEMO_REGIONS.map((r) => ({ id: r.slug, name: r.name, slug: r.slug })),
    units: DEMO_UNITS.map((u) => ({ id: u.slug, name: u.name, slug: u.slug })),
  });

  it.each([1, 20261202])('seed %i', (seed) => {
    for (const r of generateDemoRecords({ seed })) {
      const parsed = schema.safeParse(r);
      expect(parsed.success ? [] : parsed.error.issues.map((i) => i.message), `${r.boreholeId} ${r.sampleId}`).toEqual([]);
      if (parsed.success) expect(parsed.data.record.sampleQualityClass).toBe(r.sampleQualityClass);
    }
  });
});

describe('generateDemoRecords: the relations of the scenario hold statistically', () => {
  it.each([
    ['wn', (r: DemoRecord) => num(r.waterContentPct)],
    ['LL', (r: DemoRecord) => num(r.liquidLimitPct)],
    ['e0', (r: DemoRecord) => num(r.initialVoidRatio)],
  ] as const)('Cc rises with %s in the estuarine clay, with scatter (0.6 < r < 0.95)', (_name, x) => {
    const r = sampleCorrelation(
      estuarine.map(x),
      estuarine.map((e) => num(e.compressionIndex)),
    );
    expect(r).toBeGreaterThan(0.6);
    expect(r).toBeLessThan(0.95);
  });

  it('has e0 close to wn·Gs/100 (saturated), with a few per cent of scatter', () => {
    const misfit = clean.map((r) => num(r.initialVoidRatio) / ((num(r.waterContentPct) * num(r.specificGravity)) / 100) - 1);
    expect(median(misfit.map(Math.abs))).toBeLessThan(0.05);
    expect(Math.max(...misfit.map(Math.abs))).toBeLessThan(0.2);
  });

  it("has σ'p rising with depth in the estuarine clay below 3 m", () => {
    const deep = estuarine.filter((r) => mid(r) >= 3);
    const depth = deep.map(mid);
    const sigmaP = deep.map((r) => num(r.preconsolidationStress));
    expect(sampleRankCorrelation(depth, sigmaP)).toBeGreaterThan(0.3);
    expect(sampleCorrelation(depth, sigmaP)).toBeGreaterThan(0.3);
  });

  it('keeps OCR in the ranges of the table for good samples: crust 2–6, estuarine clay below 3 m 1–1.5, glacial clay 2–8', () => {
    const good = (r: DemoRecord) => !disturbed(r);
    const ocr = (from: DemoRecord[]) => from.filter(good).map((r) => num(r.overconsolidationRatio));
    const crust = ocr(estuarine.filter((r) => mid(r) < 3));
    const below = ocr(estuarine.filter((r) => mid(r) >= 3));
    const glacial = ocr(ofUnit('Orrin Glaciolacustrine Clay'));
    expect(crust.length).toBeGreaterThanOrEqual(5);
    for (const value of crust) expect(value).toSatisfy((v: number) => v >= 1.95 && v <= 6.05);
    for (const value of below) expect(value).toSatisfy((v: number) => v >= 0.97 && v <= 1.53);
    for (const value of glacial) expect(value).toSatisfy((v: number) => v >= 1.95 && v <= 8.05);
    // σ'v0 from unit weights and a water table near 1 m: about 5–10 kPa per metre in soft clay
    for (const r of estuarine) expect(num(r.verticalEffectiveStress) / mid(r)).toSatisfy((v: number) => v > 4 && v < 18);
  });

  it('has cv OC several times cv NC (median ratio ≥ 3) and cv NC falling as LL rises', () => {
    expect(median(clean.map((r) => num(r.cvOc) / num(r.cvNc)))).toBeGreaterThanOrEqual(3);
    expect(
      sampleCorrelation(
        estuarine.map((r) => num(r.liquidLimitPct)),
        estuarine.map((r) => num(r.cvNc)),
      ),
    ).toBeLessThan(0);
    const withLl = clean.filter((r) => r.liquidLimitPct !== null);
    const r = sampleCorrelation(
      withLl.map((e) => num(e.liquidLimitPct)),
      withLl.map((e) => Math.log10(num(e.cvNc))),
    );
    expect(r).toBeLessThan(-0.5);
  });

  it.each(Object.entries(UNIT_RATIOS))('keeps Cr/Cc and Cα/Cc of %s in its range', (unit, ratios) => {
    for (const r of ofUnit(unit)) {
      const cc = num(r.compressionIndex);
      expect(num(r.recompressionIndex) / cc).toSatisfy(
        (v: number) => v >= ratios.crOverCc[0] * 0.98 && v <= ratios.crOverCc[1] * 1.02,
      );
      expect(num(r.secondaryCompressionIndex) / cc).toSatisfy(
        (v: number) => v >= ratios.calphaOverCc[0] * 0.98 && v <= ratios.calphaOverCc[1] * 1.02,
      );
    }
  });

  it('gives peat no Atterberg limits, high wn and organic content, e0 5–12, Cc 2–7 and the symbol Pt', () => {
    const peat = ofUnit('Vennmoor Peat');
    for (const r of peat) {
      expect([r.liquidLimitPct, r.plasticLimitPct, r.plasticityIndexPct]).toEqual([null, null, null]);
      expect(r.uscsSymbol).toBe('Pt');
      expect(num(r.waterContentPct)).toBeGreaterThanOrEqual(300);
      expect(num(r.organicContentPct)).toBeGreaterThanOrEqual(50);
      expect(num(r.initialVoidRatio)).toSatisfy((v: number) => v >= 5 && v <= 12);
      expect(num(r.compressionIndex)).toSatisfy((v: number) => v >= 2 * 0.65 && v <= 7);
    }
  });
});

describe('generateDemoRecords: sample quality', () => {
  it('gives every record the class the importer works out from Δe/e0 and OCR (Lunne et al. 1997)', () => {
    for (const r of records) expect(r.sampleQualityClass).toBe(sampleQualityClass(r.deltaEOverE0, r.overconsolidationRatio));
    expect(new Set(records.map((r) => r.sampleQualityClass))).toEqual(new Set([1, 2, 3, 4, null]));
  });

  it('has a few poor samples, class 3–4 where OCR defines a class, with lower Cc than the good ones of the same unit', () => {
    const poor = clean.filter(disturbed);
    expect(poor.length).toBeGreaterThanOrEqual(3);
    expect(poor.length / clean.length).toBeLessThan(0.15);
    for (const r of clean) {
      if (r.sampleQualityClass === null) continue;
      expect(r.sampleQualityClass >= 3).toBe(disturbed(r));
    }
    // Cc relative to the unit's good samples at the same e0 (ratio Cc/e0)
    const relative = poor.map((r) => {
      const good = ofUnit(r.geologicalUnit ?? '').filter((g) => !disturbed(g));
      const typical = median(good.map((g) => num(g.compressionIndex) / num(g.initialVoidRatio)));
      return num(r.compressionIndex) / num(r.initialVoidRatio) / typical;
    });
    expect(median(relative)).toBeLessThan(0.9);
  });
});

describe('generateDemoRecords: incremental-loading steps', () => {
  const tested = clean.filter((r) => r.increments !== null);

  it('come with about a third of the records, and only with incremental tests', () => {
    const share = records.filter((r) => r.increments !== null).length / records.length;
    expect(share).toBeGreaterThan(0.25);
    expect(share).toBeLessThan(0.42);
    for (const r of records.filter((e) => e.increments !== null)) expect(r.testMethod).toBe('incremental');
    expect(tested.some((r) => r.increments?.some((i) => i.isUnloading))).toBe(true);
  });

  it('raise the stress and lower the void ratio on every loading step, and the reverse on unloading', () => {
    for (const r of tested) {
      const steps = r.increments ?? [];
      expect(steps[0]?.isUnloading).toBe(false);
      expect(steps.map((step) => step.incrementNo)).toEqual(steps.map((_step, i) => i + 1));
      for (let i = 1; i < steps.length; i++) {
        const [before, step] = [steps[i - 1], steps[i]];
        if (!before || !step) continue;
        if (step.isUnloading) {
          expect(step.appliedStressKpa).toBeLessThan(before.appliedStressKpa);
          expect(step.voidRatioEnd).toBeGreaterThan(before.voidRatioEnd);
        } else {
          expect(step.appliedStressKpa).toBeGreaterThan(before.appliedStressKpa);
          expect(step.voidRatioEnd).toBeLessThan(before.voidRatioEnd);
        }
      }
    }
  });

  it("agree with the record's e0, Cc, Cr and σ'p", () => {
    for (const r of tested) {
      const steps = r.increments ?? [];
      const [e0, cc, cr, sigmaP] = [
        num(r.initialVoidRatio),
        num(r.compressionIndex),
        num(r.recompressionIndex),
        num(r.preconsolidationStress),
      ];
      const sigmaV0 = num(r.verticalEffectiveStress);
      const first = steps[0]?.voidRatioEnd ?? 0;
      expect(first).toBeLessThanOrEqual(e0);
      expect(first).toBeGreaterThan(0.8 * e0);
      const slopes = steps.slice(1).map((step, i) => {
        const before = steps[i];
        if (!before) throw new Error('missing step');
        const slope =
          Math.abs(step.voidRatioEnd - before.voidRatioEnd) /
          Math.abs(Math.log10(step.appliedStressKpa / before.appliedStressKpa));
        return { from: before, to: step, slope };
      });
      const virgin = slopes.filter((s) => !s.to.isUnloading && !s.from.isUnloading);
      // Cc is the slope of the virgin compression line, beyond σ'p; rounding e to 4 decimals costs < 1 %
      const beyond = virgin.filter((s) => s.from.appliedStressKpa >= sigmaP);
      expect(Math.max(...beyond.map((s) => s.slope)) / cc).toSatisfy((v: number) => v > 0.8 && v <= 1.01);
      for (const s of slopes.filter((e) => e.to.isUnloading)) expect(s.slope / cr).toSatisfy((v: number) => v > 0.95 && v < 1.05);
      if (!disturbed(r)) {
        const halfway = (cc + cr) / 2;
        const below = virgin.filter((s) => s.from.appliedStressKpa >= sigmaV0 && s.to.appliedStressKpa <= sigmaP / 2);
        const above = virgin.filter((s) => s.from.appliedStressKpa >= 2 * sigmaP);
        for (const s of below) expect(s.slope).toBeLessThan(halfway);
        for (const s of above) expect(s.slope).toBeGreaterThan(halfway);
        expect(above.length).toBeGreaterThanOrEqual(1);
      }
    }
  });
});

describe('generateDemoRecords: planted gross outliers for the steward', () => {
  const planted = records.filter((r) => r.plantedOutlier !== null);
  const kind = (k: string) => planted.find((r) => r.plantedOutlier === k);

  it('plants at least three, of different kinds', () => {
    expect(planted.length).toBeGreaterThanOrEqual(3);
    expect(new Set(planted.map((r) => r.plantedOutlier)).size).toBe(planted.length);
  });

  it("plants a σ'p typed in psf as if kPa: far above the pool, its own curve saying otherwise", () => {
    const r = kind('stress-in-psf');
    if (!r) throw new Error('no psf outlier');
    expect(r.geologicalUnit).toBe('Saltreach Estuarine Clay');
    expect(num(r.overconsolidationRatio)).toBeGreaterThan(10);
    expect(num(r.preconsolidationStress)).toBeGreaterThan(3 * Math.max(...estuarine.map((e) => num(e.preconsolidationStress))));
    const steps = r.increments ?? [];
    if (steps.length > 0) expect(Math.max(...steps.map((s) => s.appliedStressKpa))).toBeLessThan(num(r.preconsolidationStress));
  });

  it('plants a peat test filed under the silt, and peat depths typed in feet', () => {
    const silt = ofUnit('Tamsel Alluvial Silt');
    const peatAsSilt = kind('peat-labelled-as-silt');
    expect(peatAsSilt?.geologicalUnit).toBe('Tamsel Alluvial Silt');
    expect(num(peatAsSilt?.compressionIndex ?? null)).toBeGreaterThan(5 * Math.max(...silt.map((e) => num(e.compressionIndex))));
    const feet = kind('depth-in-feet');
    expect(feet?.geologicalUnit).toBe('Vennmoor Peat');
    expect(num(feet?.depthTop ?? null)).toBeGreaterThan(Math.max(...ofUnit('Vennmoor Peat').map((e) => num(e.depthBottom))));
  });

  it('plants a permeability typed in cm/s as if m/s', () => {
    const r = kind('permeability-in-cm-per-s');
    if (!r) throw new Error('no permeability outlier');
    const pool = ofUnit(r.geologicalUnit ?? '').map((e) => num(e.permeability));
    expect(num(r.permeability)).toBeGreaterThan(10 * median(pool));
  });
});
