import type { SubmissionList } from '../../contracts/submissions';
import { hasPermission } from '../../permissions/roles';
import type { AppServices } from '../app-services';
import type { ResolvedIdentity } from '../auth/resolve-actor';
import { scopeOf } from '../tenancy/scope';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import { listSubmissionSummaries } from './submission-repository';

const LIST_LIMIT = 500;

/** Stewards see every submission past draft (and their own firm's); everyone else their active firm's own. */
export async function listSubmissions(app: Pick<AppServices, 'db'>, identity: ResolvedIdentity): Promise<SubmissionList> {
  const filter = { firmId: identity.actor.firmId, pastDraft: hasPermission(identity.actor, 'submission', 'review') };
  const submissions = await inTenantTransaction(app.db, scopeOf(identity), (trx) =>
    listSubmissionSummaries(trx, filter, LIST_LIMIT),
  );
  return { submissions };
}
