import type { Json } from '../../lib/contracts/json';
import type { ProfileAnswer } from '../../lib/contracts/statistics';
import type { ProfilePanel } from '../../lib/statistics';
import { PARAMETERS } from '../../lib/statistics/parameters';

import { type DisplaySystem, formatQuantity, fromSi, headerWithUnit, toSi, unitLabel } from '../../lib/units/display';
import ChartFigure from './ChartFigure';
import { toCsv } from './csv';
import { PARAMETER_QUANTITY } from './parameter-display';
import WithheldNote from './WithheldNote';

interface DepthProfilesProps {
  answer: Json<ProfileAnswer>;
  system: DisplaySystem;
  fileStem: string;
  waterTableM: number;
  onWaterTable: (depthM: number) => void;
}

function Panel({
  panel,
  answer,
  system,
  fileStem,
}: {
  panel: Json<ProfilePanel>;
  answer: Json<ProfileAnswer>;
  system: DisplaySystem;
  fileStem: string;
}) {
  const definition = PARAMETERS[panel.parameter];
  const kind = PARAMETER_QUANTITY[panel.parameter];
  const depth = (m: number) => fromSi(m, 'length', system);
  const value = (v: number) => fromSi(v, kind, system);
  const pairs = (depths: number[], values: number[]) => depths.map((z, i) => [value(values[i] as number), depth(z)]);
  const series: object[] = [];
  const rows: (string | number)[][] = [];
  if (panel.pooled.released) {
    const data = pairs(panel.pooled.points.depthM, panel.pooled.points.value);
    series.push({
      name: 'Other firms (masked)',
      type: 'scatter',
      data,
      symbolSize: 5,
      itemStyle: { color: '#c98556', opacity: 0.7 },
      large: data.length > 2000,
      largeThreshold: 2000,
    });
    for (const d of data) rows.push(['other firms (masked)', d[1] as number, d[0] as number]);
  }
  if (panel.own) {
    const data = pairs(panel.own.depthM, panel.own.value);
    series.push({ name: 'Your firm', type: 'scatter', data, symbol: 'diamond', symbolSize: 6, itemStyle: { color: '#246660' } });
    for (const d of data) rows.push(['your firm', d[1] as number, d[0] as number]);
  }
  const line = answer.profile.effectiveStressLine;
  const withLine = line && panel.parameter === 'preconsolidationStressKpa';
  if (withLine) {
    const data = line.depthM.map((z, i) => [value(line.effectiveStressKpa[i] as number), depth(z)]);
    series.push({ name: "In-situ σ'v0", type: 'line', data, showSymbol: false, lineStyle: { color: '#212a33', width: 1.5 } });
    for (const d of data) rows.push(["in-situ σ'v0", d[1] as number, d[0] as number]);
  }
  const xTitle = headerWithUnit(definition.symbol, kind, system);
  const yTitle = headerWithUnit('Depth', 'length', system);
  const option = {
    animation: false,
    grid: { left: 52, right: 12, top: 12, bottom: 64 },
    legend: { bottom: 0, textStyle: { fontSize: 10 } },
    tooltip: { trigger: 'item' },
    xAxis: { type: 'value', name: xTitle, nameLocation: 'middle', nameGap: 24, scale: true, position: 'top' },
    yAxis: { type: 'value', name: yTitle, nameLocation: 'middle', nameGap: 36, inverse: true, min: 0 },
    series,
  };
  const pooledText = panel.pooled.released
    ? `${panel.pooled.n} tests from ${panel.pooled.firms} firms`
    : `other firms' points withheld (${panel.pooled.tests} tests, ${panel.pooled.firms} firms)`;
  const summary = `${definition.symbol} against depth: ${pooledText}${panel.own ? `; ${panel.own.depthM.length} of your firm's tests` : ''}${
    withLine && answer.stressLine
      ? `; in-situ σ'v0 line from unit weight ${formatQuantity(answer.stressLine.unitWeightKnPerM3, 'unitWeight', system, { withUnit: true })} (${answer.stressLine.from}) and water table at ${formatQuantity(answer.stressLine.waterTableM, 'length', system, { withUnit: true })}`
      : ''
  }.`;
  return (
    <ChartFigure
      name={`${fileStem}-profile-${panel.parameter}`}
      title={`${definition.symbol} with depth`}
      option={option}
      height={380}
      summary={summary}
      csv={() => toCsv(['series', yTitle, xTitle], rows)}
      testId={`profile-${panel.parameter}`}
      compact
    >
      {!panel.pooled.released && (
        <WithheldNote
          tests={panel.pooled.tests}
          firms={panel.pooled.firms}
          reasons={panel.pooled.reasons}
          what="Other firms' points"
        />
      )}
    </ChartFigure>
  );
}

/** wn, LL, e0, Cc, σ'p and OCR against depth, with the in-situ σ'v0 line beside σ'p when unit weights are known. */
export default function DepthProfiles({ answer, system, fileStem, waterTableM, onWaterTable }: DepthProfilesProps) {
  const unit = unitLabel('length', system);
  return (
    <div className="space-y-3">
      <form
        className="flex flex-wrap items-end gap-2 text-sm"
        onSubmit={(event) => {
          event.preventDefault();
          const text = new FormData(event.currentTarget).get('waterTable');
          const shown = Number(text);
          if (Number.isFinite(shown) && shown >= 0) onWaterTable(toSi(shown, 'length', system));
        }}
      >
        <label className="flex flex-col">
          <span className="text-xs text-ink-600">Water table for the σ'v0 line ({unit} below ground)</span>
          <input
            name="waterTable"
            type="number"
            step="any"
            min="0"
            defaultValue={Number(fromSi(waterTableM, 'length', system).toPrecision(3))}
            className="w-28 rounded border border-ink-200 px-2 py-1"
          />
        </label>
        <button type="submit" className="btn-quiet">
          Redraw
        </button>
        {!answer.stressLine && <span className="text-xs text-ink-500">No unit weights in this selection, so no σ'v0 line.</span>}
      </form>
      <div className="grid gap-3 md:grid-cols-2 xl:grid-cols-3">
        {answer.profile.panels.map((panel) => (
          <Panel key={panel.parameter} panel={panel} answer={answer} system={system} fileStem={fileStem} />
        ))}
      </div>
    </div>
  );
}
