/**
 * P10/P50/P90 and ranked drivers of a Monte Carlo run.
 */
import { describeDistribution, massBelowZero } from './distributions';
import type { MonteCarloRun } from './monte-carlo';
import { type Quantiles, tenFiftyNinety } from './percentiles';
import { DRIVER_METHOD, type Driver, rankDrivers } from './sensitivity';

export interface SampledParameterSummary {
  layer: string;
  parameter: string;
  distribution: string;
  /** Probability mass below 0 removed by truncation (normal and split normal only). */
  truncatedMass: number;
}

export interface MonteCarloSummary {
  realisations: number;
  seed: number;
  finalPrimaryM: Quantiles;
  finalM: Quantiles;
  t90Years: Quantiles;
  atTimes: { timesYears: number[]; p10M: number[]; p50M: number[]; p90M: number[] };
  drivers: { method: string; finalSettlement: Driver[]; t90: Driver[] };
  sampled: SampledParameterSummary[];
}

/** Summarises a run; `layerName(i)` labels layer i (−1: the whole profile, for the drains). */
export function summariseMonteCarlo(run: MonteCarloRun, layerName: (layerIndex: number) => string): MonteCarloSummary {
  const n = run.realisations;
  const scratch = new Float64Array(n);
  const atTimes: MonteCarloSummary['atTimes'] = { timesYears: Array.from(run.timesYears), p10M: [], p50M: [], p90M: [] };
  for (let t = 0; t < run.timesYears.length; t++) {
    const q = tenFiftyNinety(run.settlementAtTimesM.subarray(t * n, (t + 1) * n), scratch);
    atTimes.p10M.push(q.p10);
    atTimes.p50M.push(q.p50);
    atTimes.p90M.push(q.p90);
  }
  const inputs = run.varying.map((v) => ({ layer: layerName(v.layerIndex), parameter: v.parameter, values: v.values }));
  const [finalSettlement = [], t90 = []] = inputs.length ? rankDrivers(inputs, [run.finalM, run.t90Years]) : [];
  return {
    realisations: n,
    seed: run.seed,
    finalPrimaryM: tenFiftyNinety(run.finalPrimaryM, scratch),
    finalM: tenFiftyNinety(run.finalM, scratch),
    t90Years: tenFiftyNinety(run.t90Years, scratch),
    atTimes,
    drivers: {
      method: DRIVER_METHOD,
      finalSettlement,
      t90,
    },
    sampled: run.varying.map((v) => ({
      layer: layerName(v.layerIndex),
      parameter: v.parameter,
      distribution: describeDistribution(v.distribution),
      truncatedMass: massBelowZero(v.distribution),
    })),
  };
}
