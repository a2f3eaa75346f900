import type { Kysely } from 'kysely';
import { duplicateKey, type RawValue, validateRows } from '../../import';
import { recordAudit } from '../audit/audit-log';
import type { Database } from '../db/schema';
import { ApiError } from '../http/api-error';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import { loadVocabulary } from './prepare-upload';
import { PRIVATE_COLUMNS, SHARED_COLUMNS } from './record-to-store';
import type { Contributor } from './store-submission';
import { toRecordToStore } from './to-record';

/** Import field key → the stored column it lands in (see to-record.ts), for fields a person can edit. */
const FIELD_COLUMNS: Readonly<Record<string, { table: 'r' | 'p'; column: string }>> = {
  projectName: { table: 'p', column: 'project_name' },
  clientName: { table: 'p', column: 'client_name' },
  boreholeId: { table: 'p', column: 'borehole_id' },
  sampleId: { table: 'p', column: 'sample_id' },
  easting: { table: 'p', column: 'easting_m' },
  northing: { table: 'p', column: 'northing_m' },
  latitude: { table: 'p', column: 'latitude_deg' },
  longitude: { table: 'p', column: 'longitude_deg' },
  coordinateSystem: { table: 'p', column: 'coordinate_system' },
  notes: { table: 'p', column: 'notes' },
  locationCell: { table: 'r', column: 'location_cell' },
  depthTop: { table: 'r', column: 'depth_top_m' },
  depthBottom: { table: 'r', column: 'depth_bottom_m' },
  uscsSymbol: { table: 'r', column: 'uscs_symbol' },
  samplingMethod: { table: 'r', column: 'sampling_method' },
  waterContentPct: { table: 'r', column: 'water_content_pct' },
  liquidLimitPct: { table: 'r', column: 'liquid_limit_pct' },
  plasticLimitPct: { table: 'r', column: 'plastic_limit_pct' },
  plasticityIndexPct: { table: 'r', column: 'plasticity_index_pct' },
  specificGravity: { table: 'r', column: 'specific_gravity' },
  bulkUnitWeight: { table: 'r', column: 'bulk_unit_weight_kn_per_m3' },
  initialVoidRatio: { table: 'r', column: 'initial_void_ratio' },
  organicContentPct: { table: 'r', column: 'organic_content_pct' },
  testMethod: { table: 'r', column: 'test_method' },
  testStandard: { table: 'r', column: 'test_standard' },
  compressionIndex: { table: 'r', column: 'compression_index' },
  recompressionIndex: { table: 'r', column: 'recompression_index' },
  preconsolidationStress: { table: 'r', column: 'preconsolidation_stress_kpa' },
  verticalEffectiveStress: { table: 'r', column: 'vertical_effective_stress_kpa' },
  overconsolidationRatio: { table: 'r', column: 'overconsolidation_ratio' },
  cvNc: { table: 'r', column: 'cv_nc_m2_per_year' },
  cvOc: { table: 'r', column: 'cv_oc_m2_per_year' },
  secondaryCompressionIndex: { table: 'r', column: 'secondary_compression_index' },
  mv: { table: 'r', column: 'mv_m2_per_mn' },
  permeability: { table: 'r', column: 'permeability_m_per_s' },
  deltaEOverE0: { table: 'r', column: 'delta_e_over_e0' },
};

export const EDITABLE_FIELDS = Object.keys(FIELD_COLUMNS);

/**
 * Corrects one record of a returned submission: the stored values, overridden by the person's, are
 * checked exactly as an upload row is (ranges, vocabulary, derived values, duplicates with the firm's
 * other tests) and written back to the shared and private tables together.
 */
