import type { ReviewQueueList } from '../../contracts/review';
import type { AppServices } from '../app-services';
import { listWaitingForReview } from '../submissions/submission-repository';
import { STEWARD_SCOPE } from '../tenancy/scope';
import { inTenantTransaction } from '../tenancy/tenant-transaction';

/** Submissions waiting for a steward, oldest first, with record counts and how long they have waited. */
export async function reviewQueue(app: Pick<AppServices, 'db'>): Promise<ReviewQueueList> {
  const submissions = await inTenantTransaction(app.db, STEWARD_SCOPE, (trx) => listWaitingForReview(trx));
  const totals = { submissions: submissions.length, records: submissions.reduce((sum, row) => sum + row.rowCount, 0) };
  return { totals, submissions };
}
