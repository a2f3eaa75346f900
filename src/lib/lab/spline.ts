/**
 * Natural cubic spline through points with strictly increasing x: C² smooth, zero second derivative
 * at both ends. Used to draw a smooth curve through laboratory points and to read its slope and
 * curvature between them. Source: the standard tridiagonal construction (e.g. Burden & Faires,
 * Numerical Analysis, natural cubic spline algorithm) — from memory.
 */
export class NaturalSpline {
  private readonly xs: Float64Array;
  private readonly ys: Float64Array;
  /** second derivatives at the knots */
  private readonly m: Float64Array;

  constructor(xs: readonly number[], ys: readonly number[]) {
    const n = xs.length;
    if (n < 2 || ys.length !== n) throw new RangeError('A spline needs at least two points with one y per x.');
    this.xs = Float64Array.from(xs);
    this.ys = Float64Array.from(ys);
    for (let i = 1; i < n; i++) {
      if (!((this.xs[i] as number) > (this.xs[i - 1] as number))) throw new RangeError('Spline x values must increase strictly.');
    }
    this.m = new Float64Array(n);
    if (n < 3) return;
    const h = (i: number) => (this.xs[i + 1] as number) - (this.xs[i] as number);
    const diag = new Float64Array(n);
    const rhs = new Float64Array(n);
    for (let i = 1; i < n - 1; i++) {
      diag[i] = 2 * (h(i - 1) + h(i));
      rhs[i] =
        (6 * ((this.ys[i + 1] as number) - (this.ys[i] as number))) / h(i) -
        (6 * ((this.ys[i] as number) - (this.ys[i - 1] as number))) / h(i - 1);
    }
    // Thomas algorithm on the interior knots; off-diagonals are h(i−1) below and h(i) above.
    for (let i = 2; i < n - 1; i++) {
      const w = h(i - 1) / (diag[i - 1] as number);
      diag[i] = (diag[i] as number) - w * h(i - 1);
      rhs[i] = (rhs[i] as number) - w * (rhs[i - 1] as number);
    }
    for (let i = n - 2; i >= 1; i--) {
      const above = i < n - 2 ? h(i) * (this.m[i + 1] as number) : 0;
      this.m[i] = ((rhs[i] as number) - above) / (diag[i] as number);
    }
  }

  get first(): number {
    return this.xs[0] as number;
  }

  get last(): number {
    return this.xs[this.xs.length - 1] as number;
  }

  /** Value, first and second derivative at x (x outside the knots is extended by the end cubic). */
  at(x: number): { y: number; dy: number; d2y: number } {
    const n = this.xs.length;
    let i = 0;
    let hi = n - 1;
    while (hi - i > 1) {
      const mid = (i + hi) >> 1;
      if ((this.xs[mid] as number) > x) hi = mid;
      else i = mid;
    }
    const x0 = this.xs[i] as number;
    const x1 = this.xs[i + 1] as number;
    const h = x1 - x0;
    const m0 = this.m[i] as number;
    const m1 = this.m[i + 1] as number;
    const y0 = this.ys[i] as number;
    const y1 = this.ys[i + 1] as number;
    const a = x1 - x;
    const b = x - x0;
    const y = (m0 * a ** 3 + m1 * b ** 3) / (6 * h) + (y0 / h - (m0 * h) / 6) * a + (y1 / h - (m1 * h) / 6) * b;
    const dy = (-m0 * a * a + m1 * b * b) / (2 * h) + (y1 - y0) / h - ((m1 - m0) * h) / 6;
    const d2y = (m0 * a + m1 * b) / h;
    return { y, dy, d2y };
  }
}
