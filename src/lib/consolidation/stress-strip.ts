/**
 * Vertical stress increase under infinitely long (plane-strain) surface loads on a homogeneous
 * elastic half-space: the uniform strip and the trapezoidal embankment.
 */

/**
 * Δσz (kPa) at depth z > 0 (m) and horizontal offset x (m) from the centreline of a uniformly
 * loaded strip of width B (m), pressure q (kPa):
 * Δσz = (q/π)·[α + sin α·cos(α + 2δ)], α the angle the strip subtends at the point and δ the
 * angle from the vertical to the nearer-left edge (signed). Source: Boussinesq strip solution
 * (Flamant line load integrated; e.g. Poulos & Davis 1974, Table 3.1 — from memory).
 */
export function stripStressKpa(pressureKpa: number, widthM: number, offsetM: number, depthM: number): number {
  if (depthM <= 0) {
    const inside = Math.abs(offsetM) < widthM / 2 ? 1 : Math.abs(offsetM) === widthM / 2 ? 0.5 : 0;
    return pressureKpa * inside;
  }
  const delta = Math.atan((-widthM / 2 - offsetM) / depthM);
  const alpha = Math.atan((widthM / 2 - offsetM) / depthM) - delta;
  return (pressureKpa / Math.PI) * (alpha + Math.sin(alpha) * Math.cos(alpha + 2 * delta));
}

/**
 * Δσz (kPa) at (x, z) from a strip load whose intensity varies linearly from `startKpa` at
 * s = s1 to `endKpa` at s = s2 (m, s2 > s1). Closed-form integral of the Boussinesq (Flamant)
 * line load dσz = (2p·z³/π)/((x − s)² + z²)² ds over the segment:
 * σz = (1/π)·[(p0 + p1·x)·(z·w/(w² + z²) + atan(w/z)) − p1·z³/(w² + z²)] between w = s1 − x and
 * w = s2 − x, with p(s) = p0 + p1·s. The building block of Osterberg's (1957) embankment chart.
 */
export function linearStripSegmentStressKpa(
  startKpa: number,
  endKpa: number,
  s1M: number,
  s2M: number,
  xM: number,
  depthM: number,
): number {
  const slope = (endKpa - startKpa) / (s2M - s1M);
  const p0 = startKpa - slope * s1M;
  const z = depthM;
  const at = (w: number) => {
    const r2 = w * w + z * z;
    return (p0 + slope * xM) * ((z * w) / r2 + Math.atan(w / z)) - (slope * z * z * z) / r2;
  };
  return (at(s2M - xM) - at(s1M - xM)) / Math.PI;
}

/**
 * Δσz (kPa) at depth z > 0 (m), offset x (m) from the centreline of an infinitely long symmetric
 * embankment: crest width Bc (m, ≥ 0), horizontal side-slope width a (m, > 0) each side, fill
 * pressure q = γ·H (kPa) at the crest. Superposition of two ramp strips and the crest strip
 * (Osterberg 1957, "Influence values for vertical stresses in a semi-infinite mass due to an
 * embankment loading", Proc. 4th ICSMFE London 1:393–394 — from memory).
 */
export function embankmentStressKpa(
  pressureKpa: number,
  crestWidthM: number,
  sideSlopeWidthM: number,
  offsetM: number,
  depthM: number,
): number {
  const half = crestWidthM / 2;
  const toe = half + sideSlopeWidthM;
  if (depthM <= 0) {
    const x = Math.abs(offsetM);
    if (x <= half) return pressureKpa;
    if (x >= toe) return 0;
    return (pressureKpa * (toe - x)) / sideSlopeWidthM;
  }
  let sum =
    linearStripSegmentStressKpa(0, pressureKpa, -toe, -half, offsetM, depthM) +
    linearStripSegmentStressKpa(pressureKpa, 0, half, toe, offsetM, depthM);
  if (half > 0) sum += linearStripSegmentStressKpa(pressureKpa, pressureKpa, -half, half, offsetM, depthM);
  return sum;
}
