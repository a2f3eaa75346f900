/**
 * Primary and secondary settlement of one layer in one Monte Carlo realisation, from the plan's
 * precomputed log-stresses: the same UFC 3-220-10 Eqs. 5-12 to 5-14 (and 5-18 coefficients) as
 * profile-settlement.ts, written on log10 stresses so that a sublayer costs no logarithm.
 */

import type { MonteCarloPlan } from './monte-carlo-plan';
import type { LayerColumns } from './monte-carlo-sampling';

/**
 * Primary settlement (m) of plan layer li in realisation r; writes the layer's secondary
 * settlement per log10 cycle (m) to secondaryOut[li].
 */
export function settleLayer(plan: MonteCarloPlan, li: number, col: LayerColumns, r: number, secondaryOut: Float64Array): number {
  const layer = plan.layers[li] as MonteCarloPlan['layers'][number];
  const e0 = col.e0[r] as number;
  const inv = 1 / (1 + e0);
  const secondary = col.secondary[r] as number;
  if (layer.usesMv) {
    secondaryOut[li] = secondary > 0 ? secondary * inv * layer.thicknessM : 0;
    return (col.mv[r] as number) * layer.stressAreaKpaM;
  }
  const cc = col.cc[r] as number;
  // Cr is refused at or above Cc for the medians; a realisation drawn from overlapping ranges is capped at its Cc.
  const cr = Math.min(col.cr[r] as number, cc);
  const a = cc * inv;
  const b = cr * inv;
  const add = layer.scalarPreconsolidation ? Math.log10(col.preconsolidation[r] as number) : 0;
  const secNc = layer.secondaryIsRatio ? secondary * a : secondary * inv;
  const secOc = layer.secondaryIsRatio ? secondary * b : secondary * inv;
  const h = plan.subThicknessM;
  const lv0 = plan.subLog10SigmaV0;
  const lf = plan.subLog10SigmaFinal;
  const base = plan.subLog10PreBase;
  let s = 0;
  let sec = 0;
  for (let j = layer.subStart; j < layer.subEnd; j++) {
    const v0 = lv0[j] as number;
    const f = lf[j] as number;
    const p = (base[j] as number) + add;
    const hj = h[j] as number;
    if (p <= v0) {
      s += a * (f - v0) * hj;
      sec += secNc * hj;
    } else if (f <= p) {
      s += b * (f - v0) * hj;
      sec += secOc * hj;
    } else {
      s += (b * (p - v0) + a * (f - p)) * hj;
      sec += secNc * hj;
    }
  }
  secondaryOut[li] = sec;
  return s;
}
