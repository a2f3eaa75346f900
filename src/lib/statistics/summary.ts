/**
 * Typical values of one parameter over a selection: pooled figures from masked values when the
 * disclosure rule holds (never the pooled minimum or maximum), and the viewer's own tests unmasked.
 * Two passes over the rows and one sort per parameter (per class when weighted).
 */
import { ClassRuns } from './class-runs';
import type { StatisticsContext, Withheld } from './context';
import { checkDisclosure } from './disclosure';
import { type DistributionFigures, figuresFromRuns, type NoiseCorrection } from './figures';
import { maskedValues, noiseMoments } from './masking';
import { PARAMETERS, type ParameterKey, type ParameterScale } from './parameters';

export interface ParameterSummary {
  parameter: ParameterKey;
  symbol: string;
  unit: string;
  scale: ParameterScale;
  /** Figures pooled across firms (masked values, corrected for the masking's spread), or why not. */
  pooled: ({ released: true } & DistributionFigures) | Withheld;
  /** The viewer's own firm's tests, unmasked; null when it has none here. */
  own: DistributionFigures | null;
}

function pooledNoise(key: ParameterKey): NoiseCorrection {
  const moments = noiseMoments(key);
  return PARAMETERS[key].scale === 'log'
    ? { kind: 'log', lnMean: moments.lnMean, lnVariance: moments.lnVariance }
    : { kind: 'linear', factorVariance: moments.factorVariance };
}

export function summariseParameter(context: StatisticsContext, key: ParameterKey): ParameterSummary {
  const { columns, viewerIndex, classWeights, weighted, rule } = context;
  const definition = PARAMETERS[key];
  const isLog = definition.scale === 'log';
  const head = { parameter: key, symbol: definition.symbol, unit: definition.unit, scale: definition.scale };
  const raw = columns.values[key];
  const quality = columns.qualityClass;
  const firmOf = columns.firmIndex;
  const perFirm = new Uint32Array(columns.firmIds.length);
  const pooledByClass = new Int32Array(5);
  const ownByClass = new Int32Array(5);
  const rows = new Int32Array(raw ? columns.length : 0);
  let count = 0;
  for (let i = 0; i < rows.length; i++) {
    const x = (raw as Float64Array)[i] as number;
    const q = quality[i] as number;
    if (!Number.isFinite(x) || (isLog && x <= 0) || classWeights[q] === 0) continue;
    rows[count++] = i;
    const firm = firmOf[i] as number;
    perFirm[firm] = (perFirm[firm] as number) + 1;
    pooledByClass[q] = (pooledByClass[q] as number) + 1;
    if (firm === viewerIndex) ownByClass[q] = (ownByClass[q] as number) + 1;
  }
  const verdict = checkDisclosure(perFirm, rule);
  const pooledRuns = verdict.released ? new ClassRuns(pooledByClass) : null;
  const ownRuns = viewerIndex >= 0 && (perFirm[viewerIndex] as number) > 0 ? new ClassRuns(ownByClass) : null;
  if (pooledRuns) {
    const masked = maskedValues(columns, key) as Float64Array;
    for (let j = 0; j < count; j++) {
      const i = rows[j] as number;
      const m = masked[i] as number;
      pooledRuns.push(quality[i] as number, isLog ? Math.log(m) : m);
    }
  }
  if (ownRuns) {
    for (let j = 0; j < count; j++) {
      const i = rows[j] as number;
      if (firmOf[i] !== viewerIndex) continue;
      const x = (raw as Float64Array)[i] as number;
      ownRuns.push(quality[i] as number, isLog ? Math.log(x) : x);
    }
  }
  const own = ownRuns
    ? figuresFromRuns(ownRuns.runs(classWeights, weighted), definition.scale, 1, weighted, { kind: 'none' })
    : null;
  if (!pooledRuns)
    return { ...head, pooled: { released: false, tests: verdict.tests, firms: verdict.firms, reasons: verdict.reasons }, own };
  const figures = figuresFromRuns(
    pooledRuns.runs(classWeights, weighted),
    definition.scale,
    verdict.firms,
    weighted,
    pooledNoise(key),
  );
  return { ...head, pooled: { released: true, ...figures }, own };
}

/** Summaries of the listed parameters (those the selection carries, by default). */
export function summariseParameters(context: StatisticsContext, keys?: readonly ParameterKey[]): ParameterSummary[] {
  const list = keys ?? (Object.keys(context.columns.values) as ParameterKey[]);
  return list.map((key) => summariseParameter(context, key));
}
