import type { Transaction } from 'kysely';
import type {
  CreateRegionInput,
  CreateUnitInput,
  GeologicalUnit,
  Region,
  UpdateRegionInput,
  UpdateUnitInput,
  Vocabulary,
} from '../../contracts/vocabulary';
import type { AppServices } from '../app-services';
import type { ActingPerson } from '../audit/acting-person';
import { auditedBy } from '../audit/audit-log';
import { insertAuditEntry } from '../audit/audit-repository';
import type { Database } from '../db/schema';
import { ConflictError, InvalidInputError, NotFoundError } from '../errors';
import { inTenantTransaction, NO_TENANT } from '../tenancy/tenant-transaction';
import {
  findRegion,
  findUnit,
  insertRegion,
  insertUnit,
  listRegions,
  listUnits,
  regionNames,
  unitNames,
  updateRegionRow,
  updateUnitRow,
} from './vocabulary-repository';

/** The vocabulary is shared by every firm: its transactions touch no firm's data. */
const inCatalogue = <T>(app: Pick<AppServices, 'db'>, fn: (trx: Transaction<Database>) => Promise<T>) =>
  inTenantTransaction(app.db, NO_TENANT, fn);

export function slugOf(name: string): string {
  return name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
}

function isUniqueViolation(error: unknown): boolean {
  return typeof error === 'object' && error !== null && (error as { code?: string }).code === '23505';
}

/** Runs a write that may hit a unique name; a clash becomes a ConflictError that names it. */
async function uniqueName<T>(what: string, name: string | undefined, write: () => Promise<T>): Promise<T> {
  try {
    return await write();
  } catch (error) {
    if (isUniqueViolation(error)) throw new ConflictError(`A ${what} called "${name}" already exists.`);
    throw error;
  }
}

export async function listVocabulary(app: Pick<AppServices, 'db'>): Promise<Vocabulary> {
  return inCatalogue(app, async (trx) => ({ regions: await listRegions(trx), units: await listUnits(trx) }));
}

/** Regions and units by id, name and slug, for matching the names in an upload or a correction. */
export async function importVocabulary(app: Pick<AppServices, 'db'>) {
  return inCatalogue(app, async (trx) => ({ regions: await regionNames(trx), units: await unitNames(trx) }));
}

async function audit(
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

export async function createRegion(
  app: Pick<AppServices, 'db'>,
  curator: ActingPerson,
  input: CreateRegionInput,
): Promise<Region> {
  return uniqueName('region', input.name, () =>
    inCatalogue(app, async (trx) => {
      const region = await insertRegion(trx, {
        name: input.name,
        slug: slugOf(input.name),
        description: input.description ?? null,
        created_by: curator.userId,
      });
      await audit(trx, curator, 'region_created', region.id, { after: region });
      return region;
    }),
  );
}

export async function updateRegion(
  app: Pick<AppServices, 'db'>,
  curator: ActingPerson,
  id: string,
  input: UpdateRegionInput,
): Promise<Region> {
  return uniqueName('region', input.name, () =>
    inCatalogue(app, async (trx) => {
      const before = await findRegion(trx, id);
      if (!before) throw new NotFoundError('There is no such region.');
      const after = await updateRegionRow(trx, id, {
        ...(input.name ? { name: input.name, slug: slugOf(input.name) } : {}),
        ...(input.description !== undefined ? { description: input.description } : {}),
      });
      await audit(trx, curator, 'region_updated', id, { before, after });
      return after;
    }),
  );
}

async function assertRegionExists(trx: Transaction<Database>, regionId: string | null | undefined) {
  if (!regionId || (await findRegion(trx, regionId))) return;
  throw new InvalidInputError('The region does not exist.', [
    { path: 'typicalRegionId', message: 'Choose a region from the list.' },
  ]);
}

export async function createUnit(
  app: Pick<AppServices, 'db'>,
  curator: ActingPerson,
  input: CreateUnitInput,
): Promise<GeologicalUnit> {
  return uniqueName('geological unit', input.name, () =>
    inCatalogue(app, async (trx) => {
      await assertRegionExists(trx, input.typicalRegionId);
      const unit = await insertUnit(trx, {
        name: input.name,
        slug: slugOf(input.name),
        description: input.description ?? null,
        genesis: input.genesis,
        age: input.age ?? null,
        typical_region_id: input.typicalRegionId ?? null,
        created_by: curator.userId,
      });
      await audit(trx, curator, 'unit_created', unit.id, { after: unit });
      return unit;
    }),
  );
}

export async function updateUnit(
  app: Pick<AppServices, 'db'>,
  curator: ActingPerson,
  id: string,
  input: UpdateUnitInput,
): Promise<GeologicalUnit> {
  return uniqueName('geological unit', input.name, () =>
    inCatalogue(app, async (trx) => {
      const before = await findUnit(trx, id);
      if (!before) throw new NotFoundError('There is no such geological unit.');
      await assertRegionExists(trx, input.typicalRegionId);
      const after = await updateUnitRow(trx, id, {
        ...(input.name ? { name: input.name, slug: slugOf(input.name) } : {}),
        ...(input.description !== undefined ? { description: input.description } : {}),
        ...(input.genesis ? { genesis: input.genesis } : {}),
        ...(input.age !== undefined ? { age: input.age } : {}),
        ...(input.typicalRegionId !== undefined ? { typical_region_id: input.typicalRegionId } : {}),
      });
      await audit(trx, curator, 'unit_updated', id, { before, after });
      return after;
    }),
  );
}
