import type { APIContext } from 'astro';
import { type Action, hasPermission, type Resource } from '../../permissions/roles';
import { recordAudit } from '../audit/audit-log';
import type { ResolvedIdentity } from '../auth/resolve-actor';
import { ApiError } from './api-error';

type Context = Pick<APIContext, 'locals' | 'request' | 'url' | 'clientAddress'>;

/** True when the request carries a firm API key rather than (or besides) a session. */
function carriesApiKey(request: Request): boolean {
  return request.headers.has('x-api-key') || /^Bearer\s+cbk_/i.test(request.headers.get('authorization') ?? '');
}

/**
 * 401 unless someone is signed in. A firm API key sent here is named for what it is: keys work only on
 * the partner endpoints.
 */
export function requireIdentity(context: Context): ResolvedIdentity {
  const identity = context.locals.identity;
  if (identity) return identity;
  if (carriesApiKey(context.request)) {
    throw new ApiError(
      'UNAUTHENTICATED',
      `${context.request.method} ${context.url.pathname} needs a signed-in session; a firm API key is accepted only by the partner endpoints: POST /api/partner/submissions (upload test records) and GET /api/partner/whoami. The API page (/api-guide) and GET /api/openapi.json describe them.`,
    );
  }
  throw new ApiError('UNAUTHENTICATED', 'Sign in first; your session may have expired.');
}

/** Records a refused request in the audit log. */
export async function auditRefusal(context: Context, identity: ResolvedIdentity, reason: Record<string, unknown>): Promise<void> {
  await recordAudit(context.locals.app.db, {
    actorUserId: identity.user.id,
    firmId: identity.actor.firmId,
    action: 'permission.refused',
    outcome: 'refused',
    summary: { method: context.request.method, path: context.url.pathname, ...reason },
    ipAddress: context.clientAddress,
  });
}

/** 401 when signed out; 403 (and an audit entry) when the person's roles do not grant the action. */
export async function requirePermission<R extends Resource>(
  context: Context,
  resource: R,
  action: Action<R>,
): Promise<ResolvedIdentity> {
  const identity = requireIdentity(context);
  if (hasPermission(identity.actor, resource, action)) return identity;
  await auditRefusal(context, identity, { resource, action });
  const needsFirm = !identity.actor.firmId && identity.memberships.length > 0;
  throw new ApiError(
    'FORBIDDEN',
    needsFirm
      ? 'Choose one of your firms in the header first; this needs a firm.'
      : `Your role does not allow this (${resource}: ${action}). Ask your firm owner or the platform admin if you need it.`,
  );
}

/** The active firm of a person who passed a firm-scoped permission check. */
export function activeFirmId(identity: ResolvedIdentity): string {
  if (!identity.actor.firmId) throw new ApiError('FORBIDDEN', 'Choose one of your firms in the header first; this needs a firm.');
  return identity.actor.firmId;
}

/** Like requirePermission, but any one of several grants will do. */
export async function requireAnyPermission(context: Context, grants: readonly [Resource, string][]): Promise<ResolvedIdentity> {
  const identity = requireIdentity(context);
  if (grants.some(([resource, action]) => hasPermission(identity.actor, resource, action as never))) return identity;
  await auditRefusal(context, identity, { anyOf: grants.map(([resource, action]) => `${resource}:${action}`) });
  throw new ApiError('FORBIDDEN', 'Your role does not allow this. Ask your firm owner or the platform admin if you need it.');
}
