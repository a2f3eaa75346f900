import { randomUUID } from 'node:crypto';
import type { Kysely, Transaction } from 'kysely';
import { recordAudit } from '../audit/audit-log';
import type { SubmissionSourceKind } from '../db/bank-tables';
import { bulkInsert } from '../db/bulk-insert';
import type { Database } from '../db/schema';
import { uuidV7 } from '../db/uuid-v7';
import { ApiError } from '../http/api-error';
import { enqueueMail } from '../mail/outbox';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import { stewardsNewSubmissionMails } from './notifications';
import { PRIVATE_COLUMNS, type RecordToStore, SHARED_COLUMNS } from './record-to-store';

export interface Contributor {
  /** null when a firm API key submitted */
  userId: string | null;
  firmId: string;
  ipAddress: string | null;
  /** 'api' when a firm API key submitted, for the audit log */
  via: 'browser' | 'api' | 'seed';
  apiKeyId?: string | null;
}

export interface SourceFile {
  kind: SubmissionSourceKind;
  name: string | null;
  mediaType: string;
  bytes: Uint8Array;
  sha256: string;
}

export interface StoredSubmission {
  id: string;
  status: 'submitted';
  rowCount: number;
  incrementCount: number;
  flaggedRows: number;
}

/** A submission of this firm with the same file that is still alive (not withdrawn or rejected). */
async function sameFileSubmission(trx: Transaction<Database>, firmId: string, sha256: string) {
  return trx
    .selectFrom('submission')
    .select(['id', 'status'])
    .where('firm_id', '=', firmId)
    .where('source_checksum_sha256', '=', sha256)
    .where('status', 'not in', ['withdrawn', 'rejected'])
    .executeTakeFirst();
}

/**
 * Stores an upload whole or not at all: the submission, its original file, every record with its
 * private details and raw readings, the history entry, the audit entry and the stewards' mail are
 * written in one transaction of the contributor's firm. Any failure (a constraint, the database
 * going away, the process dying) leaves nothing behind, and the same file uploaded again is not
 * stored twice.
 */
export async function storeSubmission(
  db: Kysely<Database>,
  contributor: Contributor,
  source: SourceFile,
  records: RecordToStore[],
  appUrl: string,
): Promise<StoredSubmission> {
  if (records.length === 0) throw new ApiError('UNPROCESSABLE', 'The file has no test records to store.');
  return inTenantTransaction(db, { firmId: contributor.firmId, platformRole: 'user' }, async (trx) => {
    const earlier = await sameFileSubmission(trx, contributor.firmId, source.sha256);
    if (earlier) {
      throw new ApiError(
        'CONFLICT',
        `This file was already uploaded as submission ${earlier.id} (${earlier.status}); nothing was stored again.`,
      );
    }
    const submissionId = randomUUID();
    const now = new Date();
    await trx
      .insertInto('submission')
      .values({
        id: submissionId,
        firm_id: contributor.firmId,
        submitted_by: contributor.userId,
        source_kind: source.kind,
        source_file_name: source.name,
        source_checksum_sha256: source.sha256,
        source_size_bytes: source.bytes.byteLength,
        status: 'submitted',
        row_count: records.length,
        submitted_at: now,
      })
      .execute();
    await trx
      .insertInto('submission_file')
      .values({
        submission_id: submissionId,
        firm_id: contributor.firmId,
        storage_name: `${submissionId}/${randomUUID()}`,
        original_name: source.name ?? 'upload',
        media_type: source.mediaType,
        size_bytes: source.bytes.byteLength,
        sha256: source.sha256,
        content: Buffer.from(source.bytes),
      })
      .execute();

    const ids = records.map(() => uuidV7());
    await bulkInsert(
      trx,
      'test_record',
      [
        { name: 'id', type: 'uuid' },
        { name: 'submission_id', type: 'uuid' },
        { name: 'firm_id', type: 'text' },
        { name: 'row_number', type: 'integer' },
        { name: 'import_flags', type: 'jsonb' },
        ...SHARED_COLUMNS,
      ],
      records.map((record, i) => [
        ids[i],
        submissionId,
        contributor.firmId,
        record.rowNumber,
        JSON.stringify(record.flags),
        ...SHARED_COLUMNS.map((column) => record.shared[column.name]),
      ]),
    );
    await bulkInsert(
      trx,
      'test_record_private',
      [{ name: 'test_record_id', type: 'uuid' }, { name: 'firm_id', type: 'text' }, ...PRIVATE_COLUMNS],
      records.map((record, i) => [ids[i], contributor.firmId, ...PRIVATE_COLUMNS.map((column) => record.private[column.name])]),
    );
    const increments = records.flatMap((record, i) =>
      record.increments.map((inc) => [
        ids[i],
        inc.incrementNo,
        inc.appliedStressKpa,
        inc.isUnloading,
        inc.durationHours,
        inc.endDeformationMm,
        inc.endVoidRatio,
        inc.specimenHeightMm,
      ]),
    );
    await bulkInsert(
      trx,
      'oedometer_increment',
      [
        { name: 'test_record_id', type: 'uuid' },
        { name: 'increment_no', type: 'integer' },
        { name: 'applied_stress_kpa', type: 'numeric' },
        { name: 'is_unloading', type: 'boolean' },
        { name: 'duration_hours', type: 'numeric' },
        { name: 'end_deformation_mm', type: 'numeric' },
        { name: 'end_void_ratio', type: 'numeric' },
        { name: 'specimen_height_mm', type: 'numeric' },
      ],
      increments,
    );
    await trx
      .insertInto('submission_event')
      .values({
        submission_id: submissionId,
        actor_user_id: contributor.userId,
        from_status: null,
        to_status: 'submitted',
        comment: null,
      })
      .execute();
    const flaggedRows = records.filter((record) => record.flags.length > 0).length;
    await recordAudit(trx, {
      actorUserId: contributor.userId,
      firmId: contributor.firmId,
      action: 'submission.uploaded',
      objectType: 'submission',
      objectId: submissionId,
      summary: {
        via: contributor.via,
        apiKeyId: contributor.apiKeyId ?? null,
        file: source.name,
        sha256: source.sha256,
        rows: records.length,
        increments: increments.length,
        flaggedRows,
      },
      ipAddress: contributor.ipAddress,
    });
    await enqueueMail(
      trx,
      await stewardsNewSubmissionMails(trx, {
        submissionId,
        firmId: contributor.firmId,
        rowCount: records.length,
        flaggedRows,
        appUrl,
        resubmitted: false,
      }),
    );
    return { id: submissionId, status: 'submitted', rowCount: records.length, incrementCount: increments.length, flaggedRows };
  });
}
