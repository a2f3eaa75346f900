import type { BankVersionList } from '../../contracts/versions';
import type { AppServices } from '../app-services';
import { inTenantTransaction, NO_TENANT } from '../tenancy/tenant-transaction';
import { countBankVersions, listBankVersions } from './version-repository';

/** The bank's published versions, newest first (published records are public, so no firm scope is needed). */
export async function bankVersions(
  app: Pick<AppServices, 'db'>,
  page: { limit: number; offset: number },
): Promise<BankVersionList> {
  return inTenantTransaction(app.db, NO_TENANT, async (trx) => ({
    versions: await listBankVersions(trx, page),
    total: await countBankVersions(trx),
  }));
}
