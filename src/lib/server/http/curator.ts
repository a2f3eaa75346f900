import type { ResolvedIdentity } from '../auth/resolve-actor';

/** Who is acting, for services that write the audit log. */
export function actingPerson(identity: ResolvedIdentity, clientAddress: string) {
  return { userId: identity.user.id, firmId: identity.actor.firmId, ipAddress: clientAddress };
}
