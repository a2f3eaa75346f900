import type { Transaction } from 'kysely';
import { slugify } from '../../import/vocabulary-match';
import type { AppServices } from '../app-services';
import type { ActingPerson } from '../audit/acting-person';
import { auditedBy } from '../audit/audit-log';
import { insertAuditEntry } from '../audit/audit-repository';
import type { Database } from '../db/schema';
import { ConflictError } from '../errors';
import { STEWARD_SCOPE } from '../tenancy/scope';
import { inTenantTransaction, NO_TENANT } from '../tenancy/tenant-transaction';
import { namesAndSynonyms } from './vocabulary-repository';

/** The vocabulary is shared by every firm: its transactions touch no firm's data. */
export const inCatalogue = <T>(app: Pick<AppServices, 'db'>, fn: (trx: Transaction<Database>) => Promise<T>) =>
  inTenantTransaction(app.db, NO_TENANT, fn);

/**
 * Counting and moving every firm's records in a unit is curation, the stewards' work (which the platform
 * admin may also do): it runs in their scope, which reaches records of every status but no private details.
 */
export const inCuration = <T>(app: Pick<AppServices, 'db'>, fn: (trx: Transaction<Database>) => Promise<T>) =>
  inTenantTransaction(app.db, STEWARD_SCOPE, fn);

/** The earlier names an entry answers to after a rename: the old name joins its synonyms, the new one leaves them. */
export function synonymsAfterRename(before: { name: string; synonyms: readonly string[] }, newName: string): string[] {
  const kept = [...before.synonyms, before.name].filter((name) => slugify(name) !== slugify(newName));
  return kept.filter((name, index) => kept.findIndex((other) => slugify(other) === slugify(name)) === index);
}

/** 409 when a name is already another entry's name or synonym (an upload naming it would be ambiguous). */
export async function assertNameFree(
  trx: Transaction<Database>,
  table: 'region' | 'geological_unit',
  what: string,
  name: string,
  exceptId: string | null,
): Promise<void> {
  const slug = slugify(name);
  for (const entry of await namesAndSynonyms(trx, table)) {
    if (entry.id === exceptId) continue;
    if (slugify(entry.name) === slug) throw new ConflictError(`A ${what} called "${entry.name}" already exists.`);
    if (entry.synonyms.some((s) => slugify(s) === slug)) {
      throw new ConflictError(`"${name}" is already another name of the ${what} "${entry.name}"; choose a different name.`);
    }
  }
}

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
  action: `${'region' | 'unit'}_${'created' | 'updated' | 'renamed' | 'retired' | 'reinstated' | 'merged'}`,
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
