import type { ReactNode } from 'react';
import EChart, { type ChartOption, chartPng, chartSvg } from './EChart';

interface ChartFigureProps {
  /** File names start with this (no extension). */
  name: string;
  title: string;
  option: ChartOption;
  height?: number;
  /** Plain-text summary shown beside the chart and read by screen readers. */
  summary: string;
  /** The chart's data as CSV text. */
  csv: () => string;
  children?: ReactNode;
  testId?: string;
  /** Summary under the chart instead of beside it (small panels). */
  compact?: boolean;
}

function download(href: string, fileName: string) {
  const link = document.createElement('a');
  link.href = href;
  link.download = fileName;
  document.body.append(link);
  link.click();
  link.remove();
}

function downloadText(text: string, type: string, fileName: string) {
  const url = URL.createObjectURL(new Blob([text], { type }));
  download(url, fileName);
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/** A chart with its title, the text summary beside it, and PNG / SVG / CSV downloads. */
export default function ChartFigure({
  name,
  title,
  option,
  height = 340,
  summary,
  csv,
  children,
  testId,
  compact = false,
}: ChartFigureProps) {
  const width = 900;
  return (
    <figure className="panel p-3" data-testid={testId}>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <figcaption className="font-semibold text-ink-800">{title}</figcaption>
        <div className="flex gap-1">
          <button
            type="button"
            className="btn-quiet px-2 py-0.5 text-xs"
            aria-label={`Download ${title} as PNG`}
            onClick={() => download(chartPng(option, width, height), `${name}.png`)}
          >
            PNG
          </button>
          <button
            type="button"
            className="btn-quiet px-2 py-0.5 text-xs"
            aria-label={`Download ${title} as SVG`}
            onClick={() => downloadText(chartSvg(option, width, height), 'image/svg+xml', `${name}.svg`)}
          >
            SVG
          </button>
          <button
            type="button"
            className="btn-quiet px-2 py-0.5 text-xs"
            aria-label={`Download the data of ${title} as CSV`}
            onClick={() => downloadText(csv(), 'text/csv', `${name}.csv`)}
          >
            Data (CSV)
          </button>
        </div>
      </div>
      <div className={compact ? 'mt-2 grid gap-2' : 'mt-2 grid gap-3 lg:grid-cols-[minmax(0,1fr)_16rem]'}>
        <EChart option={option} height={height} label={summary} testId={testId ? `${testId}-canvas` : undefined} />
        <div className="text-xs text-ink-600">
          <p data-testid={testId ? `${testId}-summary` : undefined}>{summary}</p>
          {children}
        </div>
      </div>
    </figure>
  );
}
