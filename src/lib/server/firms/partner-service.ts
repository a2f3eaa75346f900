import type { PartnerIdentity } from '../../contracts/firms';
import { API_KEY_GRANTS, grantList } from '../../permissions/roles';
import type { AppServices } from '../app-services';
import type { FirmKeyCaller } from '../auth/firm-key';
import { NotFoundError } from '../errors';
import { firmScope } from '../tenancy/scope';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import { findFirm } from './firm-repository';

/** For partner scripts: the firm a key belongs to, and the grants of a firm key (roles.ts). */
export async function describeKeyCaller(app: Pick<AppServices, 'db'>, caller: FirmKeyCaller): Promise<PartnerIdentity> {
  const firm = await inTenantTransaction(app.db, firmScope(caller.firmId), (trx) => findFirm(trx, caller.firmId));
  if (!firm) throw new NotFoundError('The firm of this API key no longer exists.');
  return {
    firm: { id: firm.id, name: firm.name },
    key: { id: caller.keyId, name: caller.keyName },
    may: grantList(API_KEY_GRANTS),
  };
}
