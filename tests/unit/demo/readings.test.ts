import { describe, expect, it } from 'vitest';
import { generateDemoRecords } from '../../../scripts/demo/generate-records';
import { demoReadingSets } from '../../../scripts/demo/records/readings';
import { interpretIncrementalTest } from '../../../src/lib/lab/interpret-incremental';
import { reviewFlags } from '../../../src/lib/lab/review-flags';

const records = generateDemoRecords();
const sets = demoReadingSets(records);

describe('invented demo readings', () => {
  it('are the same every time, and say they are invented', () => {
    expect(demoReadingSets(records)).toEqual(sets);
    expect(sets).toHaveLength(9);
    for (const set of sets) expect(set.note).toMatch(/^Invented demo readings/);
  });

  it('give back their record’s own values from the readings', () => {
    for (const set of sets.filter((s) => s.plantedProblem === null)) {
      const record = records[set.recordIndex];
      if (!record) throw new Error('missing record');
      const r = interpretIncrementalTest(set.test, {}, { verticalEffectiveStressKpa: record.verticalEffectiveStress });
      expect(r.cc.ok && Math.abs(r.cc.value.value / (record.compressionIndex ?? 0) - 1)).toBeLessThan(0.1);
      expect(
        r.sigmaPCasagrande.ok && Math.abs(r.sigmaPCasagrande.value.sigmaPKpa / (record.preconsolidationStress ?? 0) - 1),
      ).toBeLessThan(0.2);
      expect(r.increments.some((inc) => inc.rootTime.ok && inc.logTime.ok)).toBe(true);
    }
  });

  it('plant one problem a steward is told about: σ′p cannot be derived from a slipped gauge', () => {
    const planted = sets.filter((s) => s.plantedProblem === 'dial-slip');
    expect(planted).toHaveLength(1);
    const set = planted[0];
    const record = set ? records[set.recordIndex] : undefined;
    if (!set || !record) throw new Error('missing planted set');
    const r = interpretIncrementalTest(set.test, {}, { verticalEffectiveStressKpa: record.verticalEffectiveStress });
    expect(r.sigmaPCasagrande).toMatchObject({ ok: false, reason: 'goes-backwards' });
    const flags = reviewFlags(r, { preconsolidationStress: record.preconsolidationStress, deltaEOverE0: record.deltaEOverE0 });
    expect(flags.map((f) => [f.parameter, f.kind])).toEqual([['preconsolidationStress', 'not-derivable']]);
    // the slip comes after σ′v0, so Δe/e0 is still read from the test's own curve
    expect(r.sampleQuality.ok).toBe(true);
  });
});
