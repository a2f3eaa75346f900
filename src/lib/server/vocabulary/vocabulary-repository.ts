import type { Transaction } from 'kysely';
import type { GeologicalUnit, Region } from '../../contracts/vocabulary';
import type { GeologicalUnitUpdate, NewGeologicalUnit, NewRegion, RegionUpdate } from '../db/bank-tables';
import type { Database } from '../db/schema';

const REGION_COLUMNS = ['id', 'name', 'slug', 'description'] as const;
const UNIT_COLUMNS = ['id', 'name', 'slug', 'description', 'genesis', 'age', 'typical_region_id as typicalRegionId'] as const;

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

/** Regions by id, name and slug, for matching the names in an upload. */
export async function regionNames(trx: Transaction<Database>) {
  return trx.selectFrom('region').select(['id', 'name', 'slug']).execute();
}

/** Geological units by id, name and slug, for matching the names in an upload. */
export async function unitNames(trx: Transaction<Database>) {
  return trx.selectFrom('geological_unit').select(['id', 'name', 'slug']).execute();
}
