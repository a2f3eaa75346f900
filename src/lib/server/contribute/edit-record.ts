import type { Transaction } from 'kysely';
import type { CorrectedRecord } from '../../contracts/submissions';
import { type RawValue, type ValidRow, validateRows } from '../../import';
import type { AppServices } from '../app-services';
import { auditedBy } from '../audit/audit-log';
import { insertAuditEntry } from '../audit/audit-repository';
import type { Database } from '../db/schema';
import { InvalidInputError, InvalidStateError, NotFoundError } from '../errors';
import { findStoredRecord, updatePrivateValues, updateSharedValues } from '../records/record-correction-repository';
import { lockSubmission } from '../submissions/submission-repository';
import { firmScope } from '../tenancy/scope';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import { importVocabulary } from '../vocabulary/vocabulary-service';
import type { Contributor } from './contributor';
import { EDITABLE_FIELDS, FIELD_COLUMNS, type FieldKey } from './editable-fields';
import { firmRecordKeys } from './firm-record-keys';
import { toRecordToStore } from './to-record';

type Values = Record<string, RawValue>;
type StoredRecord = NonNullable<Awaited<ReturnType<typeof findStoredRecord>>>;

/** The submission must be the firm's and returned; the record must be one of its records. */
async function returnedRecord(trx: Transaction<Database>, firmId: string, submissionId: string, recordId: string) {
  const submission = await lockSubmission(trx, submissionId, firmId);
  if (!submission) throw new NotFoundError('Your firm has no submission with that id.');
  if (submission.status !== 'returned') {
    throw new InvalidStateError(`Records can be corrected only while the submission is returned; it is ${submission.status}.`);
  }
  const stored = await findStoredRecord(trx, submissionId, recordId);
  if (!stored) throw new NotFoundError('There is no such record in this submission.');
  return stored;
}

/** The record's values as an upload row would carry them (import field keys, region and unit by name). */
function valuesOf(stored: StoredRecord): Values {
  const values: Values = { region: stored.regionName, geologicalUnit: stored.unitName };
  for (const [field, { column }] of Object.entries(FIELD_COLUMNS)) values[field] = stored[column] as RawValue;
  return values;
}

/** Checks the corrected row exactly as an upload row is checked; 400 with one issue per field otherwise. */
function checkCorrected(row: number, values: Values, context: Parameters<typeof validateRows>[1]): ValidRow {
  const { valid, errors } = validateRows([{ row, values }], context);
  const checked = valid[0];
  if (errors.length > 0 || !checked) {
    throw new InvalidInputError(
      'The corrected record does not pass the checks; see issues.',
      errors.map((e) => ({ path: e.field ? `values.${e.field}` : 'values', message: e.message })),
    );
  }
  return checked;
}

/** The shared values that changed, before and after (private values stay out of the audit log). */
function sharedChanges(changed: readonly string[], before: Values, after: Values) {
  const shared = changed.filter((key) => FIELD_COLUMNS[key as FieldKey]?.table === 'r');
  return {
    before: Object.fromEntries(shared.map((key) => [key, before[key]])),
    after: Object.fromEntries(shared.map((key) => [key, after[key]])),
  };
}

/**
 * Corrects one record of a returned submission: the stored values, overridden by the person's, are
 * checked exactly as an upload row is (ranges, vocabulary, derived values, duplicates with the firm's
 * other tests) and written back to the shared and private tables together.
 */
export async function editReturnedRecord(
  app: Pick<AppServices, 'db'>,
  contributor: Contributor,
  submissionId: string,
  recordId: string,
  changes: Readonly<Values>,
): Promise<CorrectedRecord> {
  const vocabulary = await importVocabulary(app);
  return inTenantTransaction(app.db, firmScope(contributor.firmId), async (trx) => {
    const stored = await returnedRecord(trx, contributor.firmId, submissionId, recordId);
    const before = valuesOf(stored);
    const after = { ...before, ...changes };
    const existingKeys = await firmRecordKeys(trx, contributor.firmId, recordId);
    const record = toRecordToStore(checkCorrected(stored.row_number ?? 1, after, { ...vocabulary, existingKeys }));
    await updateSharedValues(trx, recordId, record.shared, record.flags);
    await updatePrivateValues(trx, recordId, record.private);
    const changed = Object.keys(changes).filter((key) => before[key] !== after[key]);
    await insertAuditEntry(trx, {
      ...auditedBy(contributor),
      action: 'record.corrected',
      objectType: 'test_record',
      objectId: recordId,
      summary: { submissionId, fields: changed, ...sharedChanges(changed, before, after) },
    });
    const values = Object.fromEntries(EDITABLE_FIELDS.map((key) => [key, after[key] ?? null]));
    return { record: { id: recordId, rowNumber: stored.row_number, values } };
  });
}
