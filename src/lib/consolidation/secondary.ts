/**
 * Secondary compression after the end of primary consolidation.
 */

/** Published Cα/Cc groups. */
export type CAlphaOverCcGroup = 'inorganic-clay-silt' | 'organic-clay-silt' | 'peat';

/**
 * Cα/Cc central value and range (± half-width) by soil group: inorganic clays and silts
 * 0.04 ± 0.01, organic clays and silts 0.05 ± 0.01, peat 0.06 ± 0.01. Source: Mesri & Godlewski
 * (1977); UFC 3-220-10 Table 5-6 (central values); Terzaghi, Peck & Mesri (1996) for the ±0.01
 * (from memory).
 */
export const C_ALPHA_OVER_CC: Readonly<Record<CAlphaOverCcGroup, { central: number; halfRange: number }>> = {
  'inorganic-clay-silt': { central: 0.04, halfRange: 0.01 },
  'organic-clay-silt': { central: 0.05, halfRange: 0.01 },
  peat: { central: 0.06, halfRange: 0.01 },
};

/**
 * Secondary compression strain ε = Cα/(1+e0)·log10(t/tp) for t > tp (0 otherwise); t and tp in
 * any one time unit (tp > 0), Cα ≥ 0, e0 > 0. Uses the initial void ratio e0 as UFC 3-220-10
 * Eq. 5-18 writes it (Cεα = Cα/(1+e0)); using e at the end of primary instead would raise the
 * result by at most the primary strain fraction, a few per cent. Multiply by the initial
 * (sub)layer thickness H0 for settlement. Source: UFC 3-220-10 Eq. 5-18.
 */
export function secondaryStrain(cAlpha: number, e0: number, timeYears: number, endOfPrimaryYears: number): number {
  if (!(timeYears > endOfPrimaryYears) || !(endOfPrimaryYears > 0)) return 0;
  return (cAlpha / (1 + e0)) * Math.log10(timeYears / endOfPrimaryYears);
}

/**
 * Cα from Cα/Cc: the compression index to use is the slope of the e–log σ' curve at the final
 * stress — Cr when the final stress stays below σ'p, Cc otherwise (Mesri & Castro 1987, "Cα/Cc
 * concept and K0 during secondary compression", J. Geotech. Eng. 113(3) — from memory).
 */
export function cAlphaFromRatio(ratio: number, cc: number, cr: number, finalBelowPreconsolidation: boolean): number {
  return ratio * (finalBelowPreconsolidation ? cr : cc);
}
