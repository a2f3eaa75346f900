import { type ExpressionBuilder, type SqlBool, sql, type Transaction } from 'kysely';
import type { BankSelection } from '../../schemas/bank-selection';
import type { Database } from '../db/schema';
import type { SelectionRow } from './columns-builder';

type Tables = Database & {
  r: Database['test_record'];
  u: Database['geological_unit'];
  g: Database['region'];
};
type Where = ExpressionBuilder<Tables, 'r' | 'u' | 'g'>;

/**
 * Rows the viewer's statistics may use: published records of every firm, and the viewer's own firm's
 * records still in play (waiting for review or returned); never another firm's unpublished ones.
 * Row-level security repeats the rule.
 */
function visibleTo(eb: Where, viewerFirmId: string | null) {
  const published = eb('r.status', '=', 'published');
  if (!viewerFirmId) return published;
  return eb.or([published, eb.and([eb('r.firm_id', '=', viewerFirmId), eb('r.status', 'in', ['pending', 'returned'])])]);
}

/** The selection's facets, depth and text as SQL; value ranges of masked parameters are left to the core. */
function matchesSelection(eb: Where, selection: BankSelection, viewerFirmId: string | null) {
  const parts: ReturnType<Where>[] = [visibleTo(eb, viewerFirmId) as ReturnType<Where>];
  if (selection.unit?.length) parts.push(eb('u.slug', 'in', selection.unit));
  if (selection.region?.length) parts.push(eb('g.slug', 'in', selection.region));
  if (selection.genesis?.length) parts.push(eb('u.genesis', 'in', selection.genesis));
  if (selection.uscs?.length) parts.push(eb('r.uscs_symbol', 'in', selection.uscs));
  if (selection.method?.length) parts.push(eb('r.test_method', 'in', selection.method));
  if (selection.version?.length) parts.push(eb('r.bank_version_id', 'in', selection.version));
  const origin = new Set(selection.origin ?? []);
  if (origin.size === 1) {
    if (origin.has('own')) parts.push(viewerFirmId ? eb('r.firm_id', '=', viewerFirmId) : eb.val(false));
    else if (viewerFirmId) parts.push(eb('r.firm_id', '<>', viewerFirmId));
  }
  if (selection.depth?.min !== undefined) parts.push(eb('r.depth_top_m', '>=', selection.depth.min));
  if (selection.depth?.max !== undefined) parts.push(eb('r.depth_top_m', '<=', selection.depth.max));
  const words = selection.q?.toLowerCase().split(/\s+/).filter(Boolean) ?? [];
  const haystack = sql<string>`lower(concat_ws(' ', u.name, g.name, r.uscs_symbol, r.test_standard, r.sampling_method))`;
  for (const word of words) parts.push(eb(sql<number>`position(${word} in ${haystack})`, '>', 0));
  return eb.and(parts);
}

/**
 * A stress level counts as normally consolidated when it ends at or above the test's σ'p, else as
 * overconsolidated; without σ'p the range the laboratory declared (the core's stressLevelRange).
 */
const NC_LEVEL = sql<SqlBool>`case when rs.preconsolidation_stress_kpa > 0 then s.stress_to_kpa >= rs.preconsolidation_stress_kpa else s.stress_range = 'NC' end`;
const OC_LEVEL = sql<SqlBool>`not (${NC_LEVEL})`;

/**
 * Streams every row of a selection with the values the statistics need, in SI units. Each row carries
 * its secret masking key, computed by PostgreSQL (pgcrypto) as the first 4 bytes of
 * HMAC-SHA-256(secret, id) — the same as recordKeyOf() — so that the app never hashes 100,000 ids.
 * cv and Cα per range come from the test's stress levels where it has them (geometric mean of cv,
 * mean of Cα per range, as splitByStressRange), else from the summary columns. The levels are
 * grouped per test once and joined by hash (a lateral subquery per row costs a second per 100,000).
 */
