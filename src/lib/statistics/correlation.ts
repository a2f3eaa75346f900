/**
 * One correlation chart: the scatter (other firms' tests masked, the viewer's own unmasked), the OLS
 * line on the plotted axes (log10 where the axis is logarithmic) with its confidence and prediction
 * bands, and the published correlations drawn on this pair. The regression is unweighted: the quality
 * filter applies, the quality weights do not. Lines and bands span the 5th to 95th percentile of x
 * (never the pooled extremes).
 */
import type { BandPoint } from './bands';
import { fromAxis, line, type PublishedLine, publishedLines, toAxis } from './chart-lines';
import type { StatisticsContext, Withheld } from './context';
import {
  type AxisScale,
  type AxisVariable,
  CORRELATION_PAIRS,
  type CorrelationPair,
  type CorrelationPairId,
} from './correlation-pairs';
import { checkDisclosure } from './disclosure';
import { maskedValues, noiseMoments } from './masking';
import { percentilesBySelection } from './order-statistics';
import type { ParameterKey } from './parameters';
import { fitLine, type LinearFit } from './regression';
import { type AxisNoise, fitMaskedLine } from './regression-masked';

export interface ScatterPoints {
  x: number[];
  y: number[];
}

export interface FittedLine {
  /** On the plotted axes: for a log axis the fit is of log10 values. */
  fit: LinearFit;
  /** Pooled: whether the masking correction was applied (see regression-masked.ts); own: false. */
  corrected: boolean;
  /** Pooled: Sxx* ÷ Sxx; own: null. */
  reliability: number | null;
  /** In the parameters' own units (back-transformed from log axes). */
  bands: BandPoint[];
  xRange: [number, number];
}

export interface CorrelationResult {
  pair: CorrelationPair;
  level: number;
  pooled: { released: true; n: number; firms: number; points: ScatterPoints | null; line: FittedLine | null } | Withheld;
  own: { n: number; points: ScatterPoints | null; line: FittedLine | null } | null;
  published: PublishedLine[];
}

export interface CorrelationOptions {
  /** Band level (default 0.9). */
  level?: number;
  /** Include the scatter points (default true); a summary-only caller can leave them out. */
  includePoints?: boolean;
  /** Points along each line and band (default 25). */
  lineSteps?: number;
}

function axisNoise(variable: AxisVariable, scale: AxisScale): AxisNoise {
  if (variable === 'depthM') return { kind: 'none' };
  const moments = noiseMoments(variable);
  if (scale === 'log')
    return { kind: 'additive', mean: moments.lnMean / Math.LN10, variance: moments.lnVariance / Math.LN10 ** 2 };
  return { kind: 'relative', factorVariance: moments.factorVariance };
}

function spanOf(plotted: Float64Array, count: number): [number, number] {
  const [p5, p95] = percentilesBySelection(plotted.slice(0, count), [0.05, 0.95]);
  return [p5 as number, p95 as number];
}

