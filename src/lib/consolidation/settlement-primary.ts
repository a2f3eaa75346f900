/**
 * One-dimensional primary consolidation strain of a sublayer from its mid-point stresses.
 * Strains are dimensionless (m/m); settlement = strain × sublayer thickness (UFC 3-220-10 Eq. 5-4).
 */

export type StressState = 'normally consolidated' | 'overconsolidated' | 'crossing preconsolidation' | 'mv (linear)';

export interface IndexStrain {
  strain: number;
  state: StressState;
}

/**
 * Primary strain from compression indices for initial effective stress σ'v0 > 0, increase
 * Δσ ≥ 0 and preconsolidation pressure σ'p > 0 (kPa); Cc > 0, Cr ≥ 0, e0 > 0.
 * - σ'p ≤ σ'v0 (NC; σ'p < σ'v0 is treated as NC from σ'v0): Cc/(1+e0)·log10(σ'f/σ'v0) — UFC Eq. 5-12.
 * - σ'f ≤ σ'p (OC throughout): Cr/(1+e0)·log10(σ'f/σ'v0) — UFC Eq. 5-13.
 * - σ'v0 < σ'p < σ'f: [Cr·log10(σ'p/σ'v0) + Cc·log10(σ'f/σ'p)]/(1+e0) — UFC Eq. 5-14.
 * σ'f = σ'v0 + Δσ. Source: UFC 3-220-10 Eqs. 5-10 to 5-14.
 */
export function indexStrain(
  cc: number,
  cr: number,
  e0: number,
  sigmaV0Kpa: number,
  deltaSigmaKpa: number,
  sigmaPKpa: number,
): IndexStrain {
  const sigmaFinalKpa = sigmaV0Kpa + deltaSigmaKpa;
  const onePlusE0 = 1 + e0;
  if (sigmaPKpa <= sigmaV0Kpa) {
    return { strain: (cc / onePlusE0) * Math.log10(sigmaFinalKpa / sigmaV0Kpa), state: 'normally consolidated' };
  }
  if (sigmaFinalKpa <= sigmaPKpa) {
    return { strain: (cr / onePlusE0) * Math.log10(sigmaFinalKpa / sigmaV0Kpa), state: 'overconsolidated' };
  }
  return {
    strain: (cr * Math.log10(sigmaPKpa / sigmaV0Kpa) + cc * Math.log10(sigmaFinalKpa / sigmaPKpa)) / onePlusE0,
    state: 'crossing preconsolidation',
  };
}

/**
 * Primary strain from the coefficient of volume compressibility: ε = mv·Δσ', mv in 1/kPa (> 0),
 * Δσ ≥ 0 in kPa. mv = av/(1+e0) = Δε/Δσ' for the stress range of the load (from memory; the
 * textbook definition, e.g. Terzaghi, Peck & Mesri 1996).
 */
export function mvStrain(mvPerKpa: number, deltaSigmaKpa: number): number {
  return mvPerKpa * deltaSigmaKpa;
}

/** Primary settlement (m) of a layer of thickness H (m) from strain: s = ε·H (UFC 3-220-10 Eq. 5-4). */
export function settlementFromStrainM(strain: number, thicknessM: number): number {
  return strain * thicknessM;
}
