import { describe, expect, it } from 'vitest';
import { compressionCurve } from '../../../src/lib/lab/compression-curve';
import { compressionIndex } from '../../../src/lib/lab/compression-index';
import { recompressionIndex } from '../../../src/lib/lab/recompression-index';
import type { IncrementalTestInput } from '../../../src/lib/lab/test-input';
import { bilinear, ladder, voidRatioTest } from './support';

function curveOf(test: IncrementalTestInput) {
  const curve = compressionCurve(test);
  if (!curve.ok) throw new Error(curve.message);
  return curve.value;
}

// an idealised curve: Cr = 0.05 below σ′p = 100 kPa, Cc = 0.6 above (UFC 3-220-10 Fig. 3-12 shape)
const e = bilinear(1.2, 100, 0.05, 0.6);
const loading = ladder(12.5, 1600, 2).map((s) => [s, e(s)] as const);

describe('Cc, the slope of the virgin line', () => {
  it('is −Δe/Δlog σ′ of the steepest straight part, with its range', () => {
    // source: Cc = −Δe/Δlog10 σ′ on the virgin line (Terzaghi & Peck 1967; UFC 3-220-10 Eq. 5-11)
    const cc = compressionIndex(curveOf(voidRatioTest(1.4, loading)));
    expect(cc.ok && cc.value.value).toBeCloseTo(0.6, 12);
    // the corner at σ′p = 100 kPa lies on the virgin line, so the first steepest window starts there
    expect(cc.ok && cc.value.range).toEqual({ fromKpa: 100, toKpa: 400 });
    expect(cc.ok && cc.value.chosenBy).toBe('auto');
  });

  it("takes a steward's range", () => {
    const cc = compressionIndex(curveOf(voidRatioTest(1.4, loading)), { range: { fromKpa: 50, toKpa: 200 } });
    // by hand: least squares through (50, 1.2151), (100, 1.2), (200, 1.0194)
    expect(cc.ok && cc.value.chosenBy).toBe('person');
    expect(cc.ok && cc.value.value).toBeCloseTo((e(50) - e(200)) / Math.log10(4), 12);
  });

  it('is refused when the loading never bends into a virgin line', () => {
    const straight = ladder(12.5, 400, 2).map((s) => [s, 1.2 - 0.3 * Math.log10(s / 12.5)] as const);
    const cc = compressionIndex(curveOf(voidRatioTest(1.3, straight)));
    expect(cc).toMatchObject({ ok: false, reason: 'no-virgin-branch' });
    expect(!cc.ok && cc.message).toMatch(/^cannot determine Cc: the curve is steepest at the start of loading/);
  });

  it('is refused when the test stops before yield (no clear steepening)', () => {
    const early = ladder(12.5, 100, 2).map((s) => [s, e(s)] as const);
    expect(compressionIndex(curveOf(voidRatioTest(1.4, early)))).toMatchObject({ ok: false, reason: 'no-virgin-branch' });
  });

  it('is refused with too few points, or when the loading swells', () => {
    expect(compressionIndex(curveOf(voidRatioTest(1.4, loading.slice(0, 2))))).toMatchObject({
      ok: false,
      reason: 'too-few-points',
    });
    const backwards = loading.map(([s, v]) => [s, s === 400 ? v + 0.5 : v] as const);
    const cc = compressionIndex(curveOf(voidRatioTest(1.4, backwards)));
    expect(!cc.ok && cc.message).toMatch(/^cannot determine Cc: increment 6 \(400 kPa\) swells under a larger load/);
  });
});

describe('Cr, the unload–reload slope', () => {
  const unloaded = [...loading, [400, e(1600) + 0.05 * Math.log10(4)], [100, e(1600) + 0.05 * Math.log10(16)]] as const;

  it('is the slope of the first unloading, from the point it began', () => {
    // source: Cr = −Δe/Δlog10 σ′ on unloading–reloading (UFC 3-220-10 Eq. 5-10, Fig. 3-12)
    const cr = recompressionIndex(curveOf(voidRatioTest(1.4, unloaded)));
    expect(cr.ok && cr.value.value).toBeCloseTo(0.05, 12);
    expect(cr.ok && cr.value.range).toEqual({ fromKpa: 100, toKpa: 1600 });
  });

  it('is refused without an unloading, and when the unloading compresses', () => {
    expect(recompressionIndex(curveOf(voidRatioTest(1.4, loading)))).toMatchObject({ ok: false, reason: 'no-unloading' });
    const wrong = [...loading, [400, e(1600) - 0.05]] as const;
    expect(recompressionIndex(curveOf(voidRatioTest(1.4, wrong)))).toMatchObject({ ok: false, reason: 'goes-backwards' });
  });
});
