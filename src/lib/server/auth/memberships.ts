import type { Kysely } from 'kysely';
import { type FirmRole, isFirmRole } from '../../permissions/roles';
import type { Database } from '../db/schema';

export interface Membership {
  memberId: string;
  firmId: string;
  firmName: string;
  firmSlug: string;
  role: FirmRole;
}

/** The firms a person belongs to, oldest membership first. */
export async function membershipsOf(db: Kysely<Database>, userId: string): Promise<Membership[]> {
  const rows = await db
    .selectFrom('member')
    .innerJoin('organization', 'organization.id', 'member.organizationId')
    .select([
      'member.id as memberId',
      'organization.id as firmId',
      'organization.name as firmName',
      'organization.slug as firmSlug',
      'member.role',
    ])
    .where('member.userId', '=', userId)
    .orderBy('member.createdAt')
    .execute();
  return rows.flatMap((row) => (isFirmRole(row.role) ? [{ ...row, role: row.role }] : []));
}
