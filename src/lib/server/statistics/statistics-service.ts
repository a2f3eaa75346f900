/**
 * Statistics of a bank selection for one viewer: reads the disclosure rule and the bank's state,
 * answers from the cache when nothing has changed, else streams the selection's rows into columns in
 * the viewer's tenant transaction and hands them to the worker pool. Answers are JSON text typed by
 * src/lib/contracts/statistics.ts.
 */
import { type BankSelection, selectionToSearchParams } from '../../schemas/bank-selection';
import type { CompareBody, QualityWeighting } from '../../schemas/statistics-request';
import { type CorrelationPairId, statisticsCacheKey } from '../../statistics';
import type { AppServices } from '../app-services';
import type { ResolvedIdentity } from '../auth/resolve-actor';
import { readDisclosureRule } from '../settings/settings-service';
import { scopeOf } from '../tenancy/scope';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import { ColumnsBuilder } from './columns-builder';
import { qualityOf, valueRangesOf } from './selection-options';
import type { StatisticsRuntime } from './statistics-pool';
import { findLatestBankVersion, findOwnRecordsState, streamSelectionRows } from './statistics-repository';
import type { StatisticsTaskKind } from './statistics-task';

/** The water table assumed for the σ'v0 line when none is given, m below ground. */
export const DEFAULT_WATER_TABLE_M = 1;

async function statisticsOf(
  app: Pick<AppServices, 'db'>,
  runtime: StatisticsRuntime,
  identity: ResolvedIdentity,
  selection: BankSelection,
  weighting: QualityWeighting,
  view: StatisticsTaskKind,
): Promise<string> {
  const viewerFirmId = identity.actor.firmId;
  const quality = qualityOf(selection, weighting);
  const canonical = selectionToSearchParams(selection).toString();
  const prepared = await inTenantTransaction(app.db, scopeOf(identity), async (trx) => {
    const rule = await readDisclosureRule(trx);
    const bankVersion = await findLatestBankVersion(trx);
    const own = viewerFirmId ? await findOwnRecordsState(trx, viewerFirmId) : null;
    const key = statisticsCacheKey({
      bankVersionId: bankVersion ?? 0,
      selection: { canonical },
      quality,
      rule,
      viewerFirmId,
      options: { view: JSON.stringify(view), ownRecords: own?.records, ownChangedAt: own?.changedAt },
    });
    const hit = runtime.cache.get(key);
    if (hit !== undefined) return { cached: true as const, json: hit };
    const builder = new ColumnsBuilder();
    for await (const row of streamSelectionRows(trx, selection, viewerFirmId, runtime.recordKeySecret)) builder.push(row);
    return { cached: false as const, key, rule, bankVersion, columns: builder.finish() };
  });
  if (prepared.cached) return prepared.json;
  const json = await runtime.run({
    ...view,
    columns: prepared.columns,
    viewerFirmId,
    rule: prepared.rule,
    quality,
    valueRanges: valueRangesOf(selection),
    basis: {
      selection: canonical,
      bankVersion: prepared.bankVersion,
      rule: prepared.rule,
      weighting,
      viewerHasFirm: viewerFirmId !== null,
    },
  });
  runtime.cache.set(prepared.key, json);
  return json;
}

/** Every parameter's figures, the six usual correlations and the published correlations' bias (StatisticsOverview). */
export function selectionOverview(
  app: Pick<AppServices, 'db'>,
  runtime: StatisticsRuntime,
  identity: ResolvedIdentity,
  selection: BankSelection,
  options: { weighting?: QualityWeighting },
): Promise<string> {
  return statisticsOf(app, runtime, identity, selection, options.weighting ?? 'equal', { kind: 'overview' });
}

/** One correlation chart with points, line, bands and published lines (CorrelationAnswer). */
export function selectionCorrelation(
  app: Pick<AppServices, 'db'>,
  runtime: StatisticsRuntime,
  identity: ResolvedIdentity,
  selection: BankSelection,
  options: { weighting?: QualityWeighting; pair: CorrelationPairId },
): Promise<string> {
  return statisticsOf(app, runtime, identity, selection, options.weighting ?? 'equal', {
    kind: 'correlation',
    pair: options.pair,
  });
}

/** Depth profiles with the σ'v0 line when unit weights are known (ProfileAnswer). */
export function selectionProfile(
  app: Pick<AppServices, 'db'>,
  runtime: StatisticsRuntime,
  identity: ResolvedIdentity,
  selection: BankSelection,
  options: { weighting?: QualityWeighting; waterTableM?: number },
): Promise<string> {
  const waterTableM = options.waterTableM ?? DEFAULT_WATER_TABLE_M;
  return statisticsOf(app, runtime, identity, selection, options.weighting ?? 'equal', { kind: 'profile', waterTableM });
}

/** Where each site value sits in the selection (CompareAnswer). */
export function compareSiteResults(
  app: Pick<AppServices, 'db'>,
  runtime: StatisticsRuntime,
  identity: ResolvedIdentity,
  selection: BankSelection,
  options: { weighting?: QualityWeighting },
  body: CompareBody,
): Promise<string> {
  const values = Object.fromEntries(Object.entries(body.values).filter(([, list]) => list?.length));
  return statisticsOf(app, runtime, identity, selection, options.weighting ?? 'equal', { kind: 'compare', values });
}
