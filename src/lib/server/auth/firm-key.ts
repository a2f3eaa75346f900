import { API_KEY_GRANTS } from '../../permissions/roles';
import { RateLimitedError, UnauthenticatedError } from '../errors';
import type { Auth } from './create-auth';
import { FIRM_KEY_CONFIG } from './create-auth';

export interface FirmKeyCaller {
  firmId: string;
  keyId: string;
  keyName: string | null;
}

/** The key from `x-api-key` or `Authorization: Bearer …`. */
function presentedKey(headers: Headers): string | null {
  const direct = headers.get('x-api-key');
  if (direct) return direct.trim();
  const bearer = /^Bearer\s+(\S+)$/i.exec(headers.get('authorization') ?? '');
  return bearer?.[1] ?? null;
}

/**
 * Authenticates a partner script by its firm API key and checks that the key holds the grants of a
 * firm key (roles.ts). The firm is the key's own; nothing in the request can name another.
 */
export async function authenticateFirmKey(auth: Auth, headers: Headers): Promise<FirmKeyCaller> {
  const key = presentedKey(headers);
  if (!key)
    throw new UnauthenticatedError(
      'Send your firm API key in the x-api-key header (a firm owner creates keys under Firm settings).',
    );
  const result = await auth.api.verifyApiKey({
    body: { key, configId: FIRM_KEY_CONFIG, permissions: { submission: [...API_KEY_GRANTS.submission] } },
  });
  if (!result.valid || !result.key) {
    if (result.error?.code === 'RATE_LIMITED') {
      throw new RateLimitedError('This API key has made too many requests in the last minute. Slow down and retry.', 60);
    }
    throw new UnauthenticatedError('This API key is not valid: it may be revoked, expired or mistyped.');
  }
  return { firmId: result.key.referenceId, keyId: result.key.id, keyName: result.key.name };
}
