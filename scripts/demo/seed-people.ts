import type { AppContext } from '../../src/lib/server/build-context';
import { DEMO_FIRMS, DEMO_PASSWORD, DEMO_PEOPLE } from './people';

/** Creates the invented firms and people (idempotent: existing ones are kept). Returns firm ids by slug. */
export async function seedPeople(ctx: AppContext): Promise<Map<string, string>> {
  const { auth, database } = ctx;
  const db = database.db;
  const userIds = new Map<string, string>();
  for (const person of DEMO_PEOPLE) {
    const existing = await db.selectFrom('user').select('id').where('email', '=', person.email).executeTakeFirst();
    if (existing) {
      userIds.set(person.email, existing.id);
      continue;
    }
    const { user } = await auth.api.createUser({
      body: {
        email: person.email,
        password: DEMO_PASSWORD,
        name: person.name,
        role: person.platformRole,
        data: { emailVerified: true },
      },
    });
    userIds.set(person.email, user.id);
  }

  const firmIds = new Map<string, string>();
  for (const firm of DEMO_FIRMS) {
    const existing = await db.selectFrom('organization').select('id').where('slug', '=', firm.slug).executeTakeFirst();
    if (existing) {
      firmIds.set(firm.slug, existing.id);
      continue;
    }
    const owner = DEMO_PEOPLE.find((p) => p.memberships.some((m) => m.firm === firm.slug && m.role === 'owner'));
    const ownerId = owner && userIds.get(owner.email);
    if (!ownerId) throw new Error(`demo firm ${firm.slug} has no owner`);
    const created = await auth.api.createOrganization({ body: { name: firm.name, slug: firm.slug, userId: ownerId } });
    if (!created) throw new Error(`could not create demo firm ${firm.slug}`);
    firmIds.set(firm.slug, created.id);
  }

  for (const person of DEMO_PEOPLE) {
    const userId = userIds.get(person.email);
    for (const membership of person.memberships) {
      const firmId = firmIds.get(membership.firm);
      if (!userId || !firmId || membership.role === 'owner') continue;
      const exists = await db
        .selectFrom('member')
        .select('id')
        .where('userId', '=', userId)
        .where('organizationId', '=', firmId)
        .executeTakeFirst();
      if (!exists) await auth.api.addMember({ body: { userId, organizationId: firmId, role: membership.role } });
    }
  }
  return firmIds;
}
