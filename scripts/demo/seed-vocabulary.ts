import type { Kysely } from 'kysely';
import type { Database } from '../../src/lib/server/db/schema';
import { DEMO_REGIONS, DEMO_UNITS } from './vocabulary';

/** Adds the invented regions and geological units that are missing (matched by slug). */
export async function seedVocabulary(db: Kysely<Database>): Promise<void> {
  for (const region of DEMO_REGIONS) {
    await db
      .insertInto('region')
      .values({ name: region.name, slug: region.slug, description: region.description })
      .onConflict((oc) => oc.column('slug').doNothing())
      .execute();
  }
  for (const unit of DEMO_UNITS) {
    const region = await db.selectFrom('region').select('id').where('slug', '=', unit.region).executeTakeFirstOrThrow();
    await db
      .insertInto('geological_unit')
      .values({
        name: unit.name,
        slug: unit.slug,
        description: unit.description,
        genesis: unit.genesis,
        age: unit.age,
        typical_region_id: region.id,
      })
      .onConflict((oc) => oc.column('slug').doNothing())
      .execute();
  }
}
