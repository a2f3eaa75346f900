/**
 * Sample quality class from the change in void ratio on reloading to the in-situ stress, Δe/e0, and
 * the overconsolidation ratio. source: Lunne, Berre & Strandvik (1997), "Sample disturbance effects in
 * soft low plastic Norwegian clay", Recent Developments in Soil and Pavement Mechanics, pp. 81–102
 * (title and pages from memory; the limits match the bank model's column comment).
 *
 * Classes: 1 very good to excellent, 2 good to fair, 3 poor, 4 very poor (the database's 1–4).
 * Limits (Δe/e0), source: Lunne, Berre & Strandvik (1997):
 *   OCR 1–2: < 0.04 | 0.04–0.07 | 0.07–0.14 | > 0.14
 *   OCR 2–4: < 0.03 | 0.03–0.05 | 0.05–0.10 | > 0.10
 * On a limit: 0.04 and 0.07 (0.03 and 0.05) start the poorer class; 0.14 (0.10) is still poor, as only
 * values above it are very poor. OCR exactly 2 uses the 2–4 limits; OCR from 0.5 to 1 (the scatter of a
 * normally consolidated clay) uses the 1–2 limits. Above OCR 4 the classes are not defined, so the class
 * is null, as it is when Δe/e0 or OCR is missing.
 */
export type SampleQualityClass = 1 | 2 | 3 | 4;

/** source: Lunne, Berre & Strandvik (1997) */
const LIMITS_OCR_1_TO_2 = [0.04, 0.07, 0.14] as const;
/** source: Lunne, Berre & Strandvik (1997) */
const LIMITS_OCR_2_TO_4 = [0.03, 0.05, 0.1] as const;

export const SAMPLE_QUALITY_LABELS: Readonly<Record<SampleQualityClass, string>> = {
  1: 'very good to excellent',
  2: 'good to fair',
  3: 'poor',
  4: 'very poor',
};

export function sampleQualityClass(deltaEOverE0: number | null, ocr: number | null): SampleQualityClass | null {
  if (deltaEOverE0 === null || ocr === null || !Number.isFinite(deltaEOverE0) || !Number.isFinite(ocr)) return null;
  if (ocr > 4 || ocr < 0.5 || deltaEOverE0 < 0) return null;
  const [good, poor, veryPoor] = ocr < 2 ? LIMITS_OCR_1_TO_2 : LIMITS_OCR_2_TO_4;
  if (deltaEOverE0 < good) return 1;
  if (deltaEOverE0 < poor) return 2;
  if (deltaEOverE0 <= veryPoor) return 3;
  return 4;
}
