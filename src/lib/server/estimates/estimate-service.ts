import type { EstimateList, SavedEstimate, SaveEstimateInput } from '../../contracts/estimates';
import type { AppServices } from '../app-services';
import type { ActingPerson } from '../audit/acting-person';
import { auditedBy } from '../audit/audit-log';
import { insertAuditEntry } from '../audit/audit-repository';
import { currentBankVersion } from '../records/publication-repository';
import { firmScope } from '../tenancy/scope';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import { insertEstimate, listEstimatesOfFirm } from './estimate-repository';

/** The firm's saved estimates (firm-private). */
export async function listEstimates(app: Pick<AppServices, 'db'>, firmId: string): Promise<EstimateList> {
  const estimates = await inTenantTransaction(app.db, firmScope(firmId), (trx) => listEstimatesOfFirm(trx, firmId));
  return { estimates };
}

/** Saves an estimate for the person's active firm, recording which bank version was current. */
export async function saveEstimate(
  app: Pick<AppServices, 'db'>,
  person: ActingPerson & { userId: string; firmId: string },
  input: SaveEstimateInput,
): Promise<SavedEstimate> {
  return inTenantTransaction(app.db, firmScope(person.firmId), async (trx) => {
    const estimate = await insertEstimate(trx, {
      firm_id: person.firmId,
      created_by: person.userId,
      name: input.name,
      unit_system: input.unitSystem,
      input: JSON.stringify(input.input),
      result_summary: input.resultSummary ? JSON.stringify(input.resultSummary) : null,
      bank_version_id: await currentBankVersion(trx),
    });
    await insertAuditEntry(trx, {
      ...auditedBy(person),
      action: 'estimate.saved',
      objectType: 'estimate',
      objectId: estimate.id,
      summary: { name: input.name },
    });
    return { estimate };
  });
}
