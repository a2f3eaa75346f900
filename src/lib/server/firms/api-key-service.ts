import type { ApiKeyList, CreatedApiKey } from '../../contracts/firms';
import type { AppServices } from '../app-services';
import { rethrowAuthError } from '../auth/auth-errors';
import { FIRM_KEY_CONFIG } from '../auth/create-auth';
import { NotFoundError } from '../errors';
import { auditFirmAction, readAsCaller } from './firm-audit';
import type { FirmCaller } from './firm-caller';
import { findFirmApiKey, listFirmApiKeys } from './firm-repository';
import { discardNewApiKey, withUndo } from './undo-create';

type FirmApp = Pick<AppServices, 'db' | 'auth'>;

/** The firm's API keys, without their secrets. */
export async function listApiKeys(app: FirmApp, caller: FirmCaller, firmId: string): Promise<ApiKeyList> {
  return { keys: await readAsCaller(app, caller, (trx) => listFirmApiKeys(trx, firmId)) };
}

/** Creates a key that may only contribute to this firm; its secret is returned this once. */
export async function createApiKey(app: FirmApp, caller: FirmCaller, firmId: string, name: string): Promise<CreatedApiKey> {
  let created: { id: string; name: string | null; start: string | null; createdAt: Date; key: string };
  try {
    created = await app.auth.api.createApiKey({
      headers: caller.headers,
      body: { configId: FIRM_KEY_CONFIG, name, organizationId: firmId },
    });
  } catch (error) {
    rethrowAuthError(error);
  }
  const made = created;
  await withUndo(
    () =>
      auditFirmAction(app, caller, {
        firmId,
        action: 'firm.api_key_created',
        objectType: 'api_key',
        objectId: made.id,
        summary: { name, start: made.start },
      }),
    () => discardNewApiKey(app, caller, made.id),
  );
  return {
    key: { id: created.id, name: created.name, start: created.start, createdAt: created.createdAt },
    secret: created.key,
  };
}

export async function revokeApiKey(app: FirmApp, caller: FirmCaller, firmId: string, keyId: string): Promise<void> {
  const key = await readAsCaller(app, caller, (trx) => findFirmApiKey(trx, firmId, keyId));
  if (!key) throw new NotFoundError('There is no such API key in your active firm.');
  try {
    await app.auth.api.deleteApiKey({ headers: caller.headers, body: { keyId, configId: FIRM_KEY_CONFIG } });
  } catch (error) {
    rethrowAuthError(error);
  }
  await auditFirmAction(app, caller, {
    firmId,
    action: 'firm.api_key_revoked',
    objectType: 'api_key',
    objectId: keyId,
    summary: { name: key.name },
  });
}
