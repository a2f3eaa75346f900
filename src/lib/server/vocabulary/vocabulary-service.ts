import type { CreateRegionInput, Region, UpdateRegionInput, Vocabulary } from '../../contracts/vocabulary';
import { slugify } from '../../import/vocabulary-match';
import type { AppServices } from '../app-services';
import type { ActingPerson } from '../audit/acting-person';
import { NotFoundError } from '../errors';
import { assertNameFree, auditCuration, inCatalogue, synonymsAfterRename, uniqueName } from './catalogue';
import {
  findRegion,
  insertRegion,
  listRegions,
  listUnits,
  regionNames,
  unitNames,
  updateRegionRow,
} from './vocabulary-repository';

export async function listVocabulary(app: Pick<AppServices, 'db'>): Promise<Vocabulary> {
  return inCatalogue(app, async (trx) => ({ regions: await listRegions(trx), units: await listUnits(trx) }));
}

/** Regions and units by id, name and slug, for matching the names in an upload or a correction. */
export async function importVocabulary(app: Pick<AppServices, 'db'>) {
  return inCatalogue(app, async (trx) => ({ regions: await regionNames(trx), units: await unitNames(trx) }));
}

export async function createRegion(
  app: Pick<AppServices, 'db'>,
  curator: ActingPerson,
  input: CreateRegionInput,
): Promise<Region> {
  return uniqueName('region', input.name, () =>
    inCatalogue(app, async (trx) => {
      await assertNameFree(trx, 'region', 'region', input.name, null);
      const region = await insertRegion(trx, {
        name: input.name,
        slug: slugify(input.name),
        description: input.description ?? null,
        created_by: curator.userId,
      });
      await auditCuration(trx, curator, 'region_created', region.id, { after: region });
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
      const renamed = input.name !== undefined && input.name !== before.name;
      if (renamed) await assertNameFree(trx, 'region', 'region', input.name as string, id);
      const after = await updateRegionRow(trx, id, {
        ...(renamed && input.name
          ? { name: input.name, slug: slugify(input.name), synonyms: synonymsAfterRename(before, input.name) }
          : {}),
        ...(input.description !== undefined ? { description: input.description } : {}),
      });
      await auditCuration(trx, curator, renamed ? 'region_renamed' : 'region_updated', id, { before, after });
      return after;
    }),
  );
}
