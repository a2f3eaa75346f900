import { SAMPLE_QUALITY_LABELS, type SampleQualityClass, sampleQualityClass } from '../import/sample-quality';
import { type CompressionCurve, loadingStates, voidRatioOnLoading } from './compression-curve';
import type { CurvePoint } from './geometry';
import { cannot, type Derived, determined, shown } from './outcome';

export interface SampleQuality {
  /** (e0 − e at σ′v0)/e0 */
  deltaEOverE0: number;
  /** the point on the test's own first-loading curve at the in-situ stress */
  atInSituStress: CurvePoint;
  ocr: number | null;
  /** Lunne, Berre & Strandvik (1997) class 1–4; null above OCR 4, where the classes are not defined */
  qualityClass: SampleQualityClass | null;
  label: string | null;
}

/**
 * Sample quality from the test's own curve: Δe/e0 with Δe = e0 − e at the in-situ vertical effective
 * stress, read off the first-loading curve (linear in log σ′ between points), and the class of Lunne,
 * Berre & Strandvik (1997) for the OCR band (the importer's `sampleQualityClass`). OCR = σ′p/σ′v0 from the
 * σ′p given (the interpretation passes Casagrande's, else the strain-energy value). Refused when a first-
 * loading increment up to the one that passes σ′v0 goes backwards (later problems do not touch the reading).
 */
export function sampleQuality(
  curve: CompressionCurve,
  inSituStressKpa: number | null | undefined,
  sigmaPKpa: number | null,
): Derived<SampleQuality> {
  if (typeof inSituStressKpa !== 'number' || !(inSituStressKpa > 0)) {
    return cannot('deltaEOverE0', 'missing-input', 'the in-situ vertical effective stress σ′v0 is not given.');
  }
  const loading = loadingStates(curve);
  const reach = loading.find((s) => s.stressKpa >= inSituStressKpa)?.stressKpa ?? Number.POSITIVE_INFINITY;
  const problem = curve.problems.find((p) => p.branch === 'loading' && stressOf(curve, p.incrementNo) <= reach);
  if (problem) return cannot('deltaEOverE0', 'goes-backwards', `${problem.message}.`);
  const e = voidRatioOnLoading(curve, inSituStressKpa);
  if (e === null) {
    const span =
      loading.length > 0 ? `${shown(loading[0]?.stressKpa ?? 0)}–${shown(loading.at(-1)?.stressKpa ?? 0)} kPa` : 'no stresses';
    return cannot(
      'deltaEOverE0',
      'out-of-range',
      `σ′v0 = ${shown(inSituStressKpa)} kPa lies outside the first loading (${span}).`,
    );
  }
  const { e0 } = curve.initial;
  const deltaEOverE0 = (e0 - e) / e0;
  const ocr = sigmaPKpa === null ? null : sigmaPKpa / inSituStressKpa;
  const qualityClass = sampleQualityClass(deltaEOverE0, ocr);
  return determined({
    deltaEOverE0,
    atInSituStress: { stressKpa: inSituStressKpa, voidRatio: e },
    ocr,
    qualityClass,
    label: qualityClass === null ? null : SAMPLE_QUALITY_LABELS[qualityClass],
  });
}

function stressOf(curve: CompressionCurve, incrementNo: number): number {
  return curve.states.find((s) => s.incrementNo === incrementNo)?.stressKpa ?? 0;
}
