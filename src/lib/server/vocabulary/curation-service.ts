import type { CuratedVocabulary, GeologicalUnit, MergedUnit, Region } from '../../contracts/vocabulary';
import type { AppServices } from '../app-services';
import type { ActingPerson } from '../audit/acting-person';
import { InvalidInputError, InvalidStateError, NotFoundError } from '../errors';
import { insertBankVersion, queueSearchUpserts } from '../records/publication-repository';
import { auditCuration, inCuration, synonymsAfterRename } from './catalogue';
import {
  findRegion,
  findUnit,
  moveUnitRecords,
  regionsWithCounts,
  repointMergedUnits,
  setRetired,
  unitsWithCounts,
  updateUnitRow,
} from './vocabulary-repository';

type CurationApp = Pick<AppServices, 'db'>;

/** Regions and units with their record counts, retired and merged ones included (the admin area's list). */
export async function listCuratedVocabulary(app: CurationApp): Promise<CuratedVocabulary> {
  return inCuration(app, async (trx) => ({ regions: await regionsWithCounts(trx), units: await unitsWithCounts(trx) }));
}

/** Retires a region (no new uploads name it; its records stay) or puts it back in use. */
export async function setRegionRetired(app: CurationApp, curator: ActingPerson, id: string, retired: boolean): Promise<Region> {
  return inCuration(app, async (trx) => {
    const before = await findRegion(trx, id);
    if (!before) throw new NotFoundError('There is no such region.');
    await setRetired(trx, 'region', id, retired);
    const after = (await findRegion(trx, id)) as Region;
    await auditCuration(trx, curator, retired ? 'region_retired' : 'region_reinstated', id, { name: before.name });
    return after;
  });
}

/** Retires a geological unit or puts it back in use; a unit merged into another stays retired. */
export async function setUnitRetired(
  app: CurationApp,
  curator: ActingPerson,
  id: string,
  retired: boolean,
): Promise<GeologicalUnit> {
  return inCuration(app, async (trx) => {
    const before = await findUnit(trx, id);
    if (!before) throw new NotFoundError('There is no such geological unit.');
    if (!retired && before.mergedIntoId) {
      throw new InvalidStateError(
        `"${before.name}" was merged into another unit and its records moved there; it cannot be put back in use. Create a new unit instead.`,
      );
    }
    await setRetired(trx, 'geological_unit', id, retired);
    const after = (await findUnit(trx, id)) as GeologicalUnit;
    await auditCuration(trx, curator, retired ? 'unit_retired' : 'unit_reinstated', id, { name: before.name });
    return after;
  });
}

/**
 * Merges one geological unit into another: every test record moves, the absorbed unit's names become
 * synonyms of the survivor (uploads that use them still match), and it is retired with a pointer to the
 * survivor. Published records changing unit is a change of published data: a new bank version records it
 * and the search index is told of every moved record.
 */
export async function mergeUnit(app: CurationApp, curator: ActingPerson, id: string, intoId: string): Promise<MergedUnit> {
  return inCuration(app, async (trx) => {
    const from = await findUnit(trx, id);
    if (!from) throw new NotFoundError('There is no such geological unit.');
    const into = await findUnit(trx, intoId);
    if (!into || intoId === id) {
      throw new InvalidInputError('Choose another geological unit to merge into.', [
        { path: 'intoUnitId', message: into ? 'A unit cannot be merged into itself.' : 'There is no such geological unit.' },
      ]);
    }
    if (from.mergedIntoId) throw new InvalidStateError(`"${from.name}" has already been merged into another unit.`);
    if (into.retiredAt) {
      throw new InvalidStateError(`"${into.name}" is retired; merge into a unit that is in use, or put it back in use first.`);
    }

    const moved = await moveUnitRecords(trx, id, intoId);
    const published = moved.filter((record) => record.status === 'published');
    const bankVersion =
      published.length > 0
        ? await insertBankVersion(trx, {
            publishedBy: curator.userId,
            note: `Geological unit "${from.name}" merged into "${into.name}": ${published.length} published records moved.`,
            recordCount: published.length,
          })
        : null;
    await queueSearchUpserts(
      trx,
      moved.map((record) => record.id),
    );
    await repointMergedUnits(trx, id, intoId);
    const survivor = await updateUnitRow(trx, intoId, {
      synonyms: synonymsAfterRename({ name: from.name, synonyms: [...into.synonyms, ...from.synonyms] }, into.name),
    });
    const absorbed = await updateUnitRow(trx, id, { merged_into_id: intoId, retired_at: from.retiredAt ?? new Date() });
    await auditCuration(trx, curator, 'unit_merged', id, {
      from: from.name,
      into: into.name,
      intoId,
      movedRecords: moved.length,
      movedPublishedRecords: published.length,
      bankVersion,
    });
    return {
      unit: absorbed,
      into: survivor,
      movedRecords: moved.length,
      movedPublishedRecords: published.length,
      bankVersion,
    };
  });
}
