import type { Transaction } from 'kysely';
import type { CreateUnitInput, GeologicalUnit, UpdateUnitInput } from '../../contracts/vocabulary';
import { slugify } from '../../import/vocabulary-match';
import type { AppServices } from '../app-services';
import type { ActingPerson } from '../audit/acting-person';
import type { Database } from '../db/schema';
import { InvalidInputError, NotFoundError } from '../errors';
import { assertNameFree, auditCuration, inCatalogue, synonymsAfterRename, uniqueName } from './catalogue';
import { findRegion, findUnit, insertUnit, updateUnitRow } from './vocabulary-repository';

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
      await assertNameFree(trx, 'geological_unit', 'geological unit', input.name, null);
      await assertRegionExists(trx, input.typicalRegionId);
      const unit = await insertUnit(trx, {
        name: input.name,
        slug: slugify(input.name),
        description: input.description ?? null,
        genesis: input.genesis,
        age: input.age ?? null,
        typical_region_id: input.typicalRegionId ?? null,
        created_by: curator.userId,
      });
      await auditCuration(trx, curator, 'unit_created', unit.id, { after: unit });
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
      const renamed = input.name !== undefined && input.name !== before.name;
      if (renamed) await assertNameFree(trx, 'geological_unit', 'geological unit', input.name as string, id);
      await assertRegionExists(trx, input.typicalRegionId);
      const after = await updateUnitRow(trx, id, {
        ...(renamed && input.name
          ? { name: input.name, slug: slugify(input.name), synonyms: synonymsAfterRename(before, input.name) }
          : {}),
        ...(input.description !== undefined ? { description: input.description } : {}),
        ...(input.genesis ? { genesis: input.genesis } : {}),
        ...(input.age !== undefined ? { age: input.age } : {}),
        ...(input.typicalRegionId !== undefined ? { typical_region_id: input.typicalRegionId } : {}),
      });
      await auditCuration(trx, curator, renamed ? 'unit_renamed' : 'unit_updated', id, { before, after });
      return after;
    }),
  );
}
