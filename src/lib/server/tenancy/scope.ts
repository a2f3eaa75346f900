import type { ResolvedIdentity } from '../auth/resolve-actor';
import type { TenantScope } from './tenant-transaction';

/** The row-level-security scope of a signed-in person: their active firm and platform role. */
export function scopeOf(identity: ResolvedIdentity): TenantScope {
  return { firmId: identity.actor.firmId, platformRole: identity.actor.platformRole };
}

/** The scope of work done for one firm (its uploads, corrections, own submissions), whoever does it. */
export function firmScope(firmId: string): TenantScope {
  return { firmId, platformRole: 'user' };
}

/** The scope of the data stewards' work: every firm's submissions past draft, no firm's private details. */
export const STEWARD_SCOPE: TenantScope = { firmId: null, platformRole: 'steward' };
