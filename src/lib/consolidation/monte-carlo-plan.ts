/**
 * Everything a Monte Carlo run can compute once from the deterministic estimate: sublayer
 * geometry and log-stresses, each layer's vertical-degree table, drainage groups and times, in
 * flat typed arrays for the realisation loop.
 */
import { type DeficitTable, deficitTable } from './deficit-table';
import type { DegreeTable } from './degree-table';
import type { DeterministicResult } from './deterministic';
import { END_OF_PRIMARY_DEGREE } from './deterministic';

export interface PlanLayer {
  layerIndex: number;
  name: string;
  usesMv: boolean;
  /** True when σ'p or OCR is one value per layer (sampled); false for a profile or mv. */
  scalarPreconsolidation: boolean;
  secondaryIsRatio: boolean;
  subStart: number;
  subEnd: number;
  thicknessM: number;
  /** ∫Δσ dz over the layer, kPa·m. */
  stressAreaKpaM: number;
  group: number;
  table: DegreeTable;
  /** Running integral of 1 − U for ramp loading without drains (null otherwise). */
  deficit: DeficitTable | null;
  /** Deterministic secant mv, 1/kPa (fallback when a realisation settles nothing). */
  mvPerKpa: number;
}

export interface PlanGroup {
  layers: number[];
  bothDrained: boolean;
  lnTauYears: number;
  lnTableStart: number;
  lnTableEnd: number;
  /** ln of the deterministic end of primary consolidation (a starting guess for each realisation). */
  lnEndOfPrimary: number;
}

export interface MonteCarloPlan {
  layers: PlanLayer[];
  groups: PlanGroup[];
  subThicknessM: Float64Array;
  subLog10SigmaV0: Float64Array;
  subLog10SigmaFinal: Float64Array;
  /** log10 σ'p minus the layer's sampled log10(σ'p or OCR): see `buildPlan`. */
  subLog10PreBase: Float64Array;
  timesYears: Float64Array;
  lnTimes: Float64Array;
  designLifeYears: number;
  constructionYears: number;
  /** ln(t − tc) for each time (−Infinity while t ≤ tc). */
  lnTimesAfterConstruction: Float64Array;
  lnT90Deterministic: number;
  endOfPrimaryDegree: number;
}

/**
 * Builds the plan. The sublayer's log10 σ'p is `subLog10PreBase + log10(sample)` where the sample
 * is the layer's σ'p (base 0) or OCR (base log10 σ'v0), or 0 for a profile (base log10 σ'p(z)).
 */
export function buildPlan(det: DeterministicResult, timesYears: ArrayLike<number>): MonteCarloPlan {
  const { input, sublayers, time } = det;
  const subCount = sublayers.length;
  const plan: MonteCarloPlan = {
    layers: [],
    groups: time.vertical.groups.map((g, gi) => ({
      layers: [],
      bothDrained: g.top === 'pervious' && g.bottom === 'pervious',
      lnTauYears: Math.log(g.tauYears),
      lnTableStart: Math.log(g.tableStartYears),
      lnTableEnd: Math.log(g.tableEndYears),
      lnEndOfPrimary: Math.log(det.endOfPrimaryYears[gi] as number),
    })),
    subThicknessM: new Float64Array(subCount),
    subLog10SigmaV0: new Float64Array(subCount),
    subLog10SigmaFinal: new Float64Array(subCount),
    subLog10PreBase: new Float64Array(subCount),
    timesYears: Float64Array.from(timesYears),
    lnTimes: Float64Array.from(timesYears, (t) => Math.log(t)),
    designLifeYears: input.designLifeYears,
    constructionYears: input.constructionTimeYears ?? 0,
    lnTimesAfterConstruction: Float64Array.from(timesYears, (t) => Math.log(Math.max(0, t - (input.constructionTimeYears ?? 0)))),
    lnT90Deterministic: Math.log(det.t90Years),
    endOfPrimaryDegree: END_OF_PRIMARY_DEGREE,
  };
  sublayers.forEach((s, j) => {
    plan.subThicknessM[j] = s.thicknessM;
    plan.subLog10SigmaV0[j] = Math.log10(s.sigmaV0Kpa);
    plan.subLog10SigmaFinal[j] = Math.log10(s.sigmaV0Kpa + s.deltaSigmaKpa);
  });
  input.layers.forEach((layer, i) => {
    if (!layer.compressible) return;
    const group = time.vertical.groupOfLayer[i] as number;
    const subStart = sublayers.findIndex((s) => s.layerIndex === i);
    let subEnd = subStart;
    let stressAreaKpaM = 0;
    while (subEnd < subCount && sublayers[subEnd]?.layerIndex === i) {
      stressAreaKpaM += (sublayers[subEnd]?.deltaSigmaKpa ?? 0) * (sublayers[subEnd]?.thicknessM ?? 0);
      subEnd++;
    }
    const pre = layer.preconsolidation;
    const preSpec = pre.kind === 'sigmaP' ? pre.sigmaPKpa : pre.kind === 'ocr' ? pre.ocr : null;
    const isProfile = typeof preSpec === 'object' && preSpec !== null && preSpec.type === 'linear';
    for (let j = subStart; j < subEnd; j++) {
      const s = sublayers[j];
      if (!s) continue;
      if (isProfile) plan.subLog10PreBase[j] = Math.log10(s.sigmaPKpa);
      else if (pre.kind === 'ocr') plan.subLog10PreBase[j] = Math.log10(s.sigmaV0Kpa);
    }
    const table = time.vertical.stepTables[i];
    if (!table) throw new Error(`No degree table for layer ${i}.`);
    plan.groups[group]?.layers.push(plan.layers.length);
    plan.layers.push({
      layerIndex: i,
      name: layer.name,
      usesMv: layer.compression?.kind === 'mv',
      scalarPreconsolidation: preSpec !== null && !isProfile,
      secondaryIsRatio: layer.secondary.kind === 'cAlphaOverCc',
      subStart: Math.max(subStart, 0),
      subEnd: Math.max(subEnd, 0),
      thicknessM: layer.thicknessM,
      stressAreaKpaM,
      group,
      table,
      deficit: input.constructionTimeYears && !input.drains ? deficitTable(table) : null,
      mvPerKpa: time.vertical.layerMvPerKpa[i] as number,
    });
  });
  return plan;
}
