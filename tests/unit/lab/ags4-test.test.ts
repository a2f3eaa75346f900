import { describe, expect, it } from 'vitest';
import { readAgs4 } from '../../../src/lib/import/ags4';
import { testFromAgs4Row } from '../../../src/lib/lab/ags4-test';
import { interpretIncrementalTest } from '../../../src/lib/lab/interpret-incremental';
import { reviewFlags } from '../../../src/lib/lab/review-flags';
import { fixture } from '../../fixtures/import/pipeline';

const read = readAgs4(fixture('invented-two-boreholes.ags'), { region: 'Saltreach Estuary' });
if (!read.ok) throw new Error(read.error.message);
const rows = read.rows;

describe('AGS4 consolidation increments (CONS) give derived values', () => {
  it('maps each CONG test and its CONS rows into an interpretable test', () => {
    const first = testFromAgs4Row(rows[0] as (typeof rows)[number]);
    expect(first.test.specimen.initialVoidRatio).toBe(1.95);
    expect(first.test.increments.map((i) => [i.stressKpa, i.voidRatio])).toEqual([
      [12.5, 1.918],
      [25, 1.894],
      [50, 1.87],
      [100, 1.686],
      [200, 1.445],
      [400, 1.205],
      [100, 1.259],
      [25, 1.313],
    ]);
  });

  it('derives Cc, Cr, both σ′p and mv for every test', () => {
    for (const row of rows) {
      const { test } = testFromAgs4Row(row);
      const r = interpretIncrementalTest(test);
      expect([r.cc.ok, r.cr.ok, r.sigmaPCasagrande.ok, r.sigmaPStrainEnergy.ok]).toEqual([true, true, true, true]);
      // no time–deformation readings in AGS4: cv stays undetermined, saying so
      expect(r.increments[4]?.rootTime).toMatchObject({ ok: false, reason: 'no-readings' });
    }
  });

  it('gives Cc of the first test by hand, and mv as the file states it', () => {
    const row = rows[0] as (typeof rows)[number];
    const r = interpretIncrementalTest(testFromAgs4Row(row).test);
    // by hand: the virgin points 100–400 kPa lie on e = 1.686 … 1.205, Cc = (1.686 − 1.205)/log10 4 ≈ 0.799
    expect(r.cc.ok && r.cc.value.value).toBeCloseTo(0.799, 2);
    // source: mv = Δe/(1 + e_start)/Δσ′ (UFC 3-220-10 §5-5.2); the file's CONS_INMV, to its 3 decimals
    const stated = row.increments?.map((i) => i.mvM2PerMn) ?? [];
    r.increments.forEach((inc, i) => {
      if (inc.branch === 'loading') expect(inc.mv.ok && inc.mv.value).toBeCloseTo(stated[i] ?? Number.NaN, 2);
    });
  });

  it('feeds review flags from the values the file states', () => {
    const row = rows[0] as (typeof rows)[number];
    const { test, submitted } = testFromAgs4Row(row);
    expect(reviewFlags(interpretIncrementalTest(test), { ...submitted, compressionIndex: 0.4 })[0]).toMatchObject({
      parameter: 'compressionIndex',
      kind: 'disagrees',
    });
  });
});
