import { BoxplotChart, LineChart, ScatterChart } from 'echarts/charts';
import { DataZoomComponent, GridComponent, LegendComponent, TitleComponent, TooltipComponent } from 'echarts/components';
import * as echarts from 'echarts/core';
import { CanvasRenderer, SVGRenderer } from 'echarts/renderers';
import { useEffect, useRef } from 'react';

echarts.use([
  BoxplotChart,
  LineChart,
  ScatterChart,
  GridComponent,
  LegendComponent,
  TitleComponent,
  TooltipComponent,
  DataZoomComponent,
  CanvasRenderer,
  SVGRenderer,
]);

export type ChartOption = echarts.EChartsCoreOption;

interface EChartProps {
  option: ChartOption;
  height: number;
  /** What the chart shows, for screen readers (the same words as the summary beside it). */
  label: string;
  testId?: string;
}

/** One ECharts chart, drawn in the browser only (nothing on the server), redrawn when the option changes. */
export default function EChart({ option, height, label, testId }: EChartProps) {
  const element = useRef<HTMLDivElement>(null);
  const chart = useRef<echarts.ECharts | null>(null);
  useEffect(() => {
    if (!element.current) return;
    chart.current = echarts.init(element.current, null, { renderer: 'canvas' });
    const resize = () => chart.current?.resize();
    window.addEventListener('resize', resize);
    return () => {
      window.removeEventListener('resize', resize);
      chart.current?.dispose();
      chart.current = null;
    };
  }, []);
  useEffect(() => {
    chart.current?.setOption(option, { notMerge: true });
  }, [option]);
  return <div ref={element} role="img" aria-label={label} style={{ height, width: '100%' }} data-testid={testId} />;
}

/** The chart as an SVG document, drawn again by ECharts' SVG renderer at the given size. */
export function chartSvg(option: ChartOption, width: number, height: number): string {
  const svgChart = echarts.init(null, null, { renderer: 'svg', ssr: true, width, height });
  svgChart.setOption({ ...option, animation: false });
  const text = svgChart.renderToSVGString();
  svgChart.dispose();
  return text;
}

/** The chart as a PNG data URL, drawn on a canvas of its own at twice the size for sharp print. */
export function chartPng(option: ChartOption, width: number, height: number): string {
  const holder = document.createElement('div');
  holder.style.cssText = `position:absolute;left:-10000px;top:0;width:${width}px;height:${height}px`;
  document.body.append(holder);
  const pngChart = echarts.init(holder, null, { renderer: 'canvas', width, height, devicePixelRatio: 2 });
  pngChart.setOption({ ...option, animation: false, backgroundColor: '#ffffff' });
  const url = pngChart.getDataURL({ type: 'png', pixelRatio: 2, backgroundColor: '#ffffff' });
  pngChart.dispose();
  holder.remove();
  return url;
}
