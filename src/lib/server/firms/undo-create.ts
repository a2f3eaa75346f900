import type { Transaction } from 'kysely';
import type { AppServices } from '../app-services';
import type { Database } from '../db/schema';
import { scopeOf } from '../tenancy/scope';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import type { FirmCaller } from './firm-caller';
import { deleteApiKey, deleteFirm, deleteInvitation, restoreActiveFirm } from './firm-repository';

/**
 * The sign-in library stores a firm, key or invitation on its own connection, so it cannot share a
 * transaction with the audit entry written after it. When that later step fails, these take the new
 * row back out, so a failed request leaves nothing behind; the later step's error is thrown on.
 */
export async function withUndo<T>(laterStep: () => Promise<T>, undo: () => Promise<unknown>): Promise<T> {
  try {
    return await laterStep();
  } catch (error) {
    await undo().catch((undoError: unknown) => console.error('[undo] could not take back a half-made change:', undoError));
    throw error;
  }
}

type UndoApp = Pick<AppServices, 'db'>;

function asCaller(app: UndoApp, caller: FirmCaller, fn: (trx: Transaction<Database>) => Promise<void>): Promise<void> {
  return inTenantTransaction(app.db, scopeOf(caller.identity), fn);
}

/** Deletes a firm made moments ago (its owner membership goes with it) and gives the sessions back their active firm. */
export function discardNewFirm(app: UndoApp, caller: FirmCaller, firmId: string): Promise<void> {
  return asCaller(app, caller, async (trx) => {
    await restoreActiveFirm(trx, firmId, caller.identity.actor.firmId);
    await deleteFirm(trx, firmId);
  });
}

export function discardNewApiKey(app: UndoApp, caller: FirmCaller, keyId: string): Promise<void> {
  return asCaller(app, caller, (trx) => deleteApiKey(trx, keyId));
}

export function discardNewInvitation(app: UndoApp, caller: FirmCaller, invitationId: string): Promise<void> {
  return asCaller(app, caller, (trx) => deleteInvitation(trx, invitationId));
}
