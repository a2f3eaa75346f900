import { useEffect, useMemo, useState } from 'react';
import type { Json } from '../../lib/contracts/json';
import type { CorrelationAnswer, ProfileAnswer, StatisticsOverview } from '../../lib/contracts/statistics';
import { rangeSchema } from '../../lib/schemas/bank-selection';
import { CORRELATION_PAIR_IDS, CORRELATION_PAIRS, type CorrelationPairId } from '../../lib/statistics/correlation-pairs';
import type { DisplaySystem } from '../../lib/units/display';
import { axisOf } from './axis-display';
import Cautions from './Cautions';
import CompareSiteTest from './CompareSiteTest';
import CorrelationChart from './CorrelationChart';
import DepthProfiles from './DepthProfiles';
import MethodsNote from './MethodsNote';
import SelectionControls from './SelectionControls';
import TypicalValues from './TypicalValues';
import { useApi, useApiMany } from './use-api';
import { apiQuery, readViewState, TAB_LABELS, TABS, type Tab, type ViewState, writeViewState } from './view-state';

interface StatisticsViewProps {
  /** The page's query string when it was served. */
  initialSearch: string;
  /** On a Deposit page: the geological unit the page is about (not in its query string). */
  fixedUnit: string | null;
  system: DisplaySystem;
  /** Names of the geological units by slug, for legends. */
  unitNames: Record<string, string>;
  fileStem: string;
}

function depthOf(selection: URLSearchParams): { min?: number; max?: number } {
  const parsed = rangeSchema.safeParse(selection.get('depth') ?? '');
  return parsed.success ? parsed.data : {};
}

/** The unit switch in the header posts the page's address; keep it pointing at the view shown now. */
function keepReturnAddress(search: string) {
  for (const input of document.querySelectorAll<HTMLInputElement>(
    'form[action="/api/preferences/unit-system"] input[name="returnTo"]',
  )) {
    input.value = `${window.location.pathname}${search ? `?${search}` : ''}`;
  }
}