export async function editReturnedRecord(
  db: Kysely<Database>,
  contributor: Contributor,
  submissionId: string,
  recordId: string,
  changes: Readonly<Record<string, RawValue>>,
) {
  const vocabulary = await loadVocabulary(db);
  return inTenantTransaction(db, { firmId: contributor.firmId, platformRole: 'user' }, async (trx) => {
    const submission = await trx
      .selectFrom('submission')
      .select(['status'])
      .where('id', '=', submissionId)
      .where('firm_id', '=', contributor.firmId)
      .executeTakeFirst();
    if (!submission) throw new ApiError('NOT_FOUND', 'Your firm has no submission with that id.');
    if (submission.status !== 'returned')
      throw new ApiError(
        'CONFLICT',
        `Records can be corrected only while the submission is returned; it is ${submission.status}.`,
      );
    const stored = await trx
      .selectFrom('test_record as r')
      .innerJoin('test_record_private as p', 'p.test_record_id', 'r.id')
      .innerJoin('region', 'region.id', 'r.region_id')
      .innerJoin('geological_unit as unit', 'unit.id', 'r.geological_unit_id')
      .selectAll('r')
      .selectAll('p')
      .select(['region.name as regionName', 'unit.name as unitName'])
      .where('r.id', '=', recordId)
      .where('r.submission_id', '=', submissionId)
      .executeTakeFirst();
    if (!stored) throw new ApiError('NOT_FOUND', 'There is no such record in this submission.');

    const before: Record<string, RawValue> = { region: stored.regionName, geologicalUnit: stored.unitName };
    for (const [field, { column }] of Object.entries(FIELD_COLUMNS))
      before[field] = (stored as Record<string, unknown>)[column] as RawValue;
    const after = { ...before, ...changes };
    const others = await trx
      .selectFrom('test_record as r')
      .innerJoin('test_record_private as p', 'p.test_record_id', 'r.id')
      .select(['p.borehole_id', 'p.sample_id', 'r.depth_top_m', 'r.depth_bottom_m'])
      .where('r.firm_id', '=', contributor.firmId)
      .where('r.id', '!=', recordId)
      .where('r.status', 'not in', ['rejected', 'withdrawn'])
      .execute();
    const existingKeys = new Set(
      others.map((o) =>
        duplicateKey({
          boreholeId: o.borehole_id ?? '',
          sampleId: o.sample_id,
          depthTop: o.depth_top_m,
          depthBottom: o.depth_bottom_m,
        }),
      ),
    );
    const { valid, errors } = validateRows([{ row: stored.row_number ?? 1, values: after }], { ...vocabulary, existingKeys });
    const checked = valid[0];
    if (errors.length > 0 || !checked) {
      throw new ApiError(
        'VALIDATION_FAILED',
        'The corrected record does not pass the checks; see issues.',
        errors.map((e) => ({ path: e.field ? `values.${e.field}` : 'values', message: e.message })),
      );
    }
    const record = toRecordToStore(checked);
    const now = new Date();
    await trx
      .updateTable('test_record')
      .set({
        ...Object.fromEntries(SHARED_COLUMNS.map((c) => [c.name, record.shared[c.name]])),
        import_flags: JSON.stringify(record.flags),
        updated_at: now,
      })
      .where('id', '=', recordId)
      .execute();
    await trx
      .updateTable('test_record_private')
      .set({ ...Object.fromEntries(PRIVATE_COLUMNS.map((c) => [c.name, record.private[c.name]])), updated_at: now })
      .where('test_record_id', '=', recordId)
      .execute();
    const changed = Object.keys(changes).filter((key) => before[key] !== after[key]);
    await recordAudit(trx, {
      actorUserId: contributor.userId,
      firmId: contributor.firmId,
      action: 'record.corrected',
      objectType: 'test_record',
      objectId: recordId,
      summary: {
        submissionId,
        fields: changed,
        before: Object.fromEntries(changed.filter((k) => FIELD_COLUMNS[k]?.table === 'r').map((k) => [k, before[k]])),
        after: Object.fromEntries(changed.filter((k) => FIELD_COLUMNS[k]?.table === 'r').map((k) => [k, after[k]])),
      },
      ipAddress: contributor.ipAddress,
    });
    return {
      id: recordId,
      rowNumber: stored.row_number,
      values: Object.fromEntries(EDITABLE_FIELDS.map((k) => [k, after[k] ?? null])),
    };
  });
}
