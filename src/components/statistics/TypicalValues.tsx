import { useState } from 'react';
import type { Json } from '../../lib/contracts/json';
import type { StatisticsOverview } from '../../lib/contracts/statistics';
import { ESTIMATE_PREFILL_PARAMETERS, type EstimatePrefill, estimatePrefillHref } from '../../lib/schemas/estimate-prefill';
import type { ParameterKey } from '../../lib/statistics';
import type { DisplaySystem } from '../../lib/units/display';
import DistributionChart from './DistributionChart';
import { CARD_PARAMETERS } from './parameter-display';
import ValueCard from './ValueCard';

interface TypicalValuesProps {
  overview: Json<StatisticsOverview>;
  system: DisplaySystem;
  /** The one geological unit of the selection, when there is exactly one (the estimate needs it). */
  unitSlug: string | null;
  depth: { min?: number; max?: number } | undefined;
  fileStem: string;
}

/** The link to a new estimate with this selection's P10 / P50 / P90 filled in (null when nothing can be sent). */
function prefillLink(overview: Json<StatisticsOverview>, unitSlug: string, depth: TypicalValuesProps['depth']): string | null {
  const prefill: EstimatePrefill = { unit: unitSlug, ...(depth ? { depth } : {}) };
  if (overview.basis.bankVersion !== null) prefill.bankVersion = overview.basis.bankVersion;
  const bases = new Set<string>();
  for (const { key, parameter } of ESTIMATE_PREFILL_PARAMETERS) {
    const range = overview.estimatorRanges[parameter as ParameterKey];
    if (!range) continue;
    const { p10, p50, p90 } = range.spec;
    if (![p10, p50, p90].every((v) => Number.isFinite(v) && v > 0) || !(p10 <= p50 && p50 <= p90)) continue;
    prefill[key] = { p10, p50, p90 };
    bases.add(range.basis);
  }
  if (bases.size === 0) return null;
  if (bases.size === 1) prefill.basis = [...bases][0] as 'pooled' | 'own';
  return estimatePrefillHref(prefill);
}

/** Cards of typical values, the distribution of the chosen one, and the action that opens an estimate. */
export default function TypicalValues({ overview, system, unitSlug, depth, fileStem }: TypicalValuesProps) {
  const [chosen, setChosen] = useState<ParameterKey>('cvNcM2PerYear');
  const byKey = new Map(overview.summaries.map((s) => [s.parameter, s]));
  const cards = CARD_PARAMETERS.map((key) => byKey.get(key)).filter((s) => s !== undefined);
  const selected = byKey.get(chosen);
  const link = unitSlug ? prefillLink(overview, unitSlug, depth) : null;
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="text-sm text-ink-700">
          {overview.basis.tests} tests in this selection. cv and Cα are split into the normally consolidated (NC) and
          overconsolidated (OC) range.
        </p>
        {link ? (
          <a className="btn-primary" href={link} data-testid="use-in-estimate">
            Use these ranges in an estimate
          </a>
        ) : (
          <span className="text-xs text-ink-500">
            {unitSlug ? 'No ranges to send yet.' : 'Choose one geological unit to send its ranges to an estimate.'}
          </span>
        )}
      </div>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4" data-testid="value-cards">
        {cards.map((summary) => (
          <ValueCard
            key={summary.parameter}
            summary={summary}
            system={system}
            selected={summary.parameter === chosen}
            onSelect={() => setChosen(summary.parameter)}
          />
        ))}
      </div>
      {selected && <DistributionChart summary={selected} system={system} fileStem={fileStem} />}
    </div>
  );
}
