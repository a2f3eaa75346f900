/**
 * Benchmark of the consolidation engine's Monte Carlo path (`npm run bench:engine`).
 * 10 000 realisations × a 10-sublayer profile (two clay layers, five sublayers each) × 50 time
 * points, against a floor: one hand-written function doing the same arithmetic (same generator,
 * same sampling, same settlement, table look-ups, roots, percentiles and rank correlations) with
 * nothing shared but the precomputed deterministic tables. Prints the median of several timed
 * runs after warm-up. Target: engine ≤ 2 × floor and < 150 ms.
 */
import { runDeterministic } from '../src/lib/consolidation/deterministic';
import { toEngineInput } from '../src/lib/consolidation/input-conversion';
import { runMonteCarlo } from '../src/lib/consolidation/monte-carlo';
import { buildPlan } from '../src/lib/consolidation/monte-carlo-plan';
import { summariseMonteCarlo } from '../src/lib/consolidation/monte-carlo-summary';
import { splitMix64 } from '../src/lib/consolidation/random';
import { estimatePreviewSchema } from '../src/lib/schemas/estimate-preview';

const REALISATIONS = 10_000;
const TIME_POINTS = 50;
const SEED = 20_240_601;
const RUNS = 7;

const request = estimatePreviewSchema.parse({
  unitSystem: 'SI',
  waterTableDepth: 1,
  layers: [
    {
      name: 'Soft clay',
      thickness: 6,
      unitWeightAboveWater: 16,
      unitWeightBelowWater: 16,
      cc: { type: 'normal', mean: 0.9, sd: 0.15 },
      cr: { type: 'lognormal', mean: 0.09, sd: 0.02 },
      e0: { type: 'normal', mean: 2.1, sd: 0.2 },
      ccE0Correlation: 0.6,
      ocr: { type: 'normal', mean: 1.3, sd: 0.1 },
      cv: { type: 'lognormal', mean: 1.5, sd: 0.7 },
      cAlpha: { type: 'lognormal', mean: 0.036, sd: 0.006 },
    },
    {
      name: 'Silty clay',
      thickness: 8,
      unitWeightAboveWater: 18,
      unitWeightBelowWater: 18,
      cc: { type: 'normal', mean: 0.45, sd: 0.08 },
      cr: { type: 'lognormal', mean: 0.05, sd: 0.01 },
      e0: { type: 'normal', mean: 1.2, sd: 0.12 },
      ocr: { type: 'normal', mean: 1.6, sd: 0.15 },
      cv: { type: 'lognormal', mean: 4, sd: 1.5 },
      cAlpha: { type: 'lognormal', mean: 0.015, sd: 0.003 },
    },
  ],
  load: { type: 'wideFill', pressure: 60 },
  drainage: { top: 'pervious', bottom: 'pervious' },
  options: { designLifeYears: 50, sublayers: { mode: 'fixed', perLayer: 5 } },
});
const det = runDeterministic(toEngineInput(request));
const times = Array.from({ length: TIME_POINTS }, (_, i) => 0.01 * 10 ** ((4 * i) / (TIME_POINTS - 1)));

function engine() {
  const run = runMonteCarlo(det, times, REALISATIONS, SEED);
  return { run, summary: summariseMonteCarlo(run, (i) => det.input.layers[i]?.name ?? '') };
}

// ---- floor: the same arithmetic written out by hand ----

/** Normal (mean, sd) or log-normal (μ, σ of ln) as the floor samples them; null = fixed value. */
type FloorDist = { log: boolean; a: number; b: number } | null;

function floorDist(spec: unknown): FloorDist {
  if (typeof spec !== 'object' || spec === null) return null;
  const d = spec as { type: string; mean: number; sd: number };
  if (d.type === 'normal') return { log: false, a: d.mean, b: d.sd };
  const s2 = Math.log(1 + (d.sd * d.sd) / (d.mean * d.mean));
  return { log: true, a: Math.log(d.mean) - s2 / 2, b: Math.sqrt(s2) };
}

