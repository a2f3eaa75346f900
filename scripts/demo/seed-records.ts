import { createHash } from 'node:crypto';
import { duplicateKey } from '../../src/lib/import';
import type { AppContext } from '../../src/lib/server/build-context';
import { submitUpload } from '../../src/lib/server/contribute/submit-upload';
import { insertIncrements } from '../../src/lib/server/records/record-store-repository';
import { decideSubmission } from '../../src/lib/server/review/review-decision';
import { inTenantTransaction } from '../../src/lib/server/tenancy/tenant-transaction';
import { type DemoRecord, generateDemoRecords } from './generate-records';
import { DEMO_PEOPLE } from './people';
import { recordsToCsv } from './records-csv';

const SUBMISSION_SIZE = 40;
const APP_URL = 'http://127.0.0.1:4321';

function contributorOf(firmSlug: string): string {
  const person = DEMO_PEOPLE.find((p) => p.memberships.some((m) => m.firm === firmSlug && m.role === 'contributor'));
  if (!person) throw new Error(`demo firm ${firmSlug} has no contributor`);
  return person.email;
}

/** Records taken in turn from each geological unit, so every submission holds some of each. */
function interleaveUnits(records: DemoRecord[]): DemoRecord[] {
  const byUnit = new Map<string, DemoRecord[]>();
  for (const record of records) {
    const unit = record.geologicalUnit ?? '';
    byUnit.set(unit, [...(byUnit.get(unit) ?? []), record]);
  }
  const queues = [...byUnit.values()];
  const out: DemoRecord[] = [];
  while (out.length < records.length) for (const queue of queues) if (queue.length) out.push(queue.shift() as DemoRecord);
  return out;
}

/** Records that stay waiting for review in each firm's last submission, besides its planted mistakes. */
const WAITING = 8;

/**
 * The firm's records in submissions of about 40, then a last, small submission that stays waiting for
 * review: a few ordinary records and the planted mistakes. Units are interleaved, so that every
 * submission holds a slice of every deposit and each deposit's published tests come from every firm
 * that works in it (its pooled figures pass the disclosure rule).
 */
function batches(records: DemoRecord[]): DemoRecord[][] {
  const ordinary = interleaveUnits(records.filter((r) => !r.plantedOutlier));
  const waiting = [...ordinary.splice(Math.max(0, ordinary.length - WAITING)), ...records.filter((r) => r.plantedOutlier)];
  const out: DemoRecord[][] = [];
  for (let i = 0; i < ordinary.length; i += SUBMISSION_SIZE) out.push(ordinary.slice(i, i + SUBMISSION_SIZE));
  out.push(waiting);
  return out;
}

/** Raw readings go in beside the imported records (the CSV template carries summary values only). */
async function attachIncrements(ctx: AppContext, firmId: string, submissionId: string, records: DemoRecord[]) {
  const withReadings = records.filter((r) => r.increments?.length);
  if (withReadings.length === 0) return;
  await inTenantTransaction(ctx.database.db, { firmId, platformRole: 'user' }, async (trx) => {
    const stored = await trx
      .selectFrom('test_record as r')
      .innerJoin('test_record_private as p', 'p.test_record_id', 'r.id')
      .select(['r.id', 'p.borehole_id', 'p.sample_id', 'r.depth_top_m', 'r.depth_bottom_m'])
      .where('r.submission_id', '=', submissionId)
      .execute();
    const idByKey = new Map(
      stored.map((s) => [
        duplicateKey({
          boreholeId: s.borehole_id ?? '',
          sampleId: s.sample_id,
          depthTop: s.depth_top_m,
          depthBottom: s.depth_bottom_m,
        }),
        s.id,
      ]),
    );
    const rows = withReadings.flatMap((record) => {
      const id = idByKey.get(
        duplicateKey({
          boreholeId: record.boreholeId ?? '',
          sampleId: record.sampleId,
          depthTop: record.depthTop ?? 0,
          depthBottom: record.depthBottom ?? 0,
        }),
      );
      if (!id) return [];
      return (record.increments ?? []).map((inc) => ({
        recordId: id,
        incrementNo: inc.incrementNo,
        appliedStressKpa: inc.appliedStressKpa,
        isUnloading: inc.isUnloading,
        durationHours: null,
        endDeformationMm: null,
        endVoidRatio: inc.voidRatioEnd,
        specimenHeightMm: null,
      }));
    });
    await insertIncrements(trx, rows);
  });
}

/**
 * Loads the invented test records through the same import path as a person's upload (CSV in the
 * template's format, checked and stored whole), then plays the steward: most submissions accepted
 * into the bank, the last of each firm (holding the planted mistakes) left waiting, and one returned
 * with comments on two records.
 */
export async function seedRecords(ctx: AppContext): Promise<{ records: number; submissions: number }> {
  const db = ctx.database.db;
  const records = generateDemoRecords();
  const services = { db, appUrl: APP_URL };
  const stewardRow = await db
    .selectFrom('user')
    .select('id')
    .where('email', '=', 'steward@example.test')
    .executeTakeFirstOrThrow();
  const steward = { userId: stewardRow.id, firmId: null, ipAddress: null };
  let submissions = 0;
  for (const firmSlug of ['quillfen', 'ellery-voss', 'northmarch']) {
    const firm = await db.selectFrom('organization').select('id').where('slug', '=', firmSlug).executeTakeFirstOrThrow();
    const contributor = await db
      .selectFrom('user')
      .select('id')
      .where('email', '=', contributorOf(firmSlug))
      .executeTakeFirstOrThrow();
    const parts = batches(records.filter((r) => r.firmSlug === firmSlug));
    for (const [index, part] of parts.entries()) {
      const csv = new TextEncoder().encode(recordsToCsv(part));
      const upload = {
        bytes: csv,
        fileName: `${firmSlug}-oedometer-results-${index + 1}.csv`,
        mediaType: 'text/csv',
        sha256: createHash('sha256').update(csv).digest('hex'),
        options: { format: 'csv' as const, remember: true },
      };
      const stored = await submitUpload(
        services,
        { userId: contributor.id, firmId: firm.id, ipAddress: null, via: 'seed' },
        upload,
        'csv',
      );
      await attachIncrements(ctx, firm.id, stored.id, part);
      submissions++;
      const last = index === parts.length - 1;
      if (last) continue;
      if (firmSlug === 'ellery-voss' && index === parts.length - 2) {
        const review = await db
          .selectFrom('test_record')
          .select(['id'])
          .where('submission_id', '=', stored.id)
          .orderBy('row_number')
          .limit(2)
          .execute();
        await decideSubmission(services, steward, stored.id, {
          action: 'return',
          comment: 'Two records need a second look before they enter the bank.',
          recordComments: review.map((r, i) => ({
            recordId: r.id,
            comment:
              i === 0
                ? "σ'p looks high for this depth; please check the units (kPa)."
                : 'Cr is close to Cc; please confirm the unload–reload branch.',
          })),
        });
      } else {
        await decideSubmission(services, steward, stored.id, { action: 'accept' });
      }
    }
  }
  // The demo's own notifications are not worth delivering: mark them sent.
  await db.updateTable('mail_outbox').set({ sent_at: new Date() }).where('sent_at', 'is', null).execute();
  return { records: records.length, submissions };
}
