/**
 * What the statistics view shows, kept in the page's URL so a link (or the unit switch, which reloads
 * the page) brings back the same view: the bank selection's parameters, plus the tab, the correlation
 * pair, the colouring, the quality weighting and the water table of the σ'v0 line.
 */
import { splitSelectionParams } from '../../lib/schemas/bank-selection';
import { CORRELATION_PAIR_IDS, type CorrelationPairId } from '../../lib/statistics/correlation-pairs';

export const TABS = ['typical', 'compare', 'correlations', 'profiles'] as const;
export type Tab = (typeof TABS)[number];
export const TAB_LABELS: Record<Tab, string> = {
  typical: 'Typical values',
  compare: 'Compare a site test',
  correlations: 'Correlations',
  profiles: 'Depth profiles',
};

export interface ViewState {
  /** The selection's own parameters (unit, depth, quality, ranges…), as in the bank browser's links. */
  selection: URLSearchParams;
  tab: Tab;
  pair: CorrelationPairId;
  colour: 'origin' | 'unit';
  weighting: 'equal' | 'byClass';
  waterTableM: number;
}

export function readViewState(search: string): ViewState {
  const { selection, rest } = splitSelectionParams(new URLSearchParams(search));
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(selection)) {
    for (const item of Array.isArray(value) ? value : [value]) params.append(key, String(item));
  }
  const tab = rest.get('tab');
  const pair = rest.get('pair');
  const water = Number(rest.get('waterTableM'));
  return {
    selection: params,
    tab: (TABS as readonly string[]).includes(tab ?? '') ? (tab as Tab) : 'typical',
    pair: (CORRELATION_PAIR_IDS as readonly string[]).includes(pair ?? '') ? (pair as CorrelationPairId) : 'cc-ll',
    colour: rest.get('colour') === 'unit' ? 'unit' : 'origin',
    weighting: rest.get('weighting') === 'byClass' ? 'byClass' : 'equal',
    waterTableM: rest.has('waterTableM') && Number.isFinite(water) && water >= 0 && water <= 100 ? water : 1,
  };
}

/** The page's query string for a view (defaults left out). */
export function writeViewState(state: ViewState): string {
  const params = new URLSearchParams(state.selection);
  if (state.tab !== 'typical') params.set('tab', state.tab);
  if (state.pair !== 'cc-ll') params.set('pair', state.pair);
  if (state.colour !== 'origin') params.set('colour', state.colour);
  if (state.weighting !== 'equal') params.set('weighting', state.weighting);
  if (state.waterTableM !== 1) params.set('waterTableM', String(state.waterTableM));
  return params.toString();
}

/** The API query for a view: the selection (plus a fixed unit, on a Deposit page) and the options the API takes. */
export function apiQuery(state: ViewState, extra: Record<string, string> = {}): string {
  const params = new URLSearchParams(state.selection);
  if (state.weighting !== 'equal') params.set('weighting', state.weighting);
  for (const [key, value] of Object.entries(extra)) params.set(key, value);
  return params.toString();
}
