/**
 * Turns the SI deterministic and Monte Carlo results into the parts of `EstimatePreviewResult`,
 * converting each figure to the request's units (depth m/ft, stress kPa/psf, settlement mm/in).
 */
import type { DeterministicResult } from './deterministic';
import type { MonteCarloSummary } from './monte-carlo-summary';
import type { EstimatePreviewResult, PreviewRanges, RangeTriple } from './preview-result';
import type { UnitFactors } from './units';

export interface OutputUnits {
  depth: (m: number) => number;
  stress: (kpa: number) => number;
  settle: (m: number) => number;
}

export function outputUnits(factors: UnitFactors): OutputUnits {
  return {
    depth: (m) => m / factors.length,
    stress: (kpa) => kpa / factors.stress,
    settle: (m) => m / factors.settlementM,
  };
}

/** Settlement totals and per-layer figures; secondary compression to the design life. */
export function settlementOutput(det: DeterministicResult, out: OutputUnits): EstimatePreviewResult['settlement'] {
  const { input } = det;
  let layerTop = 0;
  const layers = input.layers.map((layer, i) => {
    const top = layerTop;
    layerTop += layer.thicknessM;
    const primaryM = det.time.layerPrimaryM[i] as number;
    const secondaryM = layer.compressible ? det.layerSecondaryAt(i, input.designLifeYears) : 0;
    const group = det.time.vertical.groupOfLayer[i] as number;
    return {
      name: layer.name,
      top: out.depth(top),
      bottom: out.depth(layerTop),
      compressible: layer.compressible,
      primary: out.settle(primaryM),
      secondary: out.settle(secondaryM),
      total: out.settle(primaryM + secondaryM),
      sublayerCount: det.sublayering.countsPerLayer[i] ?? 0,
      endOfPrimaryYears: group >= 0 ? (det.endOfPrimaryYears[group] as number) : null,
    };
  });
  const secondaryM = det.settlementAt(input.designLifeYears).secondaryM;
  return {
    primary: out.settle(det.primaryM),
    secondary: out.settle(secondaryM),
    total: out.settle(det.primaryM + secondaryM),
    designLifeYears: input.designLifeYears,
    layers,
  };
}

/** Stresses, state and settlement at every sublayer mid-point. */
export function sublayerOutput(det: DeterministicResult, out: OutputUnits): EstimatePreviewResult['sublayers'] {
  const life = det.input.designLifeYears;
  return det.sublayers.map((s) => {
    const tp = det.endOfPrimaryYears[det.time.vertical.groupOfLayer[s.layerIndex] as number] as number;
    const secondaryM = life > tp ? s.secondaryPerCycleM * Math.log10(life / tp) : 0;
    return {
      layer: det.input.layers[s.layerIndex]?.name ?? '',
      top: out.depth(s.topM),
      bottom: out.depth(s.bottomM),
      mid: out.depth(s.midM),
      sigmaV0: out.stress(s.sigmaV0Kpa),
      deltaSigma: out.stress(s.deltaSigmaKpa),
      sigmaP: Number.isNaN(s.sigmaPKpa) ? null : out.stress(s.sigmaPKpa),
      sigmaFinal: out.stress(s.sigmaFinalKpa),
      state: s.state,
      strain: s.strain,
      primary: out.settle(s.primaryM),
      secondary: out.settle(secondaryM),
    };
  });
}

/** Degree and settlement at the given times (years). */
export function settlementAtTimes(det: DeterministicResult, timesYears: readonly number[], out: OutputUnits) {
  const compressible = det.input.layers.flatMap((l, i) => (l.compressible ? [i] : []));
  return timesYears.map((t) => {
    const s = det.settlementAt(t);
    return {
      timeYears: t,
      degree: det.time.degreeOf(compressible, t),
      primary: out.settle(s.primaryM),
      secondary: out.settle(s.secondaryM),
      total: out.settle(s.primaryM + s.secondaryM),
    };
  });
}

/** The ranges block; the run's times are the curve times followed by the requested time points. */
export function rangesOutput(
  ranges: MonteCarloSummary,
  curveTimes: readonly number[],
  userTimes: readonly number[],
  out: OutputUnits,
): PreviewRanges {
  const triple = (q: RangeTriple): RangeTriple => ({ p10: out.settle(q.p10), p50: out.settle(q.p50), p90: out.settle(q.p90) });
  const n = curveTimes.length;
  const at = (list: number[], k: number) => out.settle(list[k] ?? Number.NaN);
  return {
    method: `Monte Carlo, ${ranges.realisations} realisations, seed ${ranges.seed}`,
    realisations: ranges.realisations,
    seed: ranges.seed,
    finalPrimary: triple(ranges.finalPrimaryM),
    finalSettlement: triple(ranges.finalM),
    t90Years: ranges.t90Years,
    curve: {
      timeYears: [...curveTimes],
      p10: ranges.atTimes.p10M.slice(0, n).map(out.settle),
      p50: ranges.atTimes.p50M.slice(0, n).map(out.settle),
      p90: ranges.atTimes.p90M.slice(0, n).map(out.settle),
    },
    atTimes: userTimes.map((t, k) => ({
      timeYears: t,
      p10: at(ranges.atTimes.p10M, n + k),
      p50: at(ranges.atTimes.p50M, n + k),
      p90: at(ranges.atTimes.p90M, n + k),
    })),
    drivers: ranges.drivers,
    sampled: ranges.sampled.map(({ layer, parameter, distribution }) => ({ layer, parameter, distribution })),
  };
}
