/**
 * Lines drawn on a correlation chart, in the parameters' own units: the fitted line with its bands
 * (computed on the plotted axes, log10 where an axis is logarithmic) and the published correlations
 * of the pair with their stated ranges, clipped to their stated validity.
 */
import { regressionBands } from './bands';
import type { AxisScale, CorrelationPair } from './correlation-pairs';
import { PUBLISHED_CORRELATIONS } from './published-correlations';
import type { LinearFit } from './regression';

export const toAxis = (value: number, scale: AxisScale) => (scale === 'log' ? Math.log10(value) : value);
export const fromAxis = (value: number, scale: AxisScale) => (scale === 'log' ? 10 ** value : value);

export interface PublishedLine {
  correlationId: string;
  source: string;
  equation: string;
  x: number[];
  y: number[];
  /** The stated range about the line, when one is stated. */
  low: number[] | null;
  high: number[] | null;
}

function steps(range: [number, number], count: number): number[] {
  return Array.from({ length: count }, (_, j) => range[0] + ((range[1] - range[0]) * j) / (count - 1));
}

/** Band points along the x range (plotted axes), back in the parameters' units. */
export function line(fit: LinearFit, pair: CorrelationPair, range: [number, number], level: number, count: number) {
  return regressionBands(fit, steps(range, count), level).map((b) => ({
    x: fromAxis(b.x, pair.xScale),
    fit: fromAxis(b.fit, pair.yScale),
    confidenceLow: fromAxis(b.confidenceLow, pair.yScale),
    confidenceHigh: fromAxis(b.confidenceHigh, pair.yScale),
    predictionLow: fromAxis(b.predictionLow, pair.yScale),
    predictionHigh: fromAxis(b.predictionHigh, pair.yScale),
  }));
}

export function publishedLines(pair: CorrelationPair, range: [number, number] | null, count: number): PublishedLine[] {
  if (!range) return [];
  return PUBLISHED_CORRELATIONS.filter((c) => c.chart?.pair === pair.id).flatMap((c) => {
    const stated = pair.x === 'depthM' ? undefined : c.validity.ranges[pair.x];
    const from = Math.max(fromAxis(range[0], pair.xScale), stated?.[0] ?? Number.NEGATIVE_INFINITY);
    const to = Math.min(fromAxis(range[1], pair.xScale), stated?.[1] ?? Number.POSITIVE_INFINITY);
    if (!(to > from)) return [];
    const xs = steps([toAxis(from, pair.xScale), toAxis(to, pair.xScale)], count).map((v) => fromAxis(v, pair.xScale));
    const ys = xs.map((x) => c.evaluate(c.inputs.map((key) => (key === pair.x ? x : (c.chart?.fixed[key] ?? Number.NaN)))));
    const band = c.statedRange;
    return [
      {
        correlationId: c.id,
        source: c.source,
        equation: c.equation,
        x: xs,
        y: ys,
        low: band ? ys.map((y) => y * band.low) : null,
        high: band ? ys.map((y) => y * band.high) : null,
      },
    ];
  });
}
