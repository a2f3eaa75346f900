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

// ---- floor ----

/** Normal (mean, sd) or log-normal (μ, σ of ln) as the floor samples them. */
type FloorDist = { log: boolean; a: number; b: number } | null;

function floorDist(spec: unknown): FloorDist {
  if (typeof spec !== 'object' || spec === null) return null;
  const d = spec as { type: string; mean: number; sd: number };
  if (d.type === 'normal') return { log: false, a: d.mean, b: d.sd };
  const s2 = Math.log(1 + (d.sd * d.sd) / (d.mean * d.mean));
  return { log: true, a: Math.log(d.mean) - s2 / 2, b: Math.sqrt(s2) };
}

const plan = buildPlan(det, times);
const floorLayers = det.input.layers.map((layer) => {
  const c = layer.compression as { cc: unknown; cr: unknown; e0: unknown };
  const pre = layer.preconsolidation as { ocr: unknown };
  const sec = layer.secondary as { cAlpha: unknown };
  return {
    cc: floorDist(c.cc),
    e0: floorDist(c.e0),
    cr: floorDist(c.cr),
    ocr: floorDist(pre.ocr),
    cv: floorDist(layer.cvM2PerYear),
    ca: floorDist(sec.cAlpha),
    rho: layer.ccE0Correlation,
  };
});

