import type { Json } from '../../lib/contracts/json';
import type { DistributionFigures, ParameterSummary } from '../../lib/statistics';
import { type DisplaySystem, formatQuantity, unitLabel } from '../../lib/units/display';
import { PARAMETER_QUANTITY } from './parameter-display';
import WithheldNote from './WithheldNote';

interface ValueCardProps {
  summary: Json<ParameterSummary>;
  system: DisplaySystem;
  selected: boolean;
  onSelect: () => void;
}

function Triple({ figures, kind, system }: { figures: DistributionFigures; kind: ReturnType<typeof q>; system: DisplaySystem }) {
  const f = (v: number) => formatQuantity(v, kind, system);
  return (
    <dl className="mt-1 grid grid-cols-3 gap-1 text-center">
      {(['p10', 'p50', 'p90'] as const).map((p) => (
        <div key={p} className={p === 'p50' ? 'rounded bg-tide-50' : ''}>
          <dt className="text-2xs uppercase text-ink-500">{p.toUpperCase()}</dt>
          <dd className={p === 'p50' ? 'text-lg font-semibold text-ink-900' : 'text-sm text-ink-700'} data-testid={`value-${p}`}>
            {f(figures[p])}
          </dd>
        </div>
      ))}
    </dl>
  );
}

const q = (parameter: ParameterSummary['parameter']) => PARAMETER_QUANTITY[parameter];

/** One parameter's typical values: P10 / P50 / P90 with n and firms, or why they are withheld, and the viewer's own. */
export default function ValueCard({ summary, system, selected, onSelect }: ValueCardProps) {
  const kind = q(summary.parameter);
  const unit = unitLabel(kind, system);
  const pooled = summary.pooled;
  const own = summary.own;
  const isLog = summary.scale === 'log';
  return (
    <article
      className={`panel flex flex-col p-3 ${selected ? 'ring-2 ring-tide-500' : ''}`}
      data-testid={`card-${summary.parameter}`}
      aria-labelledby={`card-title-${summary.parameter}`}
    >
      <h3 id={`card-title-${summary.parameter}`} className="text-sm font-semibold text-ink-900">
        {summary.symbol} {unit && <span className="font-normal text-ink-500">({unit})</span>}
      </h3>
      {pooled.released ? (
        <>
          <Triple figures={pooled as DistributionFigures} kind={kind} system={system} />
          <p className="mt-1 text-xs text-ink-600" data-testid="card-counts">
            n = {pooled.n} tests · {pooled.firms} firms
            {isLog && pooled.logNormal && <> · geometric mean {formatQuantity(pooled.logNormal.geometricMean, kind, system)}</>}
          </p>
          {isLog && (
            <p className="mt-0.5 text-2xs text-ink-500">
              Log-normal: percentiles taken on logarithms (see How these figures are made).
            </p>
          )}
        </>
      ) : (
        <div className="mt-1">
          <WithheldNote tests={pooled.tests} firms={pooled.firms} reasons={pooled.reasons} what="Figures pooled across firms" />
        </div>
      )}
      {own && (
        <div className="mt-2 border-t border-ink-100 pt-1 text-xs text-ink-700" data-testid="card-own">
          <span className="font-medium">Your firm:</span> P10 {formatQuantity(own.p10, kind, system)} · P50{' '}
          {formatQuantity(own.p50, kind, system)} · P90 {formatQuantity(own.p90, kind, system)} (n = {own.n})
        </div>
      )}
      <button
        type="button"
        className="btn-quiet mt-auto self-start px-2 py-0.5 text-xs"
        onClick={onSelect}
        aria-pressed={selected}
      >
        {selected ? 'Distribution shown below' : 'Show distribution'}
      </button>
    </article>
  );
}
