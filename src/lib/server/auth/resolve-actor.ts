import type { Kysely } from 'kysely';
import { type Actor, isPlatformRole } from '../../permissions/roles';
import type { Database } from '../db/schema';
import { type Membership, membershipsOf } from './memberships';

export interface SignedInPerson {
  id: string;
  name: string;
  email: string;
}

export interface ResolvedIdentity {
  user: SignedInPerson;
  actor: Actor;
  memberships: Membership[];
  activeFirm: Membership | null;
}

/**
 * Turns a session into the facts permission checks need. The active firm is the session's (if the
 * person is still a member of it); nothing here comes from the request body or URL.
 */
export async function resolveIdentity(
  db: Kysely<Database>,
  session: {
    user: { id: string; name: string; email: string; role?: string | null };
    session: { activeOrganizationId?: string | null };
  },
): Promise<ResolvedIdentity> {
  const memberships = await membershipsOf(db, session.user.id);
  // The session's firm while the person still belongs to it; otherwise their first firm (e.g. after
  // leaving the active one), so a member is never left without a firm.
  const activeFirm = memberships.find((m) => m.firmId === session.session.activeOrganizationId) ?? memberships[0] ?? null;
  const platformRole = isPlatformRole(session.user.role) ? session.user.role : 'user';
  return {
    user: { id: session.user.id, name: session.user.name, email: session.user.email },
    actor: { userId: session.user.id, platformRole, firmId: activeFirm?.firmId ?? null, firmRole: activeFirm?.role ?? null },
    memberships,
    activeFirm,
  };
}
