import { type FirmRole, isFirmRole } from '../../permissions/roles';
import type { AppServices } from '../app-services';
import type { ResolvedIdentity } from '../auth/resolve-actor';
import { inTenantTransaction, NO_TENANT } from '../tenancy/tenant-transaction';
import { openInvitationsFor } from './firm-repository';

export interface WaitingInvitation {
  id: string;
  firmName: string;
  role: FirmRole;
  expiresAt: Date;
}

/** Invitations waiting for the signed-in person's (confirmed) address, for their start page. */
export async function waitingInvitations(app: Pick<AppServices, 'db'>, identity: ResolvedIdentity): Promise<WaitingInvitation[]> {
  const rows = await inTenantTransaction(app.db, NO_TENANT, (trx) => openInvitationsFor(trx, identity.user.email));
  return rows.flatMap((row) => (isFirmRole(row.role) ? [{ ...row, role: row.role }] : []));
}