// Precomputed once, as the engine precomputes them: sublayer log-stresses, degree tables, times.
const plan = buildPlan(det, times);
const floorLayers = det.input.layers.map((layer) => {
  const c = layer.compression as { cc: unknown; cr: unknown; e0: unknown };
  const pre = layer.preconsolidation as { ocr: unknown };
  const sec = layer.secondary as { cAlpha: unknown };
  return [
    floorDist(c.cc),
    floorDist(c.e0),
    floorDist(c.cr),
    floorDist(pre.ocr),
    floorDist(layer.cvM2PerYear),
    floorDist(sec.cAlpha),
  ];
});
const L = plan.layers.length;
const T = plan.lnTimes.length;
const tables = plan.layers.map((l) => l.table.values);
const table0 = (plan.layers[0] as (typeof plan.layers)[number]).table;
const thickness = Float64Array.from(plan.layers, (l) => l.thicknessM);
const subStart = Int32Array.from(plan.layers, (l) => l.subStart);
const subEnd = Int32Array.from(plan.layers, (l) => l.subEnd);
const group0 = plan.groups[0] as (typeof plan.groups)[number];

/** xoshiro128** seeded like the engine's generator; Box–Muller normals into z. */
function floorNormals(state: Uint32Array, z: Float64Array): void {
  let s0 = state[0] as number;
  let s1 = state[1] as number;
  let s2 = state[2] as number;
  let s3 = state[3] as number;
  let u1 = 0;
  const n = z.length;
  for (let i = 0; i < n; ) {
    for (let k = 0; k < 2; k++) {
      const x = Math.imul(s1, 5);
      const out = Math.imul((x << 7) | (x >>> 25), 9) >>> 0;
      const t = s1 << 9;
      s2 ^= s0;
      s3 ^= s1;
      s1 ^= s2;
      s0 ^= s3;
      s2 ^= t;
      s3 = (s3 << 11) | (s3 >>> 21);
      if (k === 0) u1 = (out + 0.5) / 4294967296;
      else {
        const r = Math.sqrt(-2 * Math.log(u1));
        const a = 2 * Math.PI * ((out + 0.5) / 4294967296);
        z[i++] = r * Math.cos(a);
        if (i < n) z[i++] = r * Math.sin(a);
      }
    }
  }
  state[0] = s0;
  state[1] = s1;
  state[2] = s2;
  state[3] = s3;
}

function floorSeed(seed: number): Uint32Array {
  const next = splitMix64(BigInt(seed >>> 0));
  const a = next();
  const b = next();
  return Uint32Array.from([a & 0xffffffffn, a >> 32n, b & 0xffffffffn, b >> 32n], Number);
}

/** Columns cc, e0, cr, OCR, cv, Cα per layer (e0 correlated with cc), and the list of varying ones. */
function floorSample(n: number) {
  const state = floorSeed(SEED);
  const columns: Float64Array[][] = [];
  const varying: Float64Array[] = [];
  floorLayers.forEach((dists, li) => {
    const cols: Float64Array[] = [];
    let ccScores: Float64Array | null = null;
    dists.forEach((d, k) => {
      const v = new Float64Array(n);
      cols.push(v);
      if (!d) return;
      const z = new Float64Array(n);
      floorNormals(state, z);
      const rho = det.input.layers[li]?.ccE0Correlation ?? 0;
      if (k === 1 && ccScores && rho !== 0) {
        const b = Math.sqrt(1 - rho * rho);
        for (let i = 0; i < n; i++) z[i] = rho * (ccScores[i] as number) + b * (z[i] as number);
      }
      if (k === 0) ccScores = z;
      if (d.log) for (let i = 0; i < n; i++) v[i] = Math.exp(d.a + d.b * (z[i] as number));
      else for (let i = 0; i < n; i++) v[i] = d.a + d.b * (z[i] as number);
      varying.push(v);
    });
    columns.push(cols);
  });
  return { columns, varying };
}

