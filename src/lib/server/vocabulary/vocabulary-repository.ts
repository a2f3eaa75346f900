import type { Transaction } from 'kysely';
import { sql } from 'kysely';
import type { CuratedRegion, CuratedUnit, GeologicalUnit, Region } from '../../contracts/vocabulary';
import type { GeologicalUnitUpdate, NewGeologicalUnit, NewRegion, RegionUpdate } from '../db/bank-tables';
import type { Database } from '../db/schema';

const REGION_COLUMNS = ['id', 'name', 'slug', 'description', 'synonyms', 'retired_at as retiredAt'] as const;
const UNIT_COLUMNS = [
  ...REGION_COLUMNS,
  'genesis',
  'age',
  'typical_region_id as typicalRegionId',
  'merged_into_id as mergedIntoId',
] as const;

export async function listRegions(trx: Transaction<Database>): Promise<Region[]> {
  return trx.selectFrom('region').select(REGION_COLUMNS).orderBy('name').execute();
}

export async function listUnits(trx: Transaction<Database>): Promise<GeologicalUnit[]> {
  return trx.selectFrom('geological_unit').select(UNIT_COLUMNS).orderBy('name').execute();
}

export async function findRegion(trx: Transaction<Database>, id: string): Promise<Region | undefined> {
  return trx.selectFrom('region').select(REGION_COLUMNS).where('id', '=', id).executeTakeFirst();
}

export async function findUnit(trx: Transaction<Database>, id: string): Promise<GeologicalUnit | undefined> {
  return trx.selectFrom('geological_unit').select(UNIT_COLUMNS).where('id', '=', id).executeTakeFirst();
}

export async function insertRegion(trx: Transaction<Database>, values: NewRegion): Promise<Region> {
  return trx.insertInto('region').values(values).returning(REGION_COLUMNS).executeTakeFirstOrThrow();
}

export async function updateRegionRow(trx: Transaction<Database>, id: string, values: RegionUpdate): Promise<Region> {
  return trx
    .updateTable('region')
    .set({ ...values, updated_at: new Date() })
    .where('id', '=', id)
    .returning(REGION_COLUMNS)
    .executeTakeFirstOrThrow();
}

export async function insertUnit(trx: Transaction<Database>, values: NewGeologicalUnit): Promise<GeologicalUnit> {
  return trx.insertInto('geological_unit').values(values).returning(UNIT_COLUMNS).executeTakeFirstOrThrow();
}

export async function updateUnitRow(
  trx: Transaction<Database>,
  id: string,
  values: GeologicalUnitUpdate,
): Promise<GeologicalUnit> {
  return trx
    .updateTable('geological_unit')
    .set({ ...values, updated_at: new Date() })
    .where('id', '=', id)
    .returning(UNIT_COLUMNS)
    .executeTakeFirstOrThrow();
}

const retired = sql<boolean>`retired_at is not null`.as('retired');

/** Regions by id, name, slug and synonyms, for matching the names in an upload. */
export async function regionNames(trx: Transaction<Database>) {
  return trx.selectFrom('region').select(['id', 'name', 'slug', 'synonyms', retired]).execute();
}

/** Geological units by id, name, slug and synonyms, for matching the names in an upload (merged ones live on as synonyms). */
export async function unitNames(trx: Transaction<Database>) {
  return trx
    .selectFrom('geological_unit')
    .select(['id', 'name', 'slug', 'synonyms', retired])
    .where('merged_into_id', 'is', null)
    .execute();
}

/** Regions with the number of test records (every status) in each. */
export async function regionsWithCounts(trx: Transaction<Database>): Promise<CuratedRegion[]> {
  return trx
    .selectFrom('region as v')
    .select(REGION_COLUMNS.map((c) => `v.${c}` as const))
    .select((eb) =>
      eb
        .selectFrom('test_record as t')
        .whereRef('t.region_id', '=', 'v.id')
        .select(eb.fn.countAll<number>().as('n'))
        .as('recordCount'),
    )
    .orderBy('v.name')
    .execute() as Promise<CuratedRegion[]>;
}

/** Geological units with the number of test records (every status) in each. */
export async function unitsWithCounts(trx: Transaction<Database>): Promise<CuratedUnit[]> {
  return trx
    .selectFrom('geological_unit as v')
    .select(UNIT_COLUMNS.map((c) => `v.${c}` as const))
    .select((eb) =>
      eb
        .selectFrom('test_record as t')
        .whereRef('t.geological_unit_id', '=', 'v.id')
        .select(eb.fn.countAll<number>().as('n'))
        .as('recordCount'),
    )
    .orderBy('v.name')
    .execute() as Promise<CuratedUnit[]>;
}

/** Moves every test record of one unit to another; returns the moved records with their status. */
export async function moveUnitRecords(trx: Transaction<Database>, fromUnitId: string, intoUnitId: string) {
  return trx
    .updateTable('test_record')
    .set({ geological_unit_id: intoUnitId, updated_at: new Date() })
    .where('geological_unit_id', '=', fromUnitId)
    .returning(['id', 'status'])
    .execute();
}

/** Units merged earlier into `fromUnitId` now point at the unit that absorbs it. */
export async function repointMergedUnits(trx: Transaction<Database>, fromUnitId: string, intoUnitId: string) {
  await trx.updateTable('geological_unit').set({ merged_into_id: intoUnitId }).where('merged_into_id', '=', fromUnitId).execute();
}

/** Every name and synonym of one vocabulary list, to keep names from colliding with synonyms. */
export async function namesAndSynonyms(trx: Transaction<Database>, table: 'region' | 'geological_unit') {
  return trx.selectFrom(table).select(['id', 'name', 'synonyms']).execute();
}

/** Sets or clears the retired time of a region or unit. */
export async function setRetired(trx: Transaction<Database>, table: 'region' | 'geological_unit', id: string, retired: boolean) {
  await trx
    .updateTable(table)
    .set({ retired_at: retired ? new Date() : null, updated_at: new Date() })
    .where('id', '=', id)
    .execute();
}