export function streamSelectionRows(
  trx: Transaction<Database>,
  selection: BankSelection,
  viewerFirmId: string | null,
  recordKeySecret: string,
  chunkSize = 4000,
): AsyncIterable<SelectionRow> {
  return trx
    .selectFrom('test_record as r')
    .innerJoin('geological_unit as u', 'u.id', 'r.geological_unit_id')
    .innerJoin('region as g', 'g.id', 'r.region_id')
    .leftJoin(
      (eb) =>
        eb
          .selectFrom('test_record_stress_level as s')
          .innerJoin('test_record as rs', 'rs.id', 's.test_record_id')
          .select([
            's.test_record_id as recordId',
            sql<number | null>`exp(avg(ln(s.cv_m2_per_year)) filter (where ${NC_LEVEL}))`.as('cvNc'),
            sql<number | null>`exp(avg(ln(s.cv_m2_per_year)) filter (where ${OC_LEVEL}))`.as('cvOc'),
            sql<number | null>`avg(s.secondary_compression_index) filter (where ${NC_LEVEL})`.as('caNc'),
            sql<number | null>`avg(s.secondary_compression_index) filter (where ${OC_LEVEL})`.as('caOc'),
          ])
          .groupBy('s.test_record_id')
          .as('lv'),
      (join) => join.on(sql<SqlBool>`lv."recordId" = r.id`),
    )
    .where((eb) => matchesSelection(eb as Where, selection, viewerFirmId))
    .select([
      'r.firm_id as firmId',
      sql<number>`('x' || encode(substr(hmac(r.id::text, ${recordKeySecret}::text, 'sha256'), 1, 4), 'hex'))::bit(32)::int4`.as(
        'recordKey',
      ),
      'r.depth_top_m as depthTopM',
      'r.depth_bottom_m as depthBottomM',
      'r.sample_quality_class as sampleQualityClass',
      'r.uscs_symbol as uscsSymbol',
      'r.water_content_pct as waterContentPct',
      'r.liquid_limit_pct as liquidLimitPct',
      'r.plastic_limit_pct as plasticLimitPct',
      'r.plasticity_index_pct as plasticityIndexPct',
      'r.specific_gravity as specificGravity',
      'r.bulk_unit_weight_kn_per_m3 as bulkUnitWeightKnPerM3',
      'r.initial_void_ratio as initialVoidRatio',
      'r.organic_content_pct as organicContentPct',
      'r.compression_index as compressionIndex',
      'r.recompression_index as recompressionIndex',
      'r.preconsolidation_stress_kpa as preconsolidationStressKpa',
      'r.vertical_effective_stress_kpa as verticalEffectiveStressKpa',
      'r.overconsolidation_ratio as overconsolidationRatio',
      sql<number | null>`coalesce(lv."cvNc", r.cv_nc_m2_per_year)`.as('cvNcM2PerYear'),
      sql<number | null>`coalesce(lv."cvOc", r.cv_oc_m2_per_year)`.as('cvOcM2PerYear'),
      'r.secondary_compression_index as secondaryCompressionIndex',
      sql<number | null>`coalesce(lv."caNc", r.secondary_compression_index)`.as('secondaryCompressionIndexNc'),
      sql<number | null>`lv."caOc"`.as('secondaryCompressionIndexOc'),
      'r.mv_m2_per_mn as mvM2PerMn',
      'r.permeability_m_per_s as permeabilityMPerS',
      'r.delta_e_over_e0 as deltaEOverE0',
    ])
    .stream(chunkSize) as AsyncIterable<SelectionRow>;
}

/** The newest bank version (null before the first publication): published figures change only with it. */
export async function findLatestBankVersion(trx: Transaction<Database>): Promise<number | null> {
  const row = await trx
    .selectFrom('bank_version')
    .select((eb) => eb.fn.max('id').as('bankVersion'))
    .executeTakeFirst();
  return row?.bankVersion ?? null;
}

/**
 * The number of a firm's records waiting for review or returned, and their latest change: they enter
 * its own figures before publication (published records change only with a new bank version).
 */
export async function findOwnRecordsState(trx: Transaction<Database>, firmId: string) {
  const row = await trx
    .selectFrom('test_record')
    .select((eb) => [eb.fn.countAll<number>().as('records'), eb.fn.max('updated_at').as('changedAt')])
    .where('firm_id', '=', firmId)
    .where('status', 'in', ['pending', 'returned'])
    .executeTakeFirstOrThrow();
  return { records: row.records, changedAt: row.changedAt ? new Date(row.changedAt).toISOString() : null };
}
