import type { Kysely } from 'kysely';
import type { z } from 'zod';
import type { createRegionSchema, createUnitSchema, updateRegionSchema, updateUnitSchema } from '../../schemas/vocabulary';
import { recordAudit } from '../audit/audit-log';
import type { Database } from '../db/schema';
import { ApiError } from '../http/api-error';

export interface Curator {
  userId: string;
  firmId: string | null;
  ipAddress: string;
}

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

export async function listVocabulary(db: Kysely<Database>) {
  const regions = await db.selectFrom('region').select(['id', 'name', 'slug', 'description']).orderBy('name').execute();
  const units = await db
    .selectFrom('geological_unit')
    .select(['id', 'name', 'slug', 'description', 'genesis', 'age', 'typical_region_id as typicalRegionId'])
    .orderBy('name')
    .execute();
  return { regions, units };
}

export async function createRegion(db: Kysely<Database>, curator: Curator, input: z.infer<typeof createRegionSchema>) {
  try {
    const region = await db
      .insertInto('region')
      .values({ name: input.name, slug: slugOf(input.name), description: input.description ?? null, created_by: curator.userId })
      .returning(['id', 'name', 'slug', 'description'])
      .executeTakeFirstOrThrow();
    await recordAudit(db, {
      actorUserId: curator.userId,
      firmId: curator.firmId,
      action: 'vocabulary.region_created',
      objectType: 'region',
      objectId: region.id,
      summary: { after: region },
      ipAddress: curator.ipAddress,
    });
    return region;
  } catch (error) {
    if (isUniqueViolation(error)) throw new ApiError('CONFLICT', `A region called "${input.name}" already exists.`);
    throw error;
  }
}

export async function updateRegion(
  db: Kysely<Database>,
  curator: Curator,
  id: string,
  input: z.infer<typeof updateRegionSchema>,
) {
  const before = await db
    .selectFrom('region')
    .select(['id', 'name', 'slug', 'description'])
    .where('id', '=', id)
    .executeTakeFirst();
  if (!before) throw new ApiError('NOT_FOUND', 'There is no such region.');
  try {
    const after = await db
      .updateTable('region')
      .set({
        ...(input.name ? { name: input.name, slug: slugOf(input.name) } : {}),
        ...(input.description !== undefined ? { description: input.description } : {}),
        updated_at: new Date(),
      })
      .where('id', '=', id)
      .returning(['id', 'name', 'slug', 'description'])
      .executeTakeFirstOrThrow();
    await recordAudit(db, {
      actorUserId: curator.userId,
      firmId: curator.firmId,
      action: 'vocabulary.region_updated',
      objectType: 'region',
      objectId: id,
      summary: { before, after },
      ipAddress: curator.ipAddress,
    });
    return after;
  } catch (error) {
    if (isUniqueViolation(error)) throw new ApiError('CONFLICT', `A region called "${input.name}" already exists.`);
    throw error;
  }
}

async function assertRegionExists(db: Kysely<Database>, regionId: string | null | undefined) {
  if (!regionId) return;
  const region = await db.selectFrom('region').select('id').where('id', '=', regionId).executeTakeFirst();
  if (!region)
    throw new ApiError('VALIDATION_FAILED', 'The region does not exist.', [
      { path: 'typicalRegionId', message: 'Choose a region from the list.' },
    ]);
}

const UNIT_COLUMNS = ['id', 'name', 'slug', 'description', 'genesis', 'age', 'typical_region_id as typicalRegionId'] as const;

export async function createUnit(db: Kysely<Database>, curator: Curator, input: z.infer<typeof createUnitSchema>) {
  await assertRegionExists(db, input.typicalRegionId);
  try {
    const unit = await db
      .insertInto('geological_unit')
      .values({
        name: input.name,
        slug: slugOf(input.name),
        description: input.description ?? null,
        genesis: input.genesis,
        age: input.age ?? null,
        typical_region_id: input.typicalRegionId ?? null,
        created_by: curator.userId,
      })
      .returning(UNIT_COLUMNS)
      .executeTakeFirstOrThrow();
    await recordAudit(db, {
      actorUserId: curator.userId,
      firmId: curator.firmId,
      action: 'vocabulary.unit_created',
      objectType: 'geological_unit',
      objectId: unit.id,
      summary: { after: unit },
      ipAddress: curator.ipAddress,
    });
    return unit;
  } catch (error) {
    if (isUniqueViolation(error)) throw new ApiError('CONFLICT', `A geological unit called "${input.name}" already exists.`);
    throw error;
  }
}

export async function updateUnit(db: Kysely<Database>, curator: Curator, id: string, input: z.infer<typeof updateUnitSchema>) {
  const before = await db.selectFrom('geological_unit').select(UNIT_COLUMNS).where('id', '=', id).executeTakeFirst();
  if (!before) throw new ApiError('NOT_FOUND', 'There is no such geological unit.');
  await assertRegionExists(db, input.typicalRegionId);
  try {
    const after = await db
      .updateTable('geological_unit')
      .set({
        ...(input.name ? { name: input.name, slug: slugOf(input.name) } : {}),
        ...(input.description !== undefined ? { description: input.description } : {}),
        ...(input.genesis ? { genesis: input.genesis } : {}),
        ...(input.age !== undefined ? { age: input.age } : {}),
        ...(input.typicalRegionId !== undefined ? { typical_region_id: input.typicalRegionId } : {}),
        updated_at: new Date(),
      })
      .where('id', '=', id)
      .returning(UNIT_COLUMNS)
      .executeTakeFirstOrThrow();
    await recordAudit(db, {
      actorUserId: curator.userId,
      firmId: curator.firmId,
      action: 'vocabulary.unit_updated',
      objectType: 'geological_unit',
      objectId: id,
      summary: { before, after },
      ipAddress: curator.ipAddress,
    });
    return after;
  } catch (error) {
    if (isUniqueViolation(error)) throw new ApiError('CONFLICT', `A geological unit called "${input.name}" already exists.`);
    throw error;
  }
}
