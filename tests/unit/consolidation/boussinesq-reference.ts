/**
 * Independent numerical integrations of the Boussinesq (1885) point load σz = 3Q·z³/(2π·R⁵) and the
 * Flamant line load σz = 2P·z³/(π·(x² + z²)²), used only by tests to check the closed forms.
 */

/** Δσz below (x, y) at depth z for pressure q on the rectangle [x1,x2]×[y1,y2], midpoint rule n×n. */
export function integrateRectangle(
  q: number,
  x1: number,
  x2: number,
  y1: number,
  y2: number,
  x: number,
  y: number,
  z: number,
  n = 600,
): number {
  const hx = (x2 - x1) / n;
  const hy = (y2 - y1) / n;
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const dx = x1 + (i + 0.5) * hx - x;
    for (let j = 0; j < n; j++) {
      const dy = y1 + (j + 0.5) * hy - y;
      const r2 = dx * dx + dy * dy + z * z;
      sum += 1 / (r2 * r2 * Math.sqrt(r2));
    }
  }
  return ((3 * q * z ** 3) / (2 * Math.PI)) * sum * hx * hy;
}

/** Δσz at (x, z) from a line-load intensity p(s) over [s1, s2], Simpson with n panels (n even). */
export function integrateLineLoads(p: (s: number) => number, s1: number, s2: number, x: number, z: number, n = 20000): number {
  const h = (s2 - s1) / n;
  const f = (s: number) => {
    const r2 = (x - s) ** 2 + z * z;
    return (2 * p(s) * z ** 3) / (Math.PI * r2 * r2);
  };
  let sum = f(s1) + f(s2);
  for (let i = 1; i < n; i++) sum += (i % 2 ? 4 : 2) * f(s1 + i * h);
  return (sum * h) / 3;
}

/** Δσz at depth z below a point at distance d from the centre of a loaded circle of radius a (polar midpoint rule about the circle's centre). */
export function integrateCircle(q: number, a: number, d: number, z: number, nr = 500, nt = 720): number {
  const hr = a / nr;
  const ht = (2 * Math.PI) / nt;
  let sum = 0;
  for (let i = 0; i < nr; i++) {
    const r = (i + 0.5) * hr;
    for (let j = 0; j < nt; j++) {
      const t = (j + 0.5) * ht;
      const r2 = r * r + d * d - 2 * r * d * Math.cos(t) + z * z;
      sum += r / (r2 * r2 * Math.sqrt(r2));
    }
  }
  return ((3 * q * z ** 3) / (2 * Math.PI)) * sum * hr * ht;
}
