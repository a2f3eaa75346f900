/**
 * Seeded Monte Carlo over the parameter distributions. Per realisation: primary settlement of
 * every sublayer (UFC 3-220-10 Eqs. 5-12 to 5-14 or mv form, with the deterministic stresses),
 * secondary compression to the design life (Eq. 5-18), and the settlement–time curve.
 *
 * Time curves: each layer's deterministic vertical curve (series or solver) is shifted in log
 * time by the change of its drainage group's equivalent-layer time τ = (ΣH/√cv)²/(1 or 4)
 * (UFC 3-220-10 Eqs. 5-16, 5-17). That is exact for a single layer and an approximation for
 * layers with different cv; changes of the mv ratio between layers are not followed. Radial
 * drainage (Hansbo 1981, with each realisation's ch and kh) and ramp loading (Duhamel
 * superposition) are applied on top, as in the deterministic run.
 */
import type { DeterministicResult } from './deterministic';
import { drainGeometry, layerDrainFactor } from './drain-model';
import { GroupTables } from './group-tables';
import { buildPlan, type MonteCarloPlan } from './monte-carlo-plan';
import { type LayerColumns, type ParameterColumn, sampleColumns } from './monte-carlo-sampling';
import { settleLayer } from './monte-carlo-settle';
import { type LayerStepState, layerDegreeAt, rootOnLogTime } from './monte-carlo-time';
import { Xoshiro128 } from './random';

export interface MonteCarloRun {
  realisations: number;
  seed: number;
  timesYears: Float64Array;
  /** Ultimate primary settlement, m. */
  finalPrimaryM: Float64Array;
  /** Ultimate primary plus secondary settlement at the design life, m. */
  finalM: Float64Array;
  t90Years: Float64Array;
  /** Settlement (primary + secondary), m, at each time: index time·realisations + realisation. */
  settlementAtTimesM: Float64Array;
  varying: ParameterColumn[];
}

/**
 * Runs `realisations` (≥ 1) seeded realisations of the estimate and returns settlements (m) and
 * times (years) per realisation, plus the sampled input columns. The same seed always gives the
 * same result. `timesYears` (> 0) are the times for the settlement–time output.
 */
export function runMonteCarlo(
  det: DeterministicResult,
  timesYears: ArrayLike<number>,
  realisations: number,
  seed: number,
): MonteCarloRun {
  const plan = buildPlan(det, timesYears);
  const rng = new Xoshiro128(seed);
  const { layers: columns, varying } = sampleColumns(det.input, rng, realisations);
  const n = realisations;
  const L = plan.layers.length;
  const G = plan.groups.length;
  const T = plan.timesYears.length;
  const finalPrimaryM = new Float64Array(n);
  const finalM = new Float64Array(n);
  const t90Years = new Float64Array(n);
  const settlementAtTimesM = new Float64Array(T * n);
  const layerS = new Float64Array(L);
  const layerSec = new Float64Array(L);
  const lnLambda = new Float64Array(G);
  const lnTp = new Float64Array(G);
  const state: LayerStepState = {
    lnLambda,
    radialRate: new Float64Array(L),
    hasDrains: det.input.drains !== null,
    constructionYears: plan.constructionYears,
  };
  const geometry = drainGeometry(det.input);
  const fast = !state.hasDrains && !(plan.constructionYears > 0);
  const lnDesignLife = Math.log(plan.designLifeYears);
  const allLayers = plan.layers.map((_, li) => li);
  const layerGroup = Int32Array.from(plan.layers, (l) => l.group);
  const layerThickness = Float64Array.from(plan.layers, (l) => l.thicknessM);
  const groupDivisor = Float64Array.from(plan.groups, (g) => (g.bothDrained ? 4 : 1));
  const cvColumns = columns.map((c) => c.cv);
  const tables = new GroupTables(plan);

  for (let r = 0; r < n; r++) {
    let primary = 0;
    for (let li = 0; li < L; li++) {
      const s = settleLayer(plan, li, columns[li] as LayerColumns, r, layerSec);
      layerS[li] = s;
      primary += s;
    }
    lnLambda.fill(0);
    for (let li = 0; li < L; li++) {
      const g = layerGroup[li] as number;
      lnLambda[g] =
        (lnLambda[g] as number) + (layerThickness[li] as number) / Math.sqrt((cvColumns[li] as Float64Array)[r] as number);
    }
    for (let g = 0; g < G; g++) {
      const sum = lnLambda[g] as number;
      lnLambda[g] =
        (plan.groups[g] as MonteCarloPlan['groups'][number]).lnTauYears - Math.log((sum * sum) / (groupDivisor[g] as number));
    }
    if (geometry) {
      for (let li = 0; li < L; li++) {
        const layer = plan.layers[li] as MonteCarloPlan['layers'][number];
        const ch = (columns[li] as LayerColumns).ch[r] as number;
        const settled = layerS[li] as number;
        const mv = settled > 0 && layer.stressAreaKpaM > 0 ? settled / layer.stressAreaKpaM : layer.mvPerKpa;
        const mu = layerDrainFactor(det.input, geometry, ch, mv);
        state.radialRate[li] = (8 * ch) / (geometry.influenceDiameterM * geometry.influenceDiameterM * mu);
      }
    }
    for (let g = 0; g < G; g++) {
      const group = plan.groups[g] as MonteCarloPlan['groups'][number];
      lnTp[g] = fast
        ? tables.root(g, layerS, plan.endOfPrimaryDegree, lnLambda[g] as number)
        : rootOnLogTime(
            plan,
            state,
            group.layers,
            layerS,
            plan.endOfPrimaryDegree,
            group.lnEndOfPrimary - (lnLambda[g] as number),
          );
    }
    t90Years[r] = Math.exp(
      fast && G === 1
        ? tables.root(0, layerS, 0.9, lnLambda[0] as number)
        : rootOnLogTime(plan, state, allLayers, layerS, 0.9, plan.lnT90Deterministic - meanShift(lnLambda)),
    );
    let secondaryDesign = 0;
    for (let li = 0; li < L; li++) {
      const over = lnDesignLife - (lnTp[layerGroup[li] as number] as number);
      if (over > 0) secondaryDesign += (layerSec[li] as number) * over * Math.LOG10E;
    }
    finalPrimaryM[r] = primary;
    finalM[r] = primary + secondaryDesign;

    for (let ti = 0; ti < T; ti++) {
      const lnT = plan.lnTimes[ti] as number;
      let total = 0;
      if (fast) {
        for (let g = 0; g < G; g++) {
          const shift = lnLambda[g] as number;
          total += tables.groupSettlement(g, lnT + shift, layerS, layerSec, lnT - (lnTp[g] as number));
        }
      } else {
        for (let li = 0; li < L; li++) {
          const g = layerGroup[li] as number;
          const over = lnT - (lnTp[g] as number);
          total += (layerS[li] as number) * layerDegreeAt(plan, state, li, plan.timesYears[ti] as number);
          if (over > 0) total += (layerSec[li] as number) * over * Math.LOG10E;
        }
      }
      settlementAtTimesM[ti * n + r] = total;
    }
  }
  return { realisations: n, seed, timesYears: plan.timesYears, finalPrimaryM, finalM, t90Years, settlementAtTimesM, varying };
}

function meanShift(lnLambda: Float64Array): number {
  let sum = 0;
  for (let g = 0; g < lnLambda.length; g++) sum += lnLambda[g] as number;
  return sum / lnLambda.length;
}
