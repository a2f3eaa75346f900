import type { ReviewDetail, ReviewRecord } from '../../contracts/review';
import { compareWithPool } from '../../statistics/pool-comparison';
import type { AppServices } from '../app-services';
import { NotFoundError } from '../errors';
import { sharedRecordsOf } from '../records/record-repository';
import { findSubmissionSummary, submissionHistory } from '../submissions/submission-repository';
import { STEWARD_SCOPE } from '../tenancy/scope';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import { COMPARED } from './compared-values';
import { incrementsOf, publishedPoolOf } from './review-repository';

type SharedRows = Awaited<ReturnType<typeof sharedRecordsOf>>;
type Pool = Awaited<ReturnType<typeof publishedPoolOf>>;
type Increments = Awaited<ReturnType<typeof incrementsOf>>;

/** Each record against the published records of its unit, with its outliers and raw readings. */
function compareRecords(records: SharedRows, pool: Pool, increments: Increments): ReviewRecord[] {
  return records.map(({ unitId, ...record }) => {
    const unitPool = pool.filter((p) => p.unitId === unitId);
    const comparison = Object.fromEntries(
      COMPARED.map((c) => [
        c.key,
        compareWithPool(
          unitPool.map((p) => p[c.column]).filter((x): x is number => x !== null),
          record[c.key],
          c.log,
        ),
      ]),
    );
    const outliers = COMPARED.filter((c) => comparison[c.key]?.outlier).map((c) => c.key);
    const own = increments.filter((i) => i.recordId === record.id).map(({ recordId: _r, ...i }) => i);
    return { ...record, comparison, outliers, increments: own };
  });
}

/**
 * A submission as the steward sees it: shared values only (never the firm's private details), each
 * record against the published records of its geological unit, import flags, raw readings and the
 * history.
 */
export async function reviewDetail(app: Pick<AppServices, 'db'>, submissionId: string): Promise<ReviewDetail> {
  return inTenantTransaction(app.db, STEWARD_SCOPE, async (trx) => {
    const submission = await findSubmissionSummary(trx, submissionId, { firmId: null, pastDraft: true });
    if (!submission) throw new NotFoundError('There is no such submission waiting for review.');
    const records = await sharedRecordsOf(trx, submissionId);
    const pool = await publishedPoolOf(trx, [...new Set(records.map((r) => r.unitId))]);
    const increments = await incrementsOf(
      trx,
      records.map((r) => r.id),
    );
    const history = await submissionHistory(trx, submissionId);
    return { submission, records: compareRecords(records, pool, increments), history };
  });
}
