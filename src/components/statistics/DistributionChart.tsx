import type { Json } from '../../lib/contracts/json';
import type { DistributionFigures, ParameterSummary } from '../../lib/statistics';
import { type DisplaySystem, formatQuantity, fromSi, headerWithUnit } from '../../lib/units/display';
import ChartFigure from './ChartFigure';
import { toCsv } from './csv';
import { PARAMETER_QUANTITY } from './parameter-display';

interface DistributionChartProps {
  summary: Json<ParameterSummary>;
  system: DisplaySystem;
  fileStem: string;
}

const ROWS = ['p5', 'p10', 'p50', 'p90', 'p95'] as const;

/**
 * The spread of one parameter as boxes: whiskers P5–P95, box P10–P90, line at P50 (never the pooled
 * minimum or maximum), for the pooled tests and the viewer's own; a log axis for cv and k.
 */
export default function DistributionChart({ summary, system, fileStem }: DistributionChartProps) {
  const kind = PARAMETER_QUANTITY[summary.parameter];
  const axisName = headerWithUnit(summary.symbol, kind, system);
  const groups: { name: string; figures: DistributionFigures }[] = [];
  if (summary.pooled.released) groups.push({ name: 'All firms (pooled)', figures: summary.pooled as DistributionFigures });
  if (summary.own) groups.push({ name: 'Your firm', figures: summary.own });
  const shown = (v: number) => fromSi(v, kind, system);
  const option = {
    animation: false,
    grid: { left: 120, right: 24, top: 16, bottom: 48 },
    tooltip: {
      trigger: 'item',
      formatter: (p: { name: string; data: number[] }) =>
        `${p.name}<br/>P5 ${p.data[1]?.toPrecision(3)} · P10 ${p.data[2]?.toPrecision(3)} · P50 ${p.data[3]?.toPrecision(3)} · P90 ${p.data[4]?.toPrecision(3)} · P95 ${p.data[5]?.toPrecision(3)}`,
    },
    xAxis: {
      type: summary.scale === 'log' ? 'log' : 'value',
      name: `${axisName}${summary.scale === 'log' ? ', log scale' : ''}`,
      nameLocation: 'middle',
      nameGap: 28,
      scale: true,
    },
    yAxis: { type: 'category', data: groups.map((g) => g.name) },
    series: [
      {
        name: summary.symbol,
        type: 'boxplot',
        itemStyle: { color: '#d3ebe8', borderColor: '#246660' },
        data: groups.map((g) => ROWS.map((p) => shown(g.figures[p]))),
      },
    ],
  };
  const describe = (g: { name: string; figures: DistributionFigures }) =>
    `${g.name}: n = ${g.figures.n}, P5 ${formatQuantity(g.figures.p5, kind, system)}, P10 ${formatQuantity(g.figures.p10, kind, system)}, P50 ${formatQuantity(g.figures.p50, kind, system)}, P90 ${formatQuantity(g.figures.p90, kind, system)}, P95 ${formatQuantity(g.figures.p95, kind, system)}`;
  const summaryText = groups.length
    ? `Distribution of ${summary.symbol} (${axisName}). Whiskers P5 to P95, box P10 to P90, line at P50. ${groups.map(describe).join('. ')}.`
    : `No figures of ${summary.symbol} can be shown for this selection.`;
  const csv = () =>
    toCsv(
      ['group', 'n', 'firms', ...ROWS.map((p) => `${p.toUpperCase()} ${axisName}`)],
      groups.map((g) => [g.name, g.figures.n, g.figures.firms, ...ROWS.map((p) => shown(g.figures[p]))]),
    );
  return (
    <ChartFigure
      name={`${fileStem}-${summary.parameter}-distribution`}
      title={`Distribution of ${summary.symbol}`}
      option={option}
      height={Math.max(160, 90 + 50 * groups.length)}
      summary={summaryText}
      csv={csv}
      testId="distribution-chart"
    />
  );
}
