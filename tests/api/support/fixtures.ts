import { db, inTenantTransaction } from './world';

/** Marker strings that must never reach another firm. */
export const PRIVATE_MARKERS = {
  A: { project: 'Quillfen private project Harbour Wall', borehole: 'QF-BH-SECRET-01' },
  B: { project: 'Ellery private project Fen Causeway', borehole: 'EV-BH-SECRET-07' },
} as const;

export interface FirmFixture {
  firmId: string;
  submissionId: string;
  publishedId: string;
  unpublishedId: string;
  estimateId: string;
}

/**
 * The fixtures' own geological unit, named to sort first, so the fixture records lead the record list
 * whatever the demo bank holds.
 */
async function vocabulary() {
  const region = await db.selectFrom('region').select('id').where('slug', '=', 'saltreach-estuary').executeTakeFirstOrThrow();
  await db
    .insertInto('geological_unit')
    .values({
      name: 'Aa access matrix clay (invented)',
      slug: 'aa-access-matrix-clay',
      genesis: 'estuarine',
      description: 'Invented for the access tests.',
    })
    .onConflict((oc) => oc.column('slug').doNothing())
    .execute();
  const unit = await db
    .selectFrom('geological_unit')
    .select('id')
    .where('slug', '=', 'aa-access-matrix-clay')
    .executeTakeFirstOrThrow();
  return { regionId: region.id, unitId: unit.id };
}

/** A small upload in the template's format, with ids unique to this call. */
export function uploadForm(label: string): FormData {
  const id = `${label}-${Math.random().toString(36).slice(2, 8)}`;
  const csv = [
    'Borehole / location id,Sample id,Region,Geological unit,Depth top (m),Depth bottom (m),Cc,e0,LL (%)',
    `MX-${id},U1,Saltreach Estuary,Saltreach Estuarine Clay,5,5.5,0.8,2.1,80`,
  ].join('\n');
  const form = new FormData();
  form.append('file', new Blob([csv], { type: 'text/csv' }), `${id}.csv`);
  form.append('options', JSON.stringify({ format: 'csv' }));
  return form;
}

/** One firm's submission with a published and an unpublished test record, private details and an estimate. */
export async function makeFirmFixture(
  firmId: string,
  userId: string,
  marker: { project: string; borehole: string },
): Promise<FirmFixture> {
  const { regionId, unitId } = await vocabulary();
  const fixture = await inTenantTransaction(db, { firmId, platformRole: 'user' }, async (trx) => {
    const submission = await trx
      .insertInto('submission')
      .values({
        firm_id: firmId,
        submitted_by: userId,
        source_kind: 'seed',
        status: 'submitted',
        row_count: 2,
        submitted_at: new Date(),
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    const record = (depth: number) => ({
      submission_id: submission.id,
      firm_id: firmId,
      region_id: regionId,
      geological_unit_id: unitId,
      depth_top_m: depth,
      depth_bottom_m: depth + 0.5,
      uscs_symbol: 'CH' as const,
      water_content_pct: 78,
      liquid_limit_pct: 82,
      initial_void_ratio: 2.1,
      compression_index: 0.9,
      test_method: 'incremental' as const,
    });
    const published = await trx.insertInto('test_record').values(record(6)).returning('id').executeTakeFirstOrThrow();
    const unpublished = await trx.insertInto('test_record').values(record(9)).returning('id').executeTakeFirstOrThrow();
    for (const id of [published.id, unpublished.id]) {
      await trx
        .insertInto('test_record_private')
        .values({
          test_record_id: id,
          firm_id: firmId,
          project_name: marker.project,
          client_name: 'Invented client',
          borehole_id: marker.borehole,
          sample_id: 'U-3',
          notes: 'fixture',
        })
        .execute();
    }
    const estimate = await trx
      .insertInto('estimate')
      .values({
        firm_id: firmId,
        created_by: userId,
        name: `${marker.project} embankment`,
        unit_system: 'SI',
        input: JSON.stringify({ fixture: true }),
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    return {
      firmId,
      submissionId: submission.id,
      publishedId: published.id,
      unpublishedId: unpublished.id,
      estimateId: estimate.id,
    };
  });
  // Only a steward publishes: a firm cannot give its own records a review outcome.
  await inTenantTransaction(db, { firmId: null, platformRole: 'steward' }, async (trx) => {
    const version = await trx
      .insertInto('bank_version')
      .values({ published_by: null, note: 'access matrix fixture', record_count: 1 })
      .returning('id')
      .executeTakeFirstOrThrow();
    await trx
      .updateTable('test_record')
      .set({ status: 'published', bank_version_id: version.id })
      .where('id', '=', fixture.publishedId)
      .execute();
  });
  return fixture;
}

/** A submitted (not yet reviewed) submission of the firm with one pending record, for one-shot actions. */
export async function makeSubmittedSubmission(firmId: string): Promise<string> {
  const { regionId, unitId } = await vocabulary();
  return inTenantTransaction(db, { firmId, platformRole: 'user' }, async (trx) => {
    const submission = await trx
      .insertInto('submission')
      .values({
        firm_id: firmId,
        submitted_by: null,
        source_kind: 'seed',
        status: 'submitted',
        row_count: 1,
        submitted_at: new Date(),
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    await trx
      .insertInto('test_record')
      .values({
        submission_id: submission.id,
        firm_id: firmId,
        region_id: regionId,
        geological_unit_id: unitId,
        depth_top_m: 4,
        depth_bottom_m: 4.5,
        compression_index: 0.7,
      })
      .execute();
    return submission.id;
  });
}
