import type { ResolvedIdentity } from '../auth/resolve-actor';
import type { TenantScope } from './tenant-transaction';

/** The row-level-security scope of a signed-in person: their active firm and platform role. */
export function scopeOf(identity: ResolvedIdentity): TenantScope {
  return { firmId: identity.actor.firmId, platformRole: identity.actor.platformRole };
}
