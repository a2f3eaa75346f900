import type { RecordDetail, RecordList } from '../../contracts/records';
import { hasPermission } from '../../permissions/roles';
import type { AppServices } from '../app-services';
import type { ResolvedIdentity } from '../auth/resolve-actor';
import { NotFoundError } from '../errors';
import { scopeOf } from '../tenancy/scope';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import {
  countVisibleRecords,
  findPrivateRecord,
  findSharedRecord,
  listVisibleRecords,
  stressLevelsOf,
} from './record-repository';

export interface RecordPage {
  limit: number;
  offset: number;
}

/**
 * Published test records plus the caller's own firm's records (any status). Row-level security
 * repeats the same rule in the database.
 */
export async function listRecords(
  app: Pick<AppServices, 'db'>,
  identity: ResolvedIdentity,
  page: RecordPage,
): Promise<RecordList> {
  const firmId = identity.actor.firmId;
  return inTenantTransaction(app.db, scopeOf(identity), async (trx) => {
    const total = await countVisibleRecords(trx, firmId);
    const rows = await listVisibleRecords(trx, firmId, page);
    const records = rows.map(({ firmId: owner, ...record }) => ({ ...record, mine: owner === firmId }));
    return { total, limit: page.limit, offset: page.offset, records };
  });
}

/** One test record, with its stress levels; the private block only for the owning firm. 404 when not visible. */
export async function getRecord(
  app: Pick<AppServices, 'db'>,
  identity: ResolvedIdentity,
  recordId: string,
): Promise<RecordDetail> {
  const { firmId } = identity.actor;
  const stewardView = hasPermission(identity.actor, 'submission', 'review');
  return inTenantTransaction(app.db, scopeOf(identity), async (trx) => {
    const row = await findSharedRecord(trx, recordId);
    const mine = row !== undefined && firmId !== null && row.firmId === firmId;
    const visible = row !== undefined && (row.status === 'published' || mine || (stewardView && row.status === 'pending'));
    if (!row || !visible) throw new NotFoundError('There is no test record with that id that you can see.');
    const { firmId: _owner, ...record } = row;
    const stressLevels = await stressLevelsOf(trx, recordId);
    if (!(mine && hasPermission(identity.actor, 'record', 'read-private'))) return { record: { ...record, mine, stressLevels } };
    const privateDetails = (await findPrivateRecord(trx, recordId)) ?? null;
    return { record: { ...record, mine, stressLevels }, private: privateDetails };
  });
}