export function correlatePair(
  context: StatisticsContext,
  id: CorrelationPairId,
  options: CorrelationOptions = {},
): CorrelationResult {
  const { columns, classWeights, viewerIndex, rule } = context;
  const pair = CORRELATION_PAIRS[id];
  const level = options.level ?? 0.9;
  const includePoints = options.includePoints ?? true;
  const lineSteps = Math.max(2, options.lineSteps ?? 25);
  const rawX = pair.x === 'depthM' ? columns.depthM : columns.values[pair.x];
  const rawY = columns.values[pair.y];
  const n = rawX && rawY ? columns.length : 0;
  const usable = (x: number, y: number) =>
    Number.isFinite(x) && Number.isFinite(y) && (pair.xScale === 'linear' || x > 0) && (pair.yScale === 'linear' || y > 0);
  const perFirm = new Uint32Array(columns.firmIds.length);
  let ownCount = 0;
  for (let i = 0; i < n; i++) {
    if (classWeights[columns.qualityClass[i] as number] === 0) continue;
    if (!usable((rawX as Float64Array)[i] as number, (rawY as Float64Array)[i] as number)) continue;
    const firm = columns.firmIndex[i] as number;
    perFirm[firm] = (perFirm[firm] as number) + 1;
    if (firm === viewerIndex) ownCount++;
  }
  const verdict = checkDisclosure(perFirm, rule);
  let own: CorrelationResult['own'] = null;
  let ownRange: [number, number] | null = null;
  if (ownCount > 0) {
    const xs = new Float64Array(ownCount);
    const ys = new Float64Array(ownCount);
    let k = 0;
    for (let i = 0; i < n && k < ownCount; i++) {
      if (columns.firmIndex[i] !== viewerIndex || classWeights[columns.qualityClass[i] as number] === 0) continue;
      const x = (rawX as Float64Array)[i] as number;
      const y = (rawY as Float64Array)[i] as number;
      if (!usable(x, y)) continue;
      xs[k] = toAxis(x, pair.xScale);
      ys[k] = toAxis(y, pair.yScale);
      k++;
    }
    ownRange = spanOf(xs, ownCount);
    const fit = fitLine(xs, ys, ownCount);
    own = {
      n: ownCount,
      points: includePoints
        ? { x: Array.from(xs, (v) => fromAxis(v, pair.xScale)), y: Array.from(ys, (v) => fromAxis(v, pair.yScale)) }
        : null,
      line:
        fit && ownRange[1] > ownRange[0]
          ? {
              fit,
              corrected: false,
              reliability: null,
              bands: line(fit, pair, ownRange, level, lineSteps),
              xRange: [fromAxis(ownRange[0], pair.xScale), fromAxis(ownRange[1], pair.xScale)],
            }
          : null,
    };
  }
  if (!verdict.released) {
    return {
      pair,
      level,
      pooled: { released: false, tests: verdict.tests, firms: verdict.firms, reasons: verdict.reasons },
      own,
      published: publishedLines(pair, ownRange, lineSteps),
    };
  }
  const maskedX = pair.x === 'depthM' ? columns.depthM : (maskedValues(columns, pair.x) as Float64Array);
  const maskedY = maskedValues(columns, pair.y) as Float64Array;
  const xs = new Float64Array(verdict.tests);
  const ys = new Float64Array(verdict.tests);
  const others: ScatterPoints = { x: [], y: [] };
  let k = 0;
  for (let i = 0; i < n; i++) {
    if (classWeights[columns.qualityClass[i] as number] === 0) continue;
    if (!usable((rawX as Float64Array)[i] as number, (rawY as Float64Array)[i] as number)) continue;
    const x = maskedX[i] as number;
    const y = maskedY[i] as number;
    xs[k] = toAxis(x, pair.xScale);
    ys[k] = toAxis(y, pair.yScale);
    k++;
    if (includePoints && columns.firmIndex[i] !== viewerIndex) {
      others.x.push(x);
      others.y.push(y);
    }
  }
  const range = spanOf(xs, k);
  const masked = fitMaskedLine(xs, ys, k, axisNoise(pair.x, pair.xScale), axisNoise(pair.y, pair.yScale));
  const pooledLine: FittedLine | null =
    masked && range[1] > range[0]
      ? {
          fit: masked.fit,
          corrected: masked.corrected,
          reliability: masked.reliability,
          bands: line(masked.fit, pair, range, level, lineSteps),
          xRange: [fromAxis(range[0], pair.xScale), fromAxis(range[1], pair.xScale)],
        }
      : null;
  return {
    pair,
    level,
    pooled: { released: true, n: k, firms: verdict.firms, points: includePoints ? others : null, line: pooledLine },
    own,
    published: publishedLines(pair, range, lineSteps),
  };
}

/** The parameters a pair reads, for callers that load columns selectively. */
export function pairParameters(id: CorrelationPairId): ParameterKey[] {
  const pair = CORRELATION_PAIRS[id];
  return pair.x === 'depthM' ? [pair.y] : [pair.x, pair.y];
}
