/**
 * One-dimensional consolidation of a layered column by finite volumes in depth and
 * Crank–Nicolson in time. Each zone (a sublayer) has its own cv and mv; its permeability follows
 * k = cv·mv·γw, and the equation is written as mv·∂u/∂t = ∂/∂z((k/γw)·∂u/∂z) + mv·∂σ/∂t, so flow is
 * continuous across zone boundaries (series conductance of the two half-cells). γw cancels, so it
 * is not needed here. Terzaghi (1925); layered form e.g. Schiffman & Stein (1970), "One-dimensional
 * consolidation of layered systems", J. Soil Mech. Found. Div. 96(SM4) — from memory.
 *
 * Crank–Nicolson is unconditionally stable; the first four steps are backward Euler with tiny
 * steps (Rannacher 1984 start-up) to damp the oscillation CN otherwise keeps from the jump between
 * the initial excess pore pressure and the drained boundary. Steps then grow geometrically.
 */
import type { Boundary } from './terzaghi';

export interface FdZone {
  thicknessM: number;
  cvM2PerYear: number;
  /** mv in 1/kPa (any consistent unit: only ratios between zones matter). */
  mvPerKpa: number;
  /** Excess pore pressure the full load creates (Δσ), kPa. */
  initialExcessKpa: number;
  /** Number of finite-volume cells in this zone (≥ 1). */
  cells: number;
}

export interface FdProblem {
  zones: readonly FdZone[];
  top: Boundary;
  bottom: Boundary;
  /** Load applied at once (step) or increased linearly over `durationYears` (ramp). */
  loading: { kind: 'step' } | { kind: 'ramp'; durationYears: number };
  /** Output times, years, strictly increasing and > 0. */
  timesYears: ArrayLike<number>;
}

export interface FdResult {
  /** Degree of consolidation of each zone at each time, relative to the full load: index t·nZones + zone. */
  zoneDegree: Float64Array;
  zoneCount: number;
  steps: number;
}

const GROWTH = 1.1;

/**
 * Solves the layered problem and returns each zone's degree of consolidation, (σ(t) − ū)/Δσ with
 * ū the zone's mean excess pore pressure and σ(t) the load applied so far (a zone with Δσ = 0
 * reports the load fraction). Units: m, m²/yr, years; valid for any positive cv, mv and
 * thicknesses, with at least one pervious boundary. Accuracy: within 0.5 % of the Terzaghi series
 * for a single layer with 400 cells, i.e. ≥ 200 per drainage path, for Tv ≥ 0.001 (see tests).
 */
export function solveLayeredConsolidation(problem: FdProblem): FdResult {
  const { zones, timesYears } = problem;
  const n = zones.reduce((sum, z) => sum + z.cells, 0);
  const cap = new Float64Array(n);
  const u0 = new Float64Array(n);
  const halfConductance = new Float64Array(n);
  const zoneOf = new Int32Array(n);
  let c = 0;
  for (let zi = 0; zi < zones.length; zi++) {
    const zone = zones[zi] as FdZone;
    const h = zone.thicknessM / zone.cells;
    for (let j = 0; j < zone.cells; j++, c++) {
      cap[c] = zone.mvPerKpa * h;
      u0[c] = zone.initialExcessKpa;
      halfConductance[c] = (zone.cvM2PerYear * zone.mvPerKpa) / (h / 2);
      zoneOf[c] = zi;
    }
  }
  const link = new Float64Array(n + 1);
  link[0] = problem.top === 'pervious' ? (halfConductance[0] as number) : 0;
  link[n] = problem.bottom === 'pervious' ? (halfConductance[n - 1] as number) : 0;
  for (let i = 1; i < n; i++) {
    const a = halfConductance[i - 1] as number;
    const b = halfConductance[i] as number;
    link[i] = (a * b) / (a + b);
  }

  const ramp = problem.loading.kind === 'ramp' ? problem.loading.durationYears : 0;
  const loadFraction = (t: number) => (ramp > 0 ? Math.min(1, t / ramp) : 1);
  const u = new Float64Array(n);
  if (ramp === 0) u.set(u0);

  const targets: number[] = Array.from(timesYears);
  if (ramp > 0) targets.push(ramp);
  targets.sort((x, y) => x - y);
  const firstTime = targets[0] ?? 1;
  let dt = firstTime * 1e-4;

  const diag = new Float64Array(n);
  const rhs = new Float64Array(n);
  const cPrime = new Float64Array(n);
  const zoneDegree = new Float64Array(timesYears.length * zones.length);
  const zoneSum = new Float64Array(zones.length);
  const zoneWeight = new Float64Array(zones.length);
  for (let i = 0; i < n; i++) {
    const z = zoneOf[i] as number;
    zoneWeight[z] = (zoneWeight[z] as number) + (cap[i] as number);
  }

  let t = 0;
  let steps = 0;
  let out = 0;
  for (const target of targets) {
    while (t < target * (1 - 1e-12)) {
      const step = Math.min(dt, target - t);
      const theta = steps < 4 ? 1 : 0.5;
      const loadIncrement = loadFraction(t + step) - loadFraction(t);
      for (let i = 0; i < n; i++) {
        const left = link[i] as number;
        const right = link[i + 1] as number;
        const ci = (cap[i] as number) / step;
        const ui = u[i] as number;
        const flow = left * ((i > 0 ? (u[i - 1] as number) : 0) - ui) + right * ((i < n - 1 ? (u[i + 1] as number) : 0) - ui);
        diag[i] = ci + theta * (left + right);
        rhs[i] = ci * ui + (1 - theta) * flow + ci * (u0[i] as number) * loadIncrement;
      }
      // Thomas algorithm; off-diagonals are −θ·link.
      let denom = diag[0] as number;
      cPrime[0] = (-theta * (link[1] as number)) / denom;
      rhs[0] = (rhs[0] as number) / denom;
      for (let i = 1; i < n; i++) {
        const lower = -theta * (link[i] as number);
        denom = (diag[i] as number) - lower * (cPrime[i - 1] as number);
        cPrime[i] = (-theta * (link[i + 1] as number)) / denom;
        rhs[i] = ((rhs[i] as number) - lower * (rhs[i - 1] as number)) / denom;
      }
      u[n - 1] = rhs[n - 1] as number;
      for (let i = n - 2; i >= 0; i--) u[i] = (rhs[i] as number) - (cPrime[i] as number) * (u[i + 1] as number);
      t += step;
      steps++;
      if (step === dt || steps <= 4) dt *= GROWTH;
    }
    while (out < timesYears.length && (timesYears[out] as number) <= t * (1 + 1e-12)) {
      recordDegrees(out, loadFraction(t));
      out++;
    }
  }
  return { zoneDegree, zoneCount: zones.length, steps };

  function recordDegrees(index: number, fraction: number): void {
    zoneSum.fill(0);
    for (let i = 0; i < n; i++) {
      const z = zoneOf[i] as number;
      const initial = u0[i] as number;
      const local = initial > 0 ? fraction - (u[i] as number) / initial : fraction;
      zoneSum[z] = (zoneSum[z] as number) + (cap[i] as number) * local;
    }
    for (let z = 0; z < zones.length; z++) {
      zoneDegree[index * zones.length + z] = (zoneSum[z] as number) / (zoneWeight[z] as number);
    }
  }
}
