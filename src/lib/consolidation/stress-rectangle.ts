/**
 * Vertical stress increase under a uniformly loaded rectangle on a homogeneous, isotropic,
 * linear-elastic half-space (Boussinesq), by superposing corner solutions.
 */

/**
 * Influence factor Iz below the corner of a uniformly loaded B×L rectangle, with m = B/z and
 * n = L/z (both ≥ 0): Iz = (1/4π)·{[2mn√V/(V + m²n²)]·[(V+1)/V] + atan2(2mn√V, V − m²n²)},
 * V = m² + n² + 1 (the atan2 takes the correct quadrant when V < m²n²). Range 0…0.25.
 * Source: Newmark (1935); Fadum (1948) chart; check values in the project's reference sheet.
 */
export function cornerInfluenceFactor(m: number, n: number): number {
  if (m <= 0 || n <= 0) return 0;
  if (!Number.isFinite(m) && !Number.isFinite(n)) return 0.25;
  if (!Number.isFinite(m) || !Number.isFinite(n)) {
    const k = Number.isFinite(m) ? m : n;
    return (1 / (2 * Math.PI)) * (Math.atan(k) + k / (1 + k * k));
  }
  const mn = m * n;
  const V = m * m + n * n + 1;
  const sqrtV = Math.sqrt(V);
  const first = ((2 * mn * sqrtV) / (V + mn * mn)) * ((V + 1) / V);
  const second = Math.atan2(2 * mn * sqrtV, V - mn * mn);
  return (first + second) / (4 * Math.PI);
}

/** Signed corner term: the influence of the rectangle spanning [0,a]×[0,b] seen from the origin. */
function signedCorner(aM: number, bM: number, depthM: number): number {
  return Math.sign(aM) * Math.sign(bM) * cornerInfluenceFactor(Math.abs(aM) / depthM, Math.abs(bM) / depthM);
}

/**
 * Δσz (kPa) at depth z > 0 (m) below a point (xM, yM) measured from the centre of a rectangle of
 * width B (along x) and length L (along y), m, loaded by q (kPa). Inside or outside the
 * rectangle, by signed superposition of four corner rectangles (Newmark 1935; Fadum 1948).
 * At z = 0 returns q inside, q/2 on an edge and 0 outside.
 */
export function rectangleStressKpa(
  pressureKpa: number,
  widthM: number,
  lengthM: number,
  xM: number,
  yM: number,
  depthM: number,
): number {
  const x1 = -widthM / 2 - xM;
  const x2 = widthM / 2 - xM;
  const y1 = -lengthM / 2 - yM;
  const y2 = lengthM / 2 - yM;
  if (depthM <= 0) {
    const inX = x1 < 0 && x2 > 0 ? 1 : x1 === 0 || x2 === 0 ? 0.5 : 0;
    const inY = y1 < 0 && y2 > 0 ? 1 : y1 === 0 || y2 === 0 ? 0.5 : 0;
    return pressureKpa * inX * inY;
  }
  const influence =
    signedCorner(x2, y2, depthM) - signedCorner(x1, y2, depthM) - signedCorner(x2, y1, depthM) + signedCorner(x1, y1, depthM);
  return pressureKpa * influence;
}
