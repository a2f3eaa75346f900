import { randomUUID } from 'node:crypto';
import type { Kysely } from 'kysely';
import type { RecordToStore } from '../../../src/lib/server/contribute/record-to-store';
import type { Database } from '../../../src/lib/server/db/schema';

/** A firm, a person and the vocabulary in an empty bank (as the app role; these tables need no firm scope). */
export async function minimalBank(db: Kysely<Database>) {
  const userId = randomUUID();
  const firmId = randomUUID();
  await db
    .insertInto('user')
    .values({
      id: userId,
      name: 'Fault tester (invented)',
      email: `${userId}@example.test`,
      emailVerified: true,
      createdAt: new Date(),
      updatedAt: new Date(),
      role: 'user',
      image: null,
      banned: null,
      banReason: null,
      banExpires: null,
    })
    .execute();
  await db
    .insertInto('organization')
    .values({
      id: firmId,
      name: 'Fault Test Firm (invented)',
      slug: `fault-${firmId}`,
      createdAt: new Date(),
      logo: null,
      metadata: null,
    })
    .execute();
  const region = await db
    .insertInto('region')
    .values({ name: 'Fault Region (invented)', slug: 'fault-region', description: null })
    .returning('id')
    .executeTakeFirstOrThrow();
  const unit = await db
    .insertInto('geological_unit')
    .values({ name: 'Fault Clay (invented)', slug: 'fault-clay', genesis: 'estuarine' })
    .returning('id')
    .executeTakeFirstOrThrow();
  return { userId, firmId, regionId: region.id, unitId: unit.id };
}

/** n records of one invented borehole column, with three increments each. */
export function manyRecords(n: number, regionId: string, unitId: string): RecordToStore[] {
  return Array.from({ length: n }, (_, i) => ({
    rowNumber: i + 2,
    shared: {
      region_id: regionId,
      geological_unit_id: unitId,
      location_cell: 'E82-N57',
      depth_top_m: 1 + (i % 40) * 0.5,
      depth_bottom_m: 1.4 + (i % 40) * 0.5,
      uscs_symbol: 'CH',
      sampling_method: 'piston',
      water_content_pct: 75,
      liquid_limit_pct: 80,
      plastic_limit_pct: 30,
      plasticity_index_pct: 50,
      specific_gravity: 2.68,
      bulk_unit_weight_kn_per_m3: 15.5,
      initial_void_ratio: 2.1,
      organic_content_pct: null,
      test_method: 'incremental',
      test_standard: 'ASTM D2435',
      compression_index: 0.8,
      recompression_index: 0.08,
      preconsolidation_stress_kpa: 60,
      vertical_effective_stress_kpa: 45,
      overconsolidation_ratio: 1.33,
      cv_nc_m2_per_year: 1.2,
      cv_oc_m2_per_year: 6,
      secondary_compression_index: 0.035,
      mv_m2_per_mn: 1.1,
      permeability_m_per_s: 4e-10,
      delta_e_over_e0: 0.03,
      sample_quality_class: 1,
    },
    private: {
      project_name: 'Fault test project (invented)',
      client_name: null,
      borehole_id: `FT-${Math.floor(i / 40)}`,
      sample_id: `U${i % 40}`,
      easting_m: null,
      northing_m: null,
      latitude_deg: null,
      longitude_deg: null,
      coordinate_system: null,
      notes: null,
    },
    increments: [25, 50, 100].map((stress, k) => ({
      incrementNo: k + 1,
      appliedStressKpa: stress,
      isUnloading: false,
      durationHours: 24,
      endDeformationMm: null,
      endVoidRatio: 2.1 - 0.1 * k,
      specimenHeightMm: null,
    })),
    flags: [],
  }));
}
