import { describe, expect, it } from 'vitest';
import { compressionCurve } from '../../../src/lib/lab/compression-curve';
import { sampleQuality } from '../../../src/lib/lab/sample-quality';
import { voidRatioTest } from './support';

/** A curve whose void ratio at σ′v0 = 100 kPa is e0·(1 − q), e0 = 1.6. */
function qualityAt(q: number, ocr: number | null) {
  const e0 = 1.6;
  const curve = compressionCurve(
    voidRatioTest(e0, [
      [50, e0 * (1 - q) + 0.01],
      [100, e0 * (1 - q)],
      [200, e0 * (1 - q) - 0.2],
    ]),
  );
  if (!curve.ok) throw new Error(curve.message);
  return sampleQuality(curve.value, 100, ocr === null ? null : 100 * ocr);
}

const classOf = (q: number, ocr: number | null) => {
  const r = qualityAt(q, ocr);
  return r.ok ? r.value.qualityClass : 'refused';
};

describe('sample quality from the test’s own curve (Lunne, Berre & Strandvik 1997)', () => {
  it('reads Δe/e0 at the in-situ stress off the first-loading curve', () => {
    const r = qualityAt(0.05, 1.5);
    expect(r.ok && r.value.deltaEOverE0).toBeCloseTo(0.05, 12);
    expect(r.ok && r.value.atInSituStress.stressKpa).toBe(100);
    expect(r.ok && r.value.ocr).toBeCloseTo(1.5, 12);
  });

  // source: Lunne, Berre & Strandvik (1997) limits of Δe/e0 — OCR 1–2: 0.04 / 0.07 / 0.14; OCR 2–4: 0.03 / 0.05 / 0.10
  const EPS = 1e-9;
  it.each([
    [1.5, 0.04 - EPS, 1],
    [1.5, 0.04 + EPS, 2],
    [1.5, 0.07 - EPS, 2],
    [1.5, 0.07 + EPS, 3],
    [1.5, 0.14 - EPS, 3],
    [1.5, 0.14 + EPS, 4],
    [3, 0.03 - EPS, 1],
    [3, 0.03 + EPS, 2],
    [3, 0.05 - EPS, 2],
    [3, 0.05 + EPS, 3],
    [3, 0.1 - EPS, 3],
    [3, 0.1 + EPS, 4],
  ])('OCR %f, Δe/e0 %f: class %i', (ocr, q, expected) => {
    expect(classOf(q, ocr)).toBe(expected);
  });

  it('changes OCR band at 2, and leaves the class blank above OCR 4 where none is defined', () => {
    expect(classOf(0.035, 2 - EPS)).toBe(1);
    expect(classOf(0.035, 2)).toBe(2);
    expect(classOf(0.02, 4 + 1e-6)).toBeNull();
    expect(classOf(0.02, null)).toBeNull();
  });

  it('is refused without σ′v0, or when σ′v0 lies outside the loading', () => {
    const curve = compressionCurve(
      voidRatioTest(1.6, [
        [50, 1.55],
        [100, 1.5],
        [200, 1.3],
      ]),
    );
    if (!curve.ok) throw new Error(curve.message);
    expect(sampleQuality(curve.value, null, 150)).toMatchObject({ ok: false, reason: 'missing-input' });
    const outside = sampleQuality(curve.value, 20, 150);
    expect(!outside.ok && outside.message).toBe(
      'cannot determine Δe/e0: σ′v0 = 20 kPa lies outside the first loading (50–200 kPa).',
    );
  });
});
