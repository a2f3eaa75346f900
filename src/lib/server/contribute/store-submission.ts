import { randomUUID } from 'node:crypto';
import type { Transaction } from 'kysely';
import type { StoredSubmission, SubmissionSourceKind } from '../../contracts/submissions';
import type { AppServices } from '../app-services';
import type { Database } from '../db/schema';
import { uuidV7 } from '../db/uuid-v7';
import { ConflictError, UnprocessableError } from '../errors';
import { enqueueMail } from '../mail/outbox';
import { insertIncrements, insertPrivateRecords, insertSharedRecords } from '../records/record-store-repository';
import { findLiveSubmissionOfFile, insertSubmission, insertSubmissionFile } from '../submissions/submission-repository';
import { transitionSubmission } from '../submissions/transition';
import { firmScope } from '../tenancy/scope';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import type { Contributor } from './contributor';
import { stewardsNewSubmissionMails } from './notifications';
import type { RecordToStore } from './record-to-store';

export type { Contributor } from './contributor';

export interface SourceFile {
  kind: SubmissionSourceKind;
  name: string | null;
  mediaType: string;
  bytes: Uint8Array;
  sha256: string;
}

/** 409 when the firm has a live submission (not withdrawn or rejected) of the same file. */
export async function refuseSameFile(trx: Transaction<Database>, firmId: string, sha256: string): Promise<void> {
  const earlier = await findLiveSubmissionOfFile(trx, firmId, sha256);
  if (earlier) {
    throw new ConflictError(
      `This file was already uploaded as submission ${earlier.id} (${earlier.status}); nothing was stored again.`,
    );
  }
}

/** The submission (as a draft, until the transition below) and its original file in firm-private storage. */
async function insertSubmissionAndFile(
  trx: Transaction<Database>,
  submissionId: string,
  contributor: Contributor,
  source: SourceFile,
  rowCount: number,
): Promise<void> {
  await insertSubmission(trx, {
    id: submissionId,
    firm_id: contributor.firmId,
    submitted_by: contributor.userId,
    source_kind: source.kind,
    source_file_name: source.name,
    source_checksum_sha256: source.sha256,
    source_size_bytes: source.bytes.byteLength,
    status: 'draft',
    row_count: rowCount,
  });
  await insertSubmissionFile(trx, {
    submission_id: submissionId,
    firm_id: contributor.firmId,
    storage_name: `${submissionId}/${randomUUID()}`,
    original_name: source.name ?? 'upload',
    media_type: source.mediaType,
    size_bytes: source.bytes.byteLength,
    sha256: source.sha256,
    content: Buffer.from(source.bytes),
  });
}

/** Every record's shared and private part and raw readings; returns how many increments were stored. */
async function insertRecords(
  trx: Transaction<Database>,
  submissionId: string,
  firmId: string,
  records: readonly RecordToStore[],
): Promise<number> {
  const ids = records.map(() => uuidV7());
  await insertSharedRecords(trx, { submissionId, firmId }, records, ids);
  await insertPrivateRecords(trx, firmId, records, ids);
  const increments = records.flatMap((record, i) => {
    const recordId = ids[i];
    return recordId ? record.increments.map((inc) => ({ ...inc, recordId })) : [];
  });
  await insertIncrements(trx, increments);
  return increments.length;
}

/**
 * Stores an upload whole or not at all: the submission, its original file, every record with its
 * private details and raw readings, the history entry, the audit entry and the stewards' mail are
 * written in one transaction of the contributor's firm. Any failure (a constraint, the database
 * going away, the process dying) leaves nothing behind, and the same file uploaded again is not
 * stored twice.
 */
export async function storeSubmission(
  app: Pick<AppServices, 'db' | 'appUrl'>,
  contributor: Contributor,
  source: SourceFile,
  records: RecordToStore[],
): Promise<StoredSubmission> {
  if (records.length === 0) throw new UnprocessableError('The file has no test records to store.');
  return inTenantTransaction(app.db, firmScope(contributor.firmId), async (trx) => {
    await refuseSameFile(trx, contributor.firmId, source.sha256);
    const submissionId = randomUUID();
    await insertSubmissionAndFile(trx, submissionId, contributor, source, records.length);
    const incrementCount = await insertRecords(trx, submissionId, contributor.firmId, records);
    const flaggedRows = records.filter((record) => record.flags.length > 0).length;
    await transitionSubmission(trx, {
      submissionId,
      firmId: contributor.firmId,
      from: null,
      to: 'submitted',
      actor: contributor,
      action: 'submission.uploaded',
      set: { submitted_at: new Date() },
      summary: {
        via: contributor.via,
        apiKeyId: contributor.apiKeyId ?? null,
        file: source.name,
        sha256: source.sha256,
        rows: records.length,
        increments: incrementCount,
        flaggedRows,
      },
    });
    const mails = await stewardsNewSubmissionMails(trx, {
      submissionId,
      firmId: contributor.firmId,
      rowCount: records.length,
      flaggedRows,
      appUrl: app.appUrl,
      resubmitted: false,
    });
    await enqueueMail(trx, mails);
    return { id: submissionId, status: 'submitted', rowCount: records.length, incrementCount, flaggedRows };
  });
}