function floorRoot(ls: Float64Array, target: number, lnLam: number): number {
  let w = 0;
  for (let li = 0; li < L; li++) w += ls[li] as number;
  let lo = 0;
  let hi = table0.values.length - 1;
  let atLo = 0;
  for (let li = 0; li < L; li++) atLo += ((ls[li] as number) / w) * ((tables[li] as Float64Array)[0] as number);
  if (atLo >= target) return table0.lnStart + 2 * Math.log(target / atLo) - lnLam;
  while (hi - lo > 1) {
    const mid = (lo + hi) >>> 1;
    let at = 0;
    for (let li = 0; li < L; li++) at += ((ls[li] as number) / w) * ((tables[li] as Float64Array)[mid] as number);
    if (at >= target) hi = mid;
    else lo = mid;
  }
  let a = 0;
  let b = 0;
  for (let li = 0; li < L; li++) {
    a += ((ls[li] as number) / w) * ((tables[li] as Float64Array)[lo] as number);
    b += ((ls[li] as number) / w) * ((tables[li] as Float64Array)[hi] as number);
  }
  return table0.lnStart + (lo + (target - a) / (b - a)) * table0.lnStep - lnLam;
}

/** The realisation loop: settlement per sublayer, secondary, t90 and the curve. */
function floorLoop(n: number, columns: Float64Array[][]) {
  const finalM = new Float64Array(n);
  const t90 = new Float64Array(n);
  const curve = new Float64Array(T * n);
  const ls = new Float64Array(L);
  const lsec = new Float64Array(L);
  const h = plan.subThicknessM;
  const lv0 = plan.subLog10SigmaV0;
  const lf = plan.subLog10SigmaFinal;
  const base = plan.subLog10PreBase;
  const lnLife = Math.log(plan.designLifeYears);
  const count = table0.values.length;
  for (let r = 0; r < n; r++) {
    let primary = 0;
    let sumH = 0;
    for (let li = 0; li < L; li++) {
      const c = columns[li] as Float64Array[];
      const inv = 1 / (1 + ((c[1] as Float64Array)[r] as number));
      const A = ((c[0] as Float64Array)[r] as number) * inv;
      const B = ((c[2] as Float64Array)[r] as number) * inv;
      const add = Math.log10((c[3] as Float64Array)[r] as number);
      const secc = ((c[5] as Float64Array)[r] as number) * inv;
      let s = 0;
      let sec = 0;
      for (let j = subStart[li] as number; j < (subEnd[li] as number); j++) {
        const v0 = lv0[j] as number;
        const f = lf[j] as number;
        const p = (base[j] as number) + add;
        const hj = h[j] as number;
        if (p <= v0) s += A * (f - v0) * hj;
        else if (f <= p) s += B * (f - v0) * hj;
        else s += (B * (p - v0) + A * (f - p)) * hj;
        sec += secc * hj;
      }
      ls[li] = s;
      lsec[li] = sec;
      primary += s;
      sumH += (thickness[li] as number) / Math.sqrt((c[4] as Float64Array)[r] as number);
    }
    const lnLam = group0.lnTauYears - Math.log((sumH * sumH) / 4);
    const lnTp = floorRoot(ls, plan.endOfPrimaryDegree, lnLam);
    t90[r] = Math.exp(floorRoot(ls, 0.9, lnLam));
    let secLife = 0;
    if (lnLife > lnTp) for (let li = 0; li < L; li++) secLife += (lsec[li] as number) * (lnLife - lnTp) * Math.LOG10E;
    finalM[r] = primary + secLife;
    for (let ti = 0; ti < T; ti++) {
      const lnT = plan.lnTimes[ti] as number;
      const x = (lnT + lnLam - table0.lnStart) / table0.lnStep;
      const over = lnT - lnTp;
      let total = 0;
      for (let li = 0; li < L; li++) {
        const values = tables[li] as Float64Array;
        let u: number;
        if (x <= 0) u = (values[0] as number) * Math.exp(0.5 * x * table0.lnStep);
        else if (x >= count - 1) u = values[count - 1] as number;
        else {
          const k = x | 0;
          const a = values[k] as number;
          u = a + (x - k) * ((values[k + 1] as number) - a);
        }
        total += (ls[li] as number) * u + (over > 0 ? (lsec[li] as number) * over * Math.LOG10E : 0);
      }
      curve[ti * n + r] = total;
    }
  }
  return { finalM, t90, curve };
}

