/**
 * `previewEstimate`: the one call behind `POST /api/estimates/preview`. Takes the parsed request
 * (see `src/lib/schemas/estimate-preview.ts`), converts it to SI, runs the deterministic estimate
 * with every distribution at its median, runs the seeded Monte Carlo when any parameter has a
 * spread, and returns everything in the request's unit system with the methods used, warnings
 * and standing cautions. Pure and synchronous; throws `EngineInputError` for inputs that pass the
 * schema but are physically impossible (input-checks.ts), with every offending field.
 */
import type { EstimatePreviewInput } from '../schemas/estimate-preview';
import { STANDING_CAUTIONS } from './cautions';
import { type DeterministicResult, runDeterministic } from './deterministic';
import { EngineInputError } from './errors';
import { impossibleInputIssues, impossibleResultIssues } from './input-checks';
import { toEngineInput } from './input-conversion';
import { methodsUsed } from './methods';
import { runMonteCarlo } from './monte-carlo';
import { hasAnySpread } from './monte-carlo-sampling';
import { type MonteCarloSummary, summariseMonteCarlo } from './monte-carlo-summary';
import { outputUnits, rangesOutput, settlementAtTimes, settlementOutput, sublayerOutput } from './preview-output';
import type { EstimatePreviewResult } from './preview-result';
import { timeToReach } from './time-model';
import { unitFactors } from './units';
import { collectWarnings } from './warnings';

/** Number of points on the reported settlement–time curve. */
export const CURVE_POINTS = 50;

/** Log-spaced curve times from U ≈ 2 % to the later of U = 99 %, the design life and the last time point. */
export function curveTimesYears(det: DeterministicResult): number[] {
  const compressible = det.input.layers.flatMap((l, i) => (l.compressible ? [i] : []));
  const overall = (t: number) => det.time.degreeOf(compressible, t);
  const hint = Math.max(...det.time.vertical.groups.map((g) => g.tauYears));
  const end = Math.max(timeToReach(overall, 0.99, hint), det.input.designLifeYears, ...det.input.timePointsYears);
  const start = Math.min(timeToReach(overall, 0.02, hint), end / 1000);
  const times: number[] = [];
  for (let i = 0; i < CURVE_POINTS; i++) times.push(start * (end / start) ** (i / (CURVE_POINTS - 1)));
  return times;
}

/**
 * The preview behind `POST /api/estimates/preview`: takes the parsed request and returns the result
 * in the request's unit system (see preview-result.ts for the shape and units map).
 */
export function previewEstimate(request: EstimatePreviewInput): EstimatePreviewResult {
  const input = toEngineInput(request);
  const factors = unitFactors(request.unitSystem);
  const inputIssues = impossibleInputIssues(input, factors);
  if (inputIssues.length) throw EngineInputError.of(inputIssues);
  const det = runDeterministic(input);
  const resultIssues = impossibleResultIssues(det);
  if (resultIssues.length) throw EngineInputError.of(resultIssues);
  const curveTimes = curveTimesYears(det);
  const userTimes = input.timePointsYears;

  let ranges: MonteCarloSummary | null = null;
  if (hasAnySpread(input)) {
    const run = runMonteCarlo(det, [...curveTimes, ...userTimes], input.monteCarlo.realisations, input.monteCarlo.seed);
    ranges = summariseMonteCarlo(run, (i) => (i < 0 ? 'whole profile' : (input.layers[i]?.name ?? '')));
  }
  const ignoredFreeDraining = request.layers.flatMap((l, i) =>
    l.compressible === false &&
    (l.cc ?? l.cr ?? l.e0 ?? l.mv ?? l.cv ?? l.sigmaP ?? l.ocr ?? l.cAlpha ?? l.cAlphaOverCc) !== undefined
      ? [i]
      : [],
  );

  const out = outputUnits(factors);
  const curve = settlementAtTimes(det, curveTimes, out);
  return {
    unitSystem: request.unitSystem,
    units: factors.labels,
    settlement: settlementOutput(det, out),
    sublayers: sublayerOutput(det, out),
    sublayering: {
      mode: det.sublayering.mode,
      countsPerLayer: det.sublayering.countsPerLayer,
      tolerancePercent: input.sublayers.mode === 'auto' ? input.sublayers.tolerancePercent : null,
      changePercent:
        det.sublayering.mode === 'auto' && Number.isFinite(det.sublayering.changePercent) ? det.sublayering.changePercent : null,
      converged: det.sublayering.converged,
      refinements: det.sublayering.refinements,
    },
    stressIncrease: { method: det.stress.method, pressure: out.stress(det.stress.pressureKpa) },
    timeCurve: {
      timeYears: curve.map((c) => c.timeYears),
      degree: curve.map((c) => c.degree),
      primary: curve.map((c) => c.primary),
      secondary: curve.map((c) => c.secondary),
      total: curve.map((c) => c.total),
    },
    atTimes: settlementAtTimes(det, userTimes, out),
    t50Years: det.t50Years,
    t90Years: det.t90Years,
    ranges: ranges && rangesOutput(ranges, curveTimes, userTimes, out),
    methods: methodsUsed(
      det,
      ranges,
      `${Number((input.waterUnitWeightKnPerM3 / factors.unitWeight).toPrecision(4))} ${factors.labels.unitWeight}`,
    ),
    warnings: collectWarnings(det, factors, ranges, ignoredFreeDraining),
    cautions: [...STANDING_CAUTIONS],
  };
}