/** Statistics of one selection in four tabs: typical values, compare a site test, correlations, depth profiles. */
export default function StatisticsView({ initialSearch, fixedUnit, system, unitNames, fileStem }: StatisticsViewProps) {
  const [state, setState] = useState<ViewState>(() => readViewState(initialSearch));
  const update = (change: Partial<ViewState>) => setState((old) => ({ ...old, ...change }));
  useEffect(() => {
    const search = writeViewState(state);
    window.history.replaceState(null, '', `${window.location.pathname}${search ? `?${search}` : ''}`);
    keepReturnAddress(search);
  }, [state]);

  const withUnit = useMemo(() => {
    const selection = new URLSearchParams(state.selection);
    if (fixedUnit) {
      selection.delete('unit');
      selection.set('unit', fixedUnit);
    }
    return { ...state, selection };
  }, [state, fixedUnit]);
  const units = withUnit.selection.getAll('unit');
  const depth = depthOf(state.selection);
  const quality = state.selection.getAll('quality').map(Number);

  const overview = useApi<Json<StatisticsOverview>>(state.tab === 'typical' ? `/api/statistics?${apiQuery(withUnit)}` : null);
  const profile = useApi<Json<ProfileAnswer>>(
    state.tab === 'profiles' ? `/api/statistics/profile?${apiQuery(withUnit, { waterTableM: String(state.waterTableM) })}` : null,
  );
  const byUnit = state.colour === 'unit' && units.length > 1;
  const correlationUrls =
    state.tab !== 'correlations'
      ? []
      : byUnit
        ? units.map((unit) => {
            const selection = new URLSearchParams(withUnit.selection);
            selection.delete('unit');
            selection.set('unit', unit);
            return `/api/statistics/correlation?${apiQuery({ ...withUnit, selection }, { pair: state.pair })}`;
          })
        : [`/api/statistics/correlation?${apiQuery(withUnit, { pair: state.pair })}`];
  const correlations = useApiMany<Json<CorrelationAnswer>>(correlationUrls);

  const changeSelection = (change: {
    depth?: { min?: number; max?: number };
    quality?: number[];
    weighting?: 'equal' | 'byClass';
  }) => {
    const selection = new URLSearchParams(state.selection);
    if (change.depth) {
      selection.delete('depth');
      const { min, max } = change.depth;
      if (min !== undefined || max !== undefined)
        selection.set(
          'depth',
          `${min === undefined ? '' : Number(min.toPrecision(6))}..${max === undefined ? '' : Number(max.toPrecision(6))}`,
        );
    }
    if (change.quality) {
      selection.delete('quality');
      for (const q of change.quality) selection.append('quality', String(q));
    }
    update({ selection, ...(change.weighting ? { weighting: change.weighting } : {}) });
  };

  const loaded =
    state.tab === 'typical' ? overview : state.tab === 'profiles' ? profile : state.tab === 'correlations' ? correlations : null;
  const explained =
    overview.status === 'ready' && state.tab === 'typical'
      ? overview.data
      : profile.status === 'ready' && state.tab === 'profiles'
        ? profile.data
        : correlations.status === 'ready' && state.tab === 'correlations'
          ? correlations.data[0]
          : undefined;

  return (
    <div className="space-y-4" data-testid="statistics-view">
      <SelectionControls system={system} depth={depth} quality={quality} weighting={state.weighting} onChange={changeSelection} />
      <div role="tablist" aria-label="Views of the statistics" className="flex flex-wrap gap-1 border-b border-ink-200">
        {TABS.map((tab: Tab) => (
          <button
            key={tab}
            type="button"
            role="tab"
            aria-selected={state.tab === tab}
            className={`-mb-px rounded-t border px-3 py-1.5 text-sm ${state.tab === tab ? 'border-ink-200 border-b-white bg-white font-semibold text-ink-900' : 'border-transparent text-ink-600 hover:text-ink-900'}`}
            onClick={() => update({ tab })}
            data-testid={`tab-${tab}`}
          >
            {TAB_LABELS[tab]}
          </button>
        ))}
      </div>
      <div role="tabpanel" aria-label={TAB_LABELS[state.tab]}>
        {state.tab === 'correlations' && (
          <div className="mb-3 flex flex-wrap items-end gap-3 text-sm">
            <label className="flex flex-col text-xs text-ink-600">
              Pair
              <select
                className="rounded border border-ink-200 px-2 py-1 text-sm"
                value={state.pair}
                onChange={(e) => update({ pair: e.target.value as CorrelationPairId })}
                data-testid="pair"
              >
                {CORRELATION_PAIR_IDS.map((id) => (
                  <option key={id} value={id}>
                    {axisOf(CORRELATION_PAIRS[id].y, system).symbol} – {axisOf(CORRELATION_PAIRS[id].x, system).symbol}
                  </option>
                ))}
              </select>
            </label>
            <label className="flex flex-col text-xs text-ink-600">
              Colour
              <select
                className="rounded border border-ink-200 px-2 py-1 text-sm"
                value={state.colour}
                onChange={(e) => update({ colour: e.target.value as 'origin' | 'unit' })}
              >
                <option value="origin">your firm against the pool</option>
                <option value="unit" disabled={units.length < 2}>
                  by geological unit{units.length < 2 ? ' (choose two or more units)' : ''}
                </option>
              </select>
            </label>
          </div>
        )}
        {loaded?.status === 'loading' && <p className="text-sm text-ink-500">Computing the statistics…</p>}
        {loaded?.status === 'failed' && (
          <p className="text-sm text-fault-700" role="alert">
            {loaded.message}
          </p>
        )}
        {state.tab === 'typical' && overview.status === 'ready' && (
          <TypicalValues
            overview={overview.data}
            system={system}
            unitSlug={units.length === 1 ? (units[0] as string) : null}
            depth={Object.keys(depth).length ? depth : undefined}
            fileStem={fileStem}
          />
        )}
        {state.tab === 'compare' && <CompareSiteTest query={apiQuery(withUnit)} system={system} />}
        {state.tab === 'correlations' && correlations.status === 'ready' && (
          <CorrelationChart
            answers={correlations.data.map((answer, i) => ({
              label: byUnit ? (unitNames[units[i] as string] ?? (units[i] as string)) : 'selection',
              answer,
            }))}
            colour={byUnit ? 'unit' : 'origin'}
            system={system}
            fileStem={fileStem}
          />
        )}
        {state.tab === 'profiles' && profile.status === 'ready' && (
          <DepthProfiles
            answer={profile.data}
            system={system}
            fileStem={fileStem}
            waterTableM={state.waterTableM}
            onWaterTable={(waterTableM) => update({ waterTableM })}
          />
        )}
      </div>
      {explained && (
        <>
          <Cautions cautions={explained.cautions} />
          <MethodsNote methods={explained.methods} basis={explained.basis} />
        </>
      )}
    </div>
  );
}
