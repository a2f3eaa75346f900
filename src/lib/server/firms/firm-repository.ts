import type { Transaction } from 'kysely';
import type { FirmApiKey, FirmInvitation, FirmMember } from '../../contracts/firms';
import { isFirmRole } from '../../permissions/roles';
import { FIRM_KEY_CONFIG } from '../auth/create-auth';
import type { Database } from '../db/schema';

export async function findFirm(trx: Transaction<Database>, firmId: string) {
  return trx.selectFrom('organization').select(['id', 'name', 'slug']).where('id', '=', firmId).executeTakeFirst();
}

export async function membersOfFirm(trx: Transaction<Database>, firmId: string): Promise<FirmMember[]> {
  const rows = await trx
    .selectFrom('member')
    .innerJoin('user', 'user.id', 'member.userId')
    .select([
      'member.id as memberId',
      'user.id as userId',
      'user.name',
      'user.email',
      'member.role',
      'member.createdAt as joinedAt',
    ])
    .where('member.organizationId', '=', firmId)
    .orderBy('member.createdAt')
    .execute();
  return rows.flatMap((row) => (isFirmRole(row.role) ? [{ ...row, role: row.role }] : []));
}

export async function pendingInvitationsOfFirm(trx: Transaction<Database>, firmId: string): Promise<FirmInvitation[]> {
  const rows = await trx
    .selectFrom('invitation')
    .select(['id', 'email', 'role', 'status', 'expiresAt'])
    .where('organizationId', '=', firmId)
    .where('status', '=', 'pending')
    .orderBy('createdAt', 'desc')
    .execute();
  return rows.flatMap((row) => (isFirmRole(row.role) ? [{ ...row, role: row.role }] : []));
}

export async function findMemberOfFirm(trx: Transaction<Database>, firmId: string, memberId: string) {
  return trx
    .selectFrom('member')
    .select(['id', 'userId', 'role'])
    .where('id', '=', memberId)
    .where('organizationId', '=', firmId)
    .executeTakeFirst();
}

export async function findInvitationOfFirm(trx: Transaction<Database>, firmId: string, invitationId: string) {
  return trx
    .selectFrom('invitation')
    .select(['id', 'status'])
    .where('id', '=', invitationId)
    .where('organizationId', '=', firmId)
    .executeTakeFirst();
}

/** An invitation with the name of the firm that sent it. */
export async function findInvitationWithFirm(trx: Transaction<Database>, invitationId: string) {
  return trx
    .selectFrom('invitation')
    .innerJoin('organization', 'organization.id', 'invitation.organizationId')
    .select([
      'invitation.id',
      'invitation.email',
      'invitation.role',
      'invitation.status',
      'invitation.expiresAt',
      'organization.name as firmName',
      'organization.id as firmId',
    ])
    .where('invitation.id', '=', invitationId)
    .executeTakeFirst();
}

/** The firm's API keys, without their secrets (only the first characters are kept). */
export async function listFirmApiKeys(trx: Transaction<Database>, firmId: string): Promise<FirmApiKey[]> {
  return trx
    .selectFrom('apikey')
    .select(['id', 'name', 'start', 'createdAt', 'lastRequest as lastUsedAt', 'enabled'])
    .where('configId', '=', FIRM_KEY_CONFIG)
    .where('referenceId', '=', firmId)
    .orderBy('createdAt', 'desc')
    .execute();
}

export async function findFirmApiKey(trx: Transaction<Database>, firmId: string, keyId: string) {
  return trx
    .selectFrom('apikey')
    .select(['id', 'name'])
    .where('id', '=', keyId)
    .where('configId', '=', FIRM_KEY_CONFIG)
    .where('referenceId', '=', firmId)
    .executeTakeFirst();
}

/** Points every session whose active firm is `firmId` back at `previousFirmId` (null: no active firm). */
export async function restoreActiveFirm(trx: Transaction<Database>, firmId: string, previousFirmId: string | null) {
  await trx
    .updateTable('session')
    .set({ activeOrganizationId: previousFirmId })
    .where('activeOrganizationId', '=', firmId)
    .execute();
}

/** Deletes a firm; its memberships go with it. Only for taking back a firm made moments ago. */
export async function deleteFirm(trx: Transaction<Database>, firmId: string) {
  await trx.deleteFrom('organization').where('id', '=', firmId).execute();
}

export async function deleteApiKey(trx: Transaction<Database>, keyId: string) {
  await trx.deleteFrom('apikey').where('id', '=', keyId).execute();
}

export async function deleteInvitation(trx: Transaction<Database>, invitationId: string) {
  await trx.deleteFrom('invitation').where('id', '=', invitationId).execute();
}
