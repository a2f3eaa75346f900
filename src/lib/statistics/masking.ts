/**
 * Disclosure control for figures pooled across firms: persistent multiplicative noise on every
 * test's values ("noise infusion"), after Evans, Zayatz & Slanta (1998), "Using noise for disclosure
 * limitation of establishment tabular data", J. Official Statistics 14(4):537–551, the method of the
 * US Census Bureau's economic tables; properties in Nayak, Sinha & Zayatz (2011), J. Official
 * Statistics 27(3):527–544 (both from memory). Each value x of a test is replaced by x·F, where the
 * factor F = 1 ± m (linear parameters) or exp(±m) (cv, k) has a random sign and a magnitude m uniform
 * on a band [a, b] bounded away from 0: a third to two thirds of the parameter's typical spread within
 * a deposit (parameters.ts: Cc, Cα, σ'p 10–20 %, wn and LL 5–10 %, cv and k a factor of 1.22–1.49).
 * Sign and magnitude come from a hash of the record's secret key (as the record keys of the ABS
 * cell-key method, Thompson, Broadfoot & Elazar 2013) and the parameter, so a test keeps the same
 * factor in every selection, for ever.
 *
 * Why this and not noise drawn per published cell (the ABS cell key): every pooled figure, the
 * scatter points and the regression are computed from masked values only, so whatever an attacker
 * combines — two selections that differ by one test (n·mean differences, the sd, percentile shifts)
 * or thousands of them — the most that can be recovered about another firm's test is its masked value
 * x·F, at least a (a third of the deposit's usual spread) from the truth, with the sign unknown. Noise
 * drawn afresh per cell averages away when many pairs of selections are differenced; a persistent
 * factor does not. A zero stays zero.
 * The price is extra spread, which summary.ts and regression-masked.ts remove in expectation using
 * the known noise variance.
 */
import type { SelectionColumns } from './columns';
import { PARAMETERS, type ParameterDefinition, type ParameterKey } from './parameters';

/** lowbias32 integer hash (C. Wellons, "Hash function prospector", 2018; from memory). */
function mix32(input: number): number {
  let x = input >>> 0;
  x ^= x >>> 16;
  x = Math.imul(x, 0x7feb352d);
  x ^= x >>> 15;
  x = Math.imul(x, 0x846ca68b);
  x ^= x >>> 16;
  return x >>> 0;
}

/** The signed masking magnitude ±m of one record and parameter, m within the parameter's band. */
export function maskShift(recordKey: number, definition: ParameterDefinition): number {
  const h = mix32(mix32(recordKey) ^ Math.imul(definition.maskSalt, 0x9e3779b9));
  const unit = (h >>> 1) / 0x80000000;
  const { min, max } = definition.maskBand;
  const magnitude = min + (max - min) * unit;
  return h & 1 ? magnitude : -magnitude;
}

/** The factor F a value of this record and parameter is multiplied by. */
export function maskFactor(recordKey: number, definition: ParameterDefinition): number {
  const shift = maskShift(recordKey, definition);
  return definition.scale === 'log' ? Math.exp(shift) : 1 + shift;
}

const cache = new WeakMap<SelectionColumns, Map<ParameterKey, Float64Array>>();

/** Masked values of one parameter (NaN where missing), computed once per columns object. */
export function maskedValues(columns: SelectionColumns, key: ParameterKey): Float64Array | null {
  const raw = columns.values[key];
  if (!raw) return null;
  let perColumns = cache.get(columns);
  if (!perColumns) {
    perColumns = new Map();
    cache.set(columns, perColumns);
  }
  const hit = perColumns.get(key);
  if (hit) return hit;
  const definition = PARAMETERS[key];
  const masked = new Float64Array(columns.length);
  const keys = columns.recordKey;
  for (let i = 0; i < columns.length; i++) {
    const x = raw[i] as number;
    masked[i] = Number.isFinite(x) ? x * maskFactor(keys[i] as number, definition) : Number.NaN;
  }
  perColumns.set(key, masked);
  return masked;
}

export interface NoiseMoments {
  /** Var(F): the noise variance of a masked linear value x·F is x²·Var(F) (E F = 1 for linear masks). */
  factorVariance: number;
  /** E[ln F] and Var(ln F): the noise a mask adds to a natural logarithm. */
  lnMean: number;
  lnVariance: number;
}

const momentsCache = new Map<ParameterKey, NoiseMoments>();

/** Moments of the masking factor of a parameter, by midpoint quadrature over the band (both signs). */
export function noiseMoments(key: ParameterKey): NoiseMoments {
  const hit = momentsCache.get(key);
  if (hit) return hit;
  const definition = PARAMETERS[key];
  const { min, max } = definition.maskBand;
  const steps = 4096;
  let f1 = 0;
  let f2 = 0;
  let l1 = 0;
  let l2 = 0;
  for (let j = 0; j < steps; j++) {
    const m = min + ((max - min) * (j + 0.5)) / steps;
    for (const shift of [m, -m]) {
      const factor = definition.scale === 'log' ? Math.exp(shift) : 1 + shift;
      const ln = Math.log(factor);
      f1 += factor;
      f2 += factor * factor;
      l1 += ln;
      l2 += ln * ln;
    }
  }
  const count = 2 * steps;
  const moments = {
    factorVariance: f2 / count - (f1 / count) ** 2,
    lnMean: l1 / count,
    lnVariance: l2 / count - (l1 / count) ** 2,
  };
  momentsCache.set(key, moments);
  return moments;
}