function floorSelect(a: Float64Array, k: number, from: number, to: number): void {
  let lo = from;
  let hi = to;
  while (hi > lo) {
    const x = a[lo] as number;
    const y = a[hi] as number;
    let pivot = a[(lo + hi) >>> 1] as number;
    if ((x <= pivot && pivot <= y) || (y <= pivot && pivot <= x)) {
      // median of three
    } else if ((pivot <= x && x <= y) || (y <= x && x <= pivot)) pivot = x;
    else pivot = y;
    let i = lo;
    let j = hi;
    while (i <= j) {
      while ((a[i] as number) < pivot) i++;
      while ((a[j] as number) > pivot) j--;
      if (i <= j) {
        const t = a[i] as number;
        a[i] = a[j] as number;
        a[j] = t;
        i++;
        j--;
      }
    }
    if (k <= j) hi = j;
    else if (k >= i) lo = i;
    else return;
  }
}

/** Type-7 quantile p of a (reordered), selecting inside [from, to]. */
function floorQuantile(a: Float64Array, p: number, from: number, to: number): number {
  const hh = (a.length - 1) * p;
  const k = Math.floor(hh);
  floorSelect(a, k, from, to);
  const low = a[k] as number;
  if (hh === k) return low;
  let next = Number.POSITIVE_INFINITY;
  for (let i = k + 1; i <= to; i++) if ((a[i] as number) < next) next = a[i] as number;
  return low + (hh - k) * (next - low);
}

function floorTriple(v: Float64Array, scratch: Float64Array): number[] {
  const n = v.length;
  scratch.set(v);
  const k50 = Math.floor((n - 1) * 0.5);
  const p50 = floorQuantile(scratch, 0.5, 0, n - 1);
  return [floorQuantile(scratch, 0.1, 0, k50), p50, floorQuantile(scratch, 0.9, k50, n - 1)];
}

function floorRanks(v: Float64Array, sorted: Float64Array, out: Float64Array): void {
  const n = v.length;
  sorted.set(v);
  sorted.sort();
  for (let i = 0; i < n; i++) {
    const x = v[i] as number;
    let lo = 0;
    let hi = n;
    while (lo < hi) {
      const m = (lo + hi) >>> 1;
      if ((sorted[m] as number) < x) lo = m + 1;
      else hi = m;
    }
    let up = lo + 1;
    if (up < n && (sorted[up] as number) === x) {
      hi = n;
      while (up < hi) {
        const m = (up + hi) >>> 1;
        if ((sorted[m] as number) <= x) up = m + 1;
        else hi = m;
      }
    }
    out[i] = (lo + up + 1) / 2;
  }
}

function floorCorrelation(x: Float64Array, y: Float64Array): number {
  const n = x.length;
  let mx = 0;
  let my = 0;
  for (let i = 0; i < n; i++) {
    mx += x[i] as number;
    my += y[i] as number;
  }
  mx /= n;
  my /= n;
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = (x[i] as number) - mx;
    const dy = (y[i] as number) - my;
    sxy += dx * dy;
    sxx += dx * dx;
    syy += dy * dy;
  }
  return sxy / Math.sqrt(sxx * syy);
}

