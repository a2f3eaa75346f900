import { describe, expect, it } from 'vitest';
import { maskFactor, maskShift, noiseMoments } from '../../../src/lib/statistics/masking';
import { PARAMETER_KEYS, PARAMETERS } from '../../../src/lib/statistics/parameters';

const keys = Array.from({ length: 20_000 }, (_, i) => Math.imul(i + 1, 2654435761) >>> 0);

describe('masking factors', () => {
  it.each(PARAMETER_KEYS)('%s: every shift lies in ±[a, b], a third to two thirds of the typical spread', (key) => {
    const definition = PARAMETERS[key];
    const { min, max } = definition.maskBand;
    expect(min).toBeCloseTo(definition.typicalSpread / 3, 12);
    expect(max).toBeCloseTo((2 * definition.typicalSpread) / 3, 12);
    const magnitudes = keys.map((k) => Math.abs(maskShift(k, definition)));
    expect(Math.min(...magnitudes)).toBeGreaterThanOrEqual(min);
    expect(Math.max(...magnitudes)).toBeLessThanOrEqual(max);
  });

  it('gives a test the same factor every time, and a different one per parameter', () => {
    const cc = PARAMETERS.compressionIndex;
    const ll = PARAMETERS.liquidLimitPct;
    expect(maskFactor(12345, cc)).toBe(maskFactor(12345, cc));
    let sameSign = 0;
    for (const k of keys) if (Math.sign(maskShift(k, cc)) === Math.sign(maskShift(k, ll))) sameSign++;
    // independent signs agree half the time: binomial sd for 20 000 is 0.35 %
    expect(Math.abs(sameSign / keys.length - 0.5)).toBeLessThan(0.015);
  });

  it('has a balanced sign and a magnitude spread evenly over the band', () => {
    const definition = PARAMETERS.compressionIndex;
    const shifts = keys.map((k) => maskShift(k, definition));
    const positive = shifts.filter((s) => s > 0).length / shifts.length;
    expect(Math.abs(positive - 0.5)).toBeLessThan(0.015);
    const { min, max } = definition.maskBand;
    const lowerHalf = shifts.filter((s) => Math.abs(s) < (min + max) / 2).length / shifts.length;
    expect(Math.abs(lowerHalf - 0.5)).toBeLessThan(0.015);
  });

  it('noise moments match the closed forms of a uniform magnitude with a random sign', () => {
    // E m² for m uniform on [a, b] is (a² + ab + b²)/3; for exp(±m), Var ln F is the same.
    for (const key of ['compressionIndex', 'cvNcM2PerYear'] as const) {
      const { min: a, max: b } = PARAMETERS[key].maskBand;
      const secondMoment = (a * a + a * b + b * b) / 3;
      const moments = noiseMoments(key);
      if (PARAMETERS[key].scale === 'linear') expect(moments.factorVariance).toBeCloseTo(secondMoment, 8);
      else {
        expect(moments.lnVariance).toBeCloseTo(secondMoment, 8);
        expect(moments.lnMean).toBeCloseTo(0, 12);
      }
    }
  });
});
