import type { Json } from '../../lib/contracts/json';
import type { CorrelationAnswer } from '../../lib/contracts/statistics';
import type { BandPoint } from '../../lib/statistics';
import type { DisplaySystem } from '../../lib/units/display';
import { axisOf, sig } from './axis-display';
import ChartFigure from './ChartFigure';
import { toCsv } from './csv';
import PublishedBias from './PublishedBias';
import WithheldNote from './WithheldNote';

export interface UnitAnswer {
  label: string;
  answer: Json<CorrelationAnswer>;
}

interface CorrelationChartProps {
  /** One answer (colour: own firm against pooled) or one per unit (colour by unit). */
  answers: UnitAnswer[];
  colour: 'origin' | 'unit';
  system: DisplaySystem;
  fileStem: string;
}

const UNIT_COLOURS = ['#975632', '#246660', '#6f7f90', '#b8891a', '#3b7d35', '#862d21', '#1e524d'];
const OWN_COLOUR = '#246660';
const POOLED_COLOUR = '#c98556';
const PUBLISHED_DASHES: ('dashed' | 'dotted' | 'solid')[] = ['dashed', 'dotted', 'dashed', 'dotted'];
const LARGE = 2000;

function scatter(name: string, xs: number[], ys: number[], colour: string, symbol: string) {
  const data = xs.map((x, i) => [x, ys[i] as number]);
  return {
    name,
    type: 'scatter',
    data,
    symbol,
    symbolSize: 6,
    itemStyle: { color: colour, opacity: 0.75 },
    large: data.length > LARGE,
    largeThreshold: LARGE,
  };
}

function lineSeries(name: string, data: number[][], colour: string, type: 'solid' | 'dashed' | 'dotted', width = 2) {
  return {
    name,
    type: 'line',
    data,
    showSymbol: false,
    lineStyle: { color: colour, type, width },
    itemStyle: { color: colour },
    z: 3,
  };
}

