import type { ExpressionBuilder, Transaction } from 'kysely';
import { jsonArrayFrom } from 'kysely/helpers/postgres';
import type { Database } from '../db/schema';

type UserScope = ExpressionBuilder<Database, 'user'>;

/** Name or e-mail contains the search text (case-insensitive); everyone when there is none. */
function matching(q: string | undefined) {
  return (eb: UserScope) => {
    if (!q) return eb.lit(true);
    const pattern = `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    return eb.or([eb('user.name', 'ilike', pattern), eb('user.email', 'ilike', pattern)]);
  };
}

const firmsOf = (eb: UserScope) =>
  jsonArrayFrom(
    eb
      .selectFrom('member')
      .innerJoin('organization', 'organization.id', 'member.organizationId')
      .select(['organization.id as firmId', 'organization.name as firmName', 'member.role'])
      .whereRef('member.userId', '=', 'user.id')
      .orderBy('organization.name'),
  ).as('firms');

const PERSON_COLUMNS = [
  'user.id',
  'user.name',
  'user.email',
  'user.role',
  'user.emailVerified',
  'user.banned',
  'user.banReason',
  'user.createdAt',
] as const;

/** People whose name or address matches, by name, with their firms. */
export async function listPeopleRows(trx: Transaction<Database>, query: { q?: string; limit: number; offset: number }) {
  return trx
    .selectFrom('user')
    .select(PERSON_COLUMNS)
    .select(firmsOf)
    .where(matching(query.q))
    .orderBy('user.name')
    .orderBy('user.id')
    .limit(query.limit)
    .offset(query.offset)
    .execute();
}

export async function countPeople(trx: Transaction<Database>, q: string | undefined): Promise<number> {
  const row = await trx
    .selectFrom('user')
    .select((eb) => eb.fn.countAll<number>().as('n'))
    .where(matching(q))
    .executeTakeFirstOrThrow();
  return Number(row.n);
}

export async function findPersonRow(trx: Transaction<Database>, userId: string) {
  return trx.selectFrom('user').select(PERSON_COLUMNS).select(firmsOf).where('user.id', '=', userId).executeTakeFirst();
}