function floor() {
  const n = REALISATIONS;
  const { columns, varying } = floorSample(n);
  const { finalM, t90, curve } = floorLoop(n, columns);
  const scratch = new Float64Array(n);
  const bands: number[][] = [];
  for (let ti = 0; ti < T; ti++) bands.push(floorTriple(curve.subarray(ti * n, (ti + 1) * n), scratch));
  const final = floorTriple(finalM, scratch);
  const t90q = floorTriple(t90, scratch);
  const rankFinal = new Float64Array(n);
  const rankT90 = new Float64Array(n);
  const rankIn = new Float64Array(n);
  floorRanks(finalM, scratch, rankFinal);
  floorRanks(t90, scratch, rankT90);
  const rhoFinal: number[] = [];
  const rhoT90: number[] = [];
  for (const v of varying) {
    floorRanks(v, scratch, rankIn);
    rhoFinal.push(floorCorrelation(rankIn, rankFinal));
    rhoT90.push(floorCorrelation(rankIn, rankT90));
  }
  return { final, t90q, bands, rhoFinal, rhoT90 };
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)] as number;
}

function time(fn: () => unknown): number {
  const t0 = performance.now();
  fn();
  return performance.now() - t0;
}

for (let i = 0; i < 3; i++) {
  engine();
  floor();
}
const engineTimes: number[] = [];
const floorTimes: number[] = [];
// Timed in separate blocks (floor first) so that neither pays for the other's garbage collection.
for (let i = 0; i < RUNS; i++) floorTimes.push(time(floor));
for (let i = 0; i < RUNS; i++) engineTimes.push(time(engine));
const e = engine();
const f = floor();
const near = (a: number, b: number) => Math.abs(a - b) <= 1e-12 * Math.max(Math.abs(a), Math.abs(b), 1e-300);
const byMagnitude = (xs: number[]) => [...xs].sort((a, b) => Math.abs(b) - Math.abs(a));
const same =
  [e.summary.finalM.p10, e.summary.finalM.p50, e.summary.finalM.p90].every((v, i) => near(v, f.final[i] as number)) &&
  [e.summary.t90Years.p10, e.summary.t90Years.p50, e.summary.t90Years.p90].every((v, i) => near(v, f.t90q[i] as number)) &&
  f.bands.every(
    (band, t) =>
      near(band[0] as number, e.summary.atTimes.p10M[t] as number) &&
      near(band[1] as number, e.summary.atTimes.p50M[t] as number) &&
      near(band[2] as number, e.summary.atTimes.p90M[t] as number),
  ) &&
  byMagnitude(f.rhoFinal).every((r, i) => near(r, e.summary.drivers.finalSettlement[i]?.rankCorrelation as number)) &&
  byMagnitude(f.rhoT90).every((r, i) => near(r, e.summary.drivers.t90[i]?.rankCorrelation as number));
const engineMs = median(engineTimes);
const floorMs = median(floorTimes);
const ratio = engineMs / floorMs;
const met = ratio <= 2 && engineMs < 150;
console.log(
  `profile: ${plan.subThicknessM.length} sublayers, ${TIME_POINTS} time points, ${REALISATIONS} realisations, ${e.run.varying.length} sampled inputs`,
);
console.log(`engine: ${engineMs.toFixed(1)} ms (median of ${RUNS})`);
console.log(`floor: ${floorMs.toFixed(1)} ms (median of ${RUNS})`);
console.log(`ratio: ${ratio.toFixed(2)}`);
console.log(
  `same figures from both (percentiles, bands, rank correlations): ${same ? 'yes' : 'no'} (final settlement P50 ${(1000 * e.summary.finalM.p50).toFixed(1)} mm, t90 P90 ${e.summary.t90Years.p90.toFixed(2)} years)`,
);
console.log(`target: ≤ 2× floor and < 150 ms — ${met ? 'met' : 'not met'}`);
