import type { RawIncrement, RawRow } from '../import/raw-row';
import type { InterpretationContext } from './interpret-incremental';
import type { SubmittedValues } from './review-flags';
import type { IncrementalTestInput } from './test-input';

/** An increment as the importer carries it (AGS4 CONS, or a checked test record increment). */
type CarriedIncrement = Pick<RawIncrement, 'incrementNo' | 'appliedStressKpa' | 'voidRatioStart' | 'voidRatioEnd'>;

export interface Ags4Interpretable {
  test: IncrementalTestInput;
  context: InterpretationContext;
  submitted: SubmittedValues;
}

const numeric = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);

/**
 * The interpretation input for a test the importer read from AGS4 (one CONG record and its CONS rows):
 * each increment's stress (CONS_INCF) and void ratio at its end (CONS_INCE), e0 from CONG_IVR or else the
 * first increment's starting void ratio (CONS_IVR), and the record's Gs and water content. AGS4 holds no
 * time–deformation readings, so cv and Cα stay undetermined (no readings), while the curve gives Cc, Cr,
 * both σ′p and mv. `submitted` carries the summary values the file states, for `reviewFlags`. Increments
 * without a stress or an end void ratio are left out (the curve then reports what is missing).
 */
export function testFromAgs4Row(row: Pick<RawRow, 'values' | 'increments'>): Ags4Interpretable {
  const v = row.values;
  const carried: readonly CarriedIncrement[] = row.increments ?? [];
  const ordered = [...carried].sort((a, b) => (a.incrementNo ?? 0) - (b.incrementNo ?? 0));
  const e0 = numeric(v.initialVoidRatio) ?? ordered[0]?.voidRatioStart ?? null;
  return {
    test: {
      specimen: {
        initialHeightMm: null,
        diameterMm: null,
        initialVoidRatio: e0,
        specificGravity: numeric(v.specificGravity),
        waterContentPct: numeric(v.waterContentPct),
      },
      increments: ordered.flatMap((inc, i) =>
        inc.appliedStressKpa === null || inc.voidRatioEnd === null
          ? []
          : [{ incrementNo: inc.incrementNo ?? i + 1, stressKpa: inc.appliedStressKpa, voidRatio: inc.voidRatioEnd }],
      ),
    },
    context: { verticalEffectiveStressKpa: numeric(v.verticalEffectiveStress) },
    submitted: {
      initialVoidRatio: numeric(v.initialVoidRatio),
      compressionIndex: numeric(v.compressionIndex),
      recompressionIndex: numeric(v.recompressionIndex),
      preconsolidationStress: numeric(v.preconsolidationStress),
      cvNc: numeric(v.cvNc),
      cvOc: numeric(v.cvOc),
      secondaryCompressionIndex: numeric(v.secondaryCompressionIndex),
      deltaEOverE0: numeric(v.deltaEOverE0),
    },
  };
}