function floor() {
  const n = REALISATIONS;
  // xoshiro128** seeded as the engine seeds it, inlined.
  let st = SEED >>> 0;
  const mix = () => {
    st = (st + 0x9e3779b9) | 0;
    let z = st;
    z = Math.imul(z ^ (z >>> 16), 0x21f0aaad);
    z = Math.imul(z ^ (z >>> 15), 0x735a2d97);
    return (z ^ (z >>> 15)) >>> 0;
  };
  const state = new Int32Array([mix(), mix(), mix(), mix()]);
  const inputs: Float64Array[] = [];
  const column = (d: FloorDist, corr: Float64Array | null, rho: number) => {
    const v = new Float64Array(n);
    const z = new Float64Array(n);
    if (!d) return { v, z };
    let s0 = state[0] as number;
    let s1 = state[1] as number;
    let s2 = state[2] as number;
    let s3 = state[3] as number;
    let u1 = 0;
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
    if (corr && rho !== 0) {
      const b = Math.sqrt(1 - rho * rho);
      for (let i = 0; i < n; i++) z[i] = rho * (corr[i] as number) + b * (z[i] as number);
    }
    for (let i = 0; i < n; i++) v[i] = d.log ? Math.exp(d.a + d.b * (z[i] as number)) : d.a + d.b * (z[i] as number);
    inputs.push(v);
    return { v, z };
  };
  const cols = floorLayers.map((f) => {
    const cc = column(f.cc, null, 0);
    const e0 = column(f.e0, cc.z, f.rho);
    const cr = column(f.cr, null, 0);
    const ocr = column(f.ocr, null, 0);
    const cv = column(f.cv, null, 0);
    const ca = column(f.ca, null, 0);
    return { cc: cc.v, e0: e0.v, cr: cr.v, ocr: ocr.v, cv: cv.v, ca: ca.v };
  });
  const L = plan.layers.length;
  const T = plan.lnTimes.length;
  const group = plan.groups[0] as (typeof plan.groups)[number];
  const table0 = (plan.layers[0] as (typeof plan.layers)[number]).table;
  const tables = plan.layers.map((l) => l.table.values);
  const thick = plan.layers.map((l) => l.thicknessM);
  const count = table0.values.length;
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
  const root = (target: number, lnLam: number) => {
    let w = 0;
    for (let li = 0; li < L; li++) w += ls[li] as number;
    const at = (k: number) => {
      let s = 0;
      for (let li = 0; li < L; li++) s += ((ls[li] as number) / w) * ((tables[li] as Float64Array)[k] as number);
      return s;
    };
    const w0 = at(0);
    if (w0 >= target) return table0.lnStart + 2 * Math.log(target / w0) - lnLam;
    let lo = 0;
    let hi = count - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >>> 1;
      if (at(mid) >= target) hi = mid;
      else lo = mid;
    }
    const a = at(lo);
    return table0.lnStart + (lo + (target - a) / (at(hi) - a)) * table0.lnStep - lnLam;
  };
  for (let r = 0; r < n; r++) {
    let primary = 0;
    let sumH = 0;
    for (let li = 0; li < L; li++) {
      const c = cols[li] as (typeof cols)[number];
      const layer = plan.layers[li] as (typeof plan.layers)[number];
      const inv = 1 / (1 + (c.e0[r] as number));
      const A = (c.cc[r] as number) * inv;
      const B = (c.cr[r] as number) * inv;
      const add = Math.log10(c.ocr[r] as number);
      const secc = (c.ca[r] as number) * inv;
      let s = 0;
      let sec = 0;
      for (let j = layer.subStart; j < layer.subEnd; j++) {
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
      sumH += (thick[li] as number) / Math.sqrt(c.cv[r] as number);
    }
    const lnLam = group.lnTauYears - Math.log((sumH * sumH) / 4);
    const lnTp = root(plan.endOfPrimaryDegree, lnLam);
    t90[r] = Math.exp(root(0.9, lnLam));
    let secLife = 0;
    if (lnLife > lnTp) for (let li = 0; li < L; li++) secLife += (lsec[li] as number) * (lnLife - lnTp) * Math.LOG10E;
    finalM[r] = primary + secLife;
    for (let ti = 0; ti < T; ti++) {
      const lnT = plan.lnTimes[ti] as number;
      const x = (lnT + lnLam - table0.lnStart) / table0.lnStep;
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
        const over = lnT - lnTp;
        total += (ls[li] as number) * u + (over > 0 ? (lsec[li] as number) * over * Math.LOG10E : 0);
      }
      curve[ti * n + r] = total;
    }
  }
  // Percentiles (type 7 by quickselect) and Spearman ranks, as the engine computes them.
  const scratch = new Float64Array(n);
  const select = (a: Float64Array, k: number, from: number, to: number) => {
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
  };
  const q = (a: Float64Array, p: number, from: number, to: number) => {
    const hh = (n - 1) * p;
    const k = Math.floor(hh);
    select(a, k, from, to);
    const low = a[k] as number;
    if (hh === k) return low;
    let next = Number.POSITIVE_INFINITY;
    for (let i = k + 1; i <= to; i++) if ((a[i] as number) < next) next = a[i] as number;
    return low + (hh - k) * (next - low);
  };
  const q3 = (v: Float64Array) => {
    scratch.set(v);
    const k50 = Math.floor((n - 1) * 0.5);
    const p50 = q(scratch, 0.5, 0, n - 1);
    return [q(scratch, 0.1, 0, k50), p50, q(scratch, 0.9, k50, n - 1)];
  };
  const bands = [];
  for (let ti = 0; ti < T; ti++) bands.push(q3(curve.subarray(ti * n, (ti + 1) * n)));
  const final = q3(finalM);
  const t90q = q3(t90);
  const sorted = new Float64Array(n);
  const ranks = (v: Float64Array, out: Float64Array) => {
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
  };
  const corr = (x: Float64Array, y: Float64Array) => {
    const mean = (n + 1) / 2;
    let sxy = 0;
    let sxx = 0;
    let syy = 0;
    for (let i = 0; i < n; i++) {
      const dx = (x[i] as number) - mean;
      const dy = (y[i] as number) - mean;
      sxy += dx * dy;
      sxx += dx * dx;
      syy += dy * dy;
    }
    return sxy / Math.sqrt(sxx * syy);
  };
  const rankIn = new Float64Array(n);
  const rankFinal = new Float64Array(n);
  const rankT90 = new Float64Array(n);
  ranks(finalM, rankFinal);
  ranks(t90, rankT90);
  const rhoFinal: number[] = [];
  const rhoT90: number[] = [];
  for (const v of inputs) {
    ranks(v, rankIn);
    rhoFinal.push(corr(rankIn, rankFinal));
    rhoT90.push(corr(rankIn, rankT90));
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
for (let i = 0; i < RUNS; i++) {
  engineTimes.push(time(engine));
  floorTimes.push(time(floor));
}
const e = engine();
const f = floor();
const same =
  Math.abs((e.summary.finalM.p50 - (f.final[1] as number)) / e.summary.finalM.p50) < 1e-12 &&
  Math.abs((e.summary.t90Years.p90 - (f.t90q[2] as number)) / e.summary.t90Years.p90) < 1e-12;
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
  `same figures from both: ${same ? 'yes' : 'no'} (final settlement P50 ${(1000 * e.summary.finalM.p50).toFixed(1)} mm, t90 P90 ${e.summary.t90Years.p90.toFixed(2)} years)`,
);
console.log(`target: ≤ 2× floor and < 150 ms — ${met ? 'met' : 'not met'}`);
