import { describe, expect, it, test } from 'vitest';
import { embankmentStressKpa, linearStripSegmentStressKpa, stripStressKpa } from '../../../src/lib/consolidation/stress-strip';
import { integrateLineLoads } from './boussinesq-reference';

describe('strip load (q/π)[α + sin α cos(α + 2δ)]', () => {
  test.each([
    [0, 1],
    [0.3, 0.5],
    [1, 2],
    [2.5, 1],
    [-4, 3],
  ])('matches numerical integration of the Boussinesq line load at x = %f, z = %f', (x, z) => {
    // Independent check: Simpson integration of 2p·z³/(π(x² + z²)²) across a 2 m strip.
    expect(stripStressKpa(100, 2, x, z)).toBeCloseTo(
      integrateLineLoads(() => 100, -1, 1, x, z),
      6,
    );
  });

  it('gives 0.550q below the centre at z = B', () => {
    // source: Boussinesq strip, centre at z = B: (2φ + sin 2φ)/π with φ = atan(0.5) = 0.5498 (from memory, textbook chart value 0.55)
    expect(stripStressKpa(1, 4, 0, 4)).toBeCloseTo(0.5498, 4);
  });

  it('tends to q for a very wide strip (wide-fill limit)', () => {
    expect(stripStressKpa(60, 1e6, 0, 10)).toBeCloseTo(60, 3);
    expect(stripStressKpa(60, 1e6, 2000, 30)).toBeCloseTo(60, 3);
  });
});

describe('embankment by superposed ramp strips (Osterberg 1957)', () => {
  const q = 100;
  const crest = 12;
  const slope = 8;
  const intensity = (s: number) => {
    const x = Math.abs(s);
    return x <= crest / 2 ? q : Math.max(0, (q * (crest / 2 + slope - x)) / slope);
  };

  test.each([
    [0, 2],
    [4, 5],
    [8, 1],
    [11, 3],
    [-15, 6],
    [0, 30],
  ])('matches numerical integration of the Boussinesq line load at x = %f, z = %f', (x, z) => {
    // Independent check: Simpson integration of the line load over the trapezoidal section.
    const expected = integrateLineLoads(intensity, -crest / 2 - slope, crest / 2 + slope, x, z, 40000);
    expect(embankmentStressKpa(q, crest, slope, x, z)).toBeCloseTo(expected, 5);
  });

  it("matches Osterberg's half-embankment formula on the centreline", () => {
    // source: Osterberg (1957) half embankment, Δσ = (q/π)[((a+b)/a)(α1+α2) − (b/a)α2], doubled on the centreline (from memory)
    for (const z of [1, 3, 7, 15]) {
      const a = slope;
      const b = crest / 2;
      const alpha2 = Math.atan(b / z);
      const alpha1 = Math.atan((a + b) / z) - alpha2;
      const osterberg = (2 * q * (((a + b) / a) * (alpha1 + alpha2) - (b / a) * alpha2)) / Math.PI;
      expect(embankmentStressKpa(q, crest, slope, 0, z)).toBeCloseTo(osterberg, 9);
    }
  });

  it('becomes a uniform strip as the side slopes vanish and q for a very wide embankment', () => {
    expect(embankmentStressKpa(q, 10, 1e-6, 2, 3)).toBeCloseTo(stripStressKpa(q, 10, 2, 3), 5);
    expect(embankmentStressKpa(q, 1e6, 10, 0, 5)).toBeCloseTo(q, 3);
  });

  it('reduces to the uniform strip when both ends of a segment carry the same pressure', () => {
    expect(linearStripSegmentStressKpa(40, 40, -3, 3, 1, 2)).toBeCloseTo(stripStressKpa(40, 6, 1, 2), 12);
  });
});
