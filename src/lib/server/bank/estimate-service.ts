import type { Kysely } from 'kysely';
import type { z } from 'zod';
import type { saveEstimateSchema } from '../../schemas/estimate';
import { recordAudit } from '../audit/audit-log';
import type { ResolvedIdentity } from '../auth/resolve-actor';
import type { Database } from '../db/schema';
import { scopeOf } from '../tenancy/scope';
import { inTenantTransaction } from '../tenancy/tenant-transaction';

const SUMMARY_COLUMNS = [
  'id',
  'name',
  'unit_system as unitSystem',
  'bank_version_id as bankVersion',
  'created_at as createdAt',
  'updated_at as updatedAt',
] as const;

/** The active firm's saved estimates (firm-private). */
export async function listEstimates(db: Kysely<Database>, identity: ResolvedIdentity, firmId: string) {
  return inTenantTransaction(db, scopeOf(identity), (trx) =>
    trx.selectFrom('estimate').select(SUMMARY_COLUMNS).where('firm_id', '=', firmId).orderBy('updated_at', 'desc').execute(),
  );
}

/** Saves an estimate for the active firm, recording which bank version was current. */
export async function saveEstimate(
  db: Kysely<Database>,
  identity: ResolvedIdentity,
  firmId: string,
  input: z.infer<typeof saveEstimateSchema>,
  ipAddress: string,
) {
  return inTenantTransaction(db, scopeOf(identity), async (trx) => {
    const version = await trx
      .selectFrom('bank_version')
      .select((eb) => eb.fn.max('id').as('id'))
      .executeTakeFirst();
    const estimate = await trx
      .insertInto('estimate')
      .values({
        firm_id: firmId,
        created_by: identity.user.id,
        name: input.name,
        unit_system: input.unitSystem,
        input: JSON.stringify(input.input),
        result_summary: input.resultSummary ? JSON.stringify(input.resultSummary) : null,
        bank_version_id: version?.id ?? null,
      })
      .returning(SUMMARY_COLUMNS)
      .executeTakeFirstOrThrow();
    await recordAudit(trx, {
      actorUserId: identity.user.id,
      firmId,
      action: 'estimate.saved',
      objectType: 'estimate',
      objectId: estimate.id,
      summary: { name: input.name },
      ipAddress,
    });
    return estimate;
  });
}
