import { LineChart } from 'echarts/charts';
import { GridComponent, LegendComponent, TooltipComponent } from 'echarts/components';
import * as echarts from 'echarts/core';
import { CanvasRenderer } from 'echarts/renderers';
import ReactEChartsCore from 'echarts-for-react/lib/core';
import type { Increment } from '../../lib/contracts/review';
import { curveSeries } from './curve-series';

echarts.use([LineChart, GridComponent, LegendComponent, TooltipComponent, CanvasRenderer]);

interface ELogSigmaChartProps {
  increments: Increment[];
  /** for the accessible description, e.g. "row 3" */
  label: string;
}

const LOADING_COLOUR = '#975632';
const UNLOADING_COLOUR = '#246660';

/** Void ratio against applied vertical stress on a log axis, loading and unloading steps told apart. */
export default function ELogSigmaChart({ increments, label }: ELogSigmaChartProps) {
  const { loading, unloading } = curveSeries(increments);
  const stresses = increments.map((i) => i.appliedStressKpa).filter((s) => s > 0);
  const loadSteps = increments.filter((i) => !i.isUnloading).length;
  const description = `e–log σ′ curve of ${label}: ${loadSteps} loading and ${increments.length - loadSteps} unloading steps, ${Math.min(...stresses)} to ${Math.max(...stresses)} kPa.`;
  const option = {
    animation: false,
    grid: { left: 48, right: 16, top: 28, bottom: 40 },
    legend: { top: 0, right: 8, itemWidth: 18, textStyle: { fontSize: 11 } },
    tooltip: {
      trigger: 'item',
      formatter: (p: { seriesName: string; value: [number, number] }) =>
        `${p.seriesName}<br/>σ′ ${p.value[0]} kPa, e ${p.value[1].toFixed(3)}`,
    },
    xAxis: {
      type: 'log',
      logBase: 10,
      name: 'σ′ (kPa, log scale)',
      nameLocation: 'middle',
      nameGap: 24,
      nameTextStyle: { fontSize: 11 },
      axisLabel: { fontSize: 10 },
      minorSplitLine: { show: true, lineStyle: { color: '#e4e8ec' } },
      minorTick: { show: true },
    },
    yAxis: {
      type: 'value',
      name: 'e',
      scale: true,
      nameTextStyle: { fontSize: 11 },
      axisLabel: { fontSize: 10 },
      splitLine: { lineStyle: { color: '#e4e8ec' } },
    },
    series: [
      {
        name: 'Loading',
        type: 'line',
        data: loading,
        symbol: 'circle',
        symbolSize: 6,
        lineStyle: { color: LOADING_COLOUR, width: 2 },
        itemStyle: { color: LOADING_COLOUR },
      },
      {
        name: 'Unloading',
        type: 'line',
        data: unloading,
        symbol: 'triangle',
        symbolSize: 8,
        lineStyle: { color: UNLOADING_COLOUR, width: 2, type: 'dashed' },
        itemStyle: { color: UNLOADING_COLOUR },
      },
    ],
  };
  return (
    <figure className="w-full max-w-xl" data-testid="elog-chart">
      <div role="img" aria-label={description}>
        <ReactEChartsCore echarts={echarts} option={option} style={{ height: 260, width: '100%' }} notMerge />
      </div>
      <figcaption className="text-2xs text-ink-500">{description}</figcaption>
    </figure>
  );
}
