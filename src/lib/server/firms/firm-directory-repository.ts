import type { ExpressionBuilder, Transaction } from 'kysely';
import { jsonArrayFrom } from 'kysely/helpers/postgres';
import type { FirmRole } from '../../permissions/roles';
import type { Database } from '../db/schema';

type FirmScope = ExpressionBuilder<Database, 'organization'>;

function named(q: string | undefined) {
  return (eb: FirmScope) => (q ? eb('organization.name', 'ilike', `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`) : eb.lit(true));
}

const membersOf = (eb: FirmScope) =>
  jsonArrayFrom(
    eb
      .selectFrom('member')
      .innerJoin('user', 'user.id', 'member.userId')
      .select(['member.id as memberId', 'user.id as userId', 'user.name', 'user.email', 'member.role'])
      .whereRef('member.organizationId', '=', 'organization.id')
      .orderBy('member.createdAt'),
  ).as('members');

const FIRM_COLUMNS = ['organization.id', 'organization.name', 'organization.createdAt'] as const;

/** Firms whose name matches, by name, each with its members. */
export async function listFirmRows(trx: Transaction<Database>, query: { q?: string; limit: number; offset: number }) {
  return trx
    .selectFrom('organization')
    .select(FIRM_COLUMNS)
    .select(membersOf)
    .where(named(query.q))
    .orderBy('organization.name')
    .orderBy('organization.id')
    .limit(query.limit)
    .offset(query.offset)
    .execute();
}

export async function countFirms(trx: Transaction<Database>, q: string | undefined): Promise<number> {
  const row = await trx
    .selectFrom('organization')
    .select((eb) => eb.fn.countAll<number>().as('n'))
    .where(named(q))
    .executeTakeFirstOrThrow();
  return Number(row.n);
}

export async function findFirmRow(trx: Transaction<Database>, firmId: string) {
  return trx
    .selectFrom('organization')
    .select(FIRM_COLUMNS)
    .select(membersOf)
    .where('organization.id', '=', firmId)
    .executeTakeFirst();
}

/** Locks the firm's member rows for a change of roles. */
export async function lockFirmMembers(trx: Transaction<Database>, firmId: string) {
  return trx.selectFrom('member').select(['id', 'userId', 'role']).where('organizationId', '=', firmId).forUpdate().execute();
}

/** Gives members of a firm a new firm role (better-auth reads the role from this row on every request). */
export async function setMemberRoles(trx: Transaction<Database>, firmId: string, memberIds: readonly string[], role: FirmRole) {
  if (memberIds.length === 0) return;
  await trx.updateTable('member').set({ role }).where('organizationId', '=', firmId).where('id', 'in', memberIds).execute();
}
