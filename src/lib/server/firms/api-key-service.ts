import { recordAudit } from '../audit/audit-log';
import { rethrowAuthError } from '../auth/auth-errors';
import { FIRM_KEY_CONFIG } from '../auth/create-auth';
import { ApiError } from '../http/api-error';
import type { FirmDeps } from './firm-service';
import { discardNewApiKey, withUndo } from './undo-create';

/** The firm's API keys, without their secrets (only the first characters are kept). */
export async function listApiKeys(deps: FirmDeps, firmId: string) {
  const keys = await deps.db
    .selectFrom('apikey')
    .select(['id', 'name', 'start', 'createdAt', 'lastRequest as lastUsedAt', 'enabled'])
    .where('configId', '=', FIRM_KEY_CONFIG)
    .where('referenceId', '=', firmId)
    .orderBy('createdAt', 'desc')
    .execute();
  return keys;
}

/** Creates a key that may only contribute to this firm; its secret is returned this once. */
export async function createApiKey(deps: FirmDeps, firmId: string, name: string) {
  try {
    const created = await deps.auth.api.createApiKey({
      headers: deps.headers,
      body: { configId: FIRM_KEY_CONFIG, name, organizationId: firmId },
    });
    await withUndo(
      () =>
        recordAudit(deps.db, {
          actorUserId: deps.identity.user.id,
          firmId,
          action: 'firm.api_key_created',
          objectType: 'api_key',
          objectId: created.id,
          summary: { name, start: created.start },
          ipAddress: deps.ipAddress,
        }),
      () => discardNewApiKey(deps.db, created.id),
    );
    return {
      key: { id: created.id, name: created.name, start: created.start, createdAt: created.createdAt },
      secret: created.key,
    };
  } catch (error) {
    rethrowAuthError(error);
  }
}

export async function revokeApiKey(deps: FirmDeps, firmId: string, keyId: string) {
  const key = await deps.db
    .selectFrom('apikey')
    .select(['id', 'name'])
    .where('id', '=', keyId)
    .where('configId', '=', FIRM_KEY_CONFIG)
    .where('referenceId', '=', firmId)
    .executeTakeFirst();
  if (!key) throw new ApiError('NOT_FOUND', 'There is no such API key in your active firm.');
  try {
    await deps.auth.api.deleteApiKey({ headers: deps.headers, body: { keyId, configId: FIRM_KEY_CONFIG } });
  } catch (error) {
    rethrowAuthError(error);
  }
  await recordAudit(deps.db, {
    actorUserId: deps.identity.user.id,
    firmId,
    action: 'firm.api_key_revoked',
    objectType: 'api_key',
    objectId: keyId,
    summary: { name: key.name },
    ipAddress: deps.ipAddress,
  });
}
