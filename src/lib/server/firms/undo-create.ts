import type { Kysely } from 'kysely';
import type { Database } from '../db/schema';

/**
 * The sign-in library stores a firm, key or invitation on its own connection, so it cannot share a
 * transaction with the audit entry written after it. When that later step fails, these take the new
 * row back out, so a failed request leaves nothing behind.
 */
export async function withUndo<T>(laterStep: () => Promise<T>, undo: () => Promise<unknown>): Promise<T> {
  try {
    return await laterStep();
  } catch (error) {
    await undo().catch((undoError: unknown) => console.error('[undo] could not take back a half-made change:', undoError));
    throw error;
  }
}

/** Deletes a firm made moments ago (its owner membership goes with it) and restores the sessions' active firm. */
export async function discardNewFirm(db: Kysely<Database>, firmId: string, previousActiveFirmId: string | null) {
  await db.transaction().execute(async (trx) => {
    await trx
      .updateTable('session')
      .set({ activeOrganizationId: previousActiveFirmId })
      .where('activeOrganizationId', '=', firmId)
      .execute();
    await trx.deleteFrom('organization').where('id', '=', firmId).execute();
  });
}

export async function discardNewApiKey(db: Kysely<Database>, keyId: string) {
  await db.deleteFrom('apikey').where('id', '=', keyId).execute();
}

export async function discardNewInvitation(db: Kysely<Database>, invitationId: string) {
  await db.deleteFrom('invitation').where('id', '=', invitationId).execute();
}
