import type { FieldMappingAnswer } from '../../contracts/submissions';
import { mappingToRemember, type RememberedMapping } from '../../import';
import type { AppServices } from '../app-services';
import { firmScope } from '../tenancy/scope';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import { findFieldMapping, upsertFieldMapping } from './field-mapping-repository';
import type { PreparedColumns } from './prepare-upload';

/** The column choices the firm made last time (header → field and unit), to pre-fill the mapping. */
export async function rememberedMapping(app: Pick<AppServices, 'db'>, firmId: string): Promise<RememberedMapping> {
  const row = await inTenantTransaction(app.db, firmScope(firmId), (trx) => findFieldMapping(trx, firmId));
  return (row?.mapping ?? {}) as RememberedMapping;
}

/** `GET /api/firm/field-mapping` */
export async function fieldMappingOf(app: Pick<AppServices, 'db'>, firmId: string): Promise<FieldMappingAnswer> {
  return { mapping: await rememberedMapping(app, firmId) };
}

/** Keeps an upload's column choices for the firm's next upload. */
export async function rememberMapping(app: Pick<AppServices, 'db'>, firmId: string, columns: PreparedColumns): Promise<void> {
  const mapping = JSON.stringify(mappingToRemember(columns.headers, columns.mapping, columns.units));
  await inTenantTransaction(app.db, firmScope(firmId), (trx) => upsertFieldMapping(trx, firmId, mapping));
}
