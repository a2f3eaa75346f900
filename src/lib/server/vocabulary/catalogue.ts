import type { Transaction } from 'kysely';
import type { AppServices } from '../app-services';
import type { ActingPerson } from '../audit/acting-person';
import { auditedBy } from '../audit/audit-log';
import { insertAuditEntry } from '../audit/audit-repository';
import type { Database } from '../db/schema';
import { ConflictError } from '../errors';
import { inTenantTransaction, NO_TENANT } from '../tenancy/tenant-transaction';

/** The vocabulary is shared by every firm: its transactions touch no firm's data. */
export const inCatalogue = <T>(app: Pick<AppServices, 'db'>, fn: (trx: Transaction<Database>) => Promise<T>) =>
  inTenantTransaction(app.db, NO_TENANT, fn);

function isUniqueViolation(error: unknown): boolean {
  return typeof error === 'object' && error !== null && (error as { code?: string }).code === '23505';
}

/** Runs a write that may hit a unique name; a clash becomes a ConflictError that names it. */
export async function uniqueName<T>(what: string, name: string | undefined, write: () => Promise<T>): Promise<T> {
  try {
    return await write();
  } catch (error) {
    if (isUniqueViolation(error)) throw new ConflictError(`A ${what} called "${name}" already exists.`);
    throw error;
  }
}

/** The audit entry of a steward's change to the vocabulary. */
export async function auditCuration(
  trx: Transaction<Database>,
  curator: ActingPerson,
  action: `${'region' | 'unit'}_${'created' | 'updated'}`,
  objectId: string,
  summary: Record<string, unknown>,
) {
  await insertAuditEntry(trx, {
    ...auditedBy(curator),
    action: `vocabulary.${action}`,
    objectType: action.startsWith('unit') ? 'geological_unit' : 'region',
    objectId,
    summary,
  });
}