/** A correlation scatter with the OLS line, 90 % bands, and the published correlations named on it. */
export default function CorrelationChart({ answers, colour, system, fileStem }: CorrelationChartProps) {
  const first = answers[0]?.answer;
  if (!first) return null;
  const { pair, level } = first.correlation;
  const x = axisOf(pair.x, system);
  const y = axisOf(pair.y, system);
  const percent = Math.round(level * 100);
  const series: object[] = [];
  const csvRows: (string | number | null)[][] = [];
  const point = (xs: number[], ys: number[]) => xs.map((v, i) => [x.shown(v), y.shown(ys[i] as number)]);
  answers.forEach(({ label, answer }, index) => {
    const c = answer.correlation;
    const byUnit = colour === 'unit';
    const pooledColour = byUnit ? (UNIT_COLOURS[index % UNIT_COLOURS.length] as string) : POOLED_COLOUR;
    const ownColour = byUnit ? pooledColour : OWN_COLOUR;
    const prefix = byUnit ? `${label}: ` : '';
    if (c.pooled.released && c.pooled.points) {
      const pts = point(c.pooled.points.x, c.pooled.points.y);
      series.push(
        scatter(
          `${prefix}other firms (masked)`,
          pts.map((p) => p[0] as number),
          pts.map((p) => p[1] as number),
          pooledColour,
          'circle',
        ),
      );
      for (const p of pts) csvRows.push([`${prefix}other firms (masked)`, p[0] ?? null, p[1] ?? null]);
    }
    if (c.own?.points) {
      const pts = point(c.own.points.x, c.own.points.y);
      series.push(
        scatter(
          `${prefix}your firm`,
          pts.map((p) => p[0] as number),
          pts.map((p) => p[1] as number),
          ownColour,
          'diamond',
        ),
      );
      for (const p of pts) csvRows.push([`${prefix}your firm`, p[0] ?? null, p[1] ?? null]);
    }
    const fitted = c.pooled.released ? c.pooled.line : c.own?.line;
    if (fitted) {
      const fitName = `${prefix}${c.pooled.released ? 'pooled' : 'your firm'} OLS`;
      const bandLine = (pick: (b: Json<BandPoint>) => number) => fitted.bands.map((b) => [x.shown(b.x), y.shown(pick(b))]);
      const lineColour = byUnit ? pooledColour : '#212a33';
      series.push(
        lineSeries(
          fitName,
          bandLine((b) => b.fit),
          lineColour,
          'solid',
        ),
      );
      series.push(
        lineSeries(
          `${prefix}${percent} % confidence band`,
          bandLine((b) => b.confidenceLow),
          lineColour,
          'dashed',
          1,
        ),
      );
      series.push(
        lineSeries(
          `${prefix}${percent} % confidence band`,
          bandLine((b) => b.confidenceHigh),
          lineColour,
          'dashed',
          1,
        ),
      );
      series.push(
        lineSeries(
          `${prefix}${percent} % prediction band`,
          bandLine((b) => b.predictionLow),
          lineColour,
          'dotted',
          1,
        ),
      );
      series.push(
        lineSeries(
          `${prefix}${percent} % prediction band`,
          bandLine((b) => b.predictionHigh),
          lineColour,
          'dotted',
          1,
        ),
      );
      for (const b of fitted.bands) {
        csvRows.push([
          `${fitName}`,
          x.shown(b.x),
          y.shown(b.fit),
          y.shown(b.confidenceLow),
          y.shown(b.confidenceHigh),
          y.shown(b.predictionLow),
          y.shown(b.predictionHigh),
        ]);
      }
    }
  });
  first.correlation.published.forEach((line, i) => {
    const data = line.x.map((v, j) => [x.shown(v), y.shown(line.y[j] as number)]);
    series.push(
      lineSeries(
        `${line.source}: ${line.equation}`,
        data,
        '#6f7f90',
        PUBLISHED_DASHES[i % PUBLISHED_DASHES.length] ?? 'dashed',
        1.5,
      ),
    );
    for (const d of data) csvRows.push([`published: ${line.source}`, d[0] ?? null, d[1] ?? null]);
  });
  const option = {
    animation: false,
    grid: { left: 64, right: 16, top: 16, bottom: 120 },
    legend: { bottom: 0, type: 'scroll', textStyle: { fontSize: 10 } },
    tooltip: { trigger: 'item' },
    xAxis: { type: pair.xScale === 'log' ? 'log' : 'value', name: x.title, nameLocation: 'middle', nameGap: 28, scale: true },
    yAxis: { type: pair.yScale === 'log' ? 'log' : 'value', name: y.title, nameLocation: 'middle', nameGap: 44, scale: true },
    series,
  };
  const onLog = pair.yScale === 'log' ? ` (fitted on log10 ${y.symbol})` : '';
  const describe = ({ label, answer }: UnitAnswer) => {
    const c = answer.correlation;
    const fit = c.pooled.released ? c.pooled.line?.fit : c.own?.line?.fit;
    const counts = c.pooled.released
      ? `${c.pooled.n} tests from ${c.pooled.firms} firms`
      : `${c.own?.n ?? 0} tests of your firm only`;
    const head = colour === 'unit' ? `${label}: ` : '';
    return fit
      ? `${head}${counts}; slope ${sig(fit.slope)} ± ${sig(fit.slopeStandardError)}, intercept ${sig(fit.intercept)} ± ${sig(fit.interceptStandardError)} (standard errors), r = ${sig(fit.r)}, R² = ${sig(fit.rSquared)}, residual sd ${sig(fit.residualSd)}.`
      : `${head}${counts}; no line can be fitted.`;
  };
  const summary = `${y.symbol} against ${x.symbol}, ordinary least squares${onLog} in SI units. ${answers.map(describe).join(' ')} Dashed lines: ${percent} % confidence band; dotted: ${percent} % prediction band. ${first.correlation.published.length} published correlation(s) drawn in grey.`;
  const csv = () =>
    toCsv(['series', x.title, y.title, 'confidence low', 'confidence high', 'prediction low', 'prediction high'], csvRows);
  return (
    <ChartFigure
      name={`${fileStem}-${pair.id}`}
      title={`${y.symbol} against ${x.symbol}`}
      option={option}
      height={460}
      summary={summary}
      csv={csv}
      testId="correlation-chart"
    >
      {answers.map(({ label, answer }) =>
        answer.correlation.pooled.released ? null : (
          <div key={label} className="mt-2">
            <WithheldNote
              tests={answer.correlation.pooled.tests}
              firms={answer.correlation.pooled.firms}
              reasons={answer.correlation.pooled.reasons}
              what={`Other firms' points${colour === 'unit' ? ` (${label})` : ''}`}
            />
          </div>
        ),
      )}
      <PublishedBias comparisons={first.published} pair={pair} />
    </ChartFigure>
  );
}
