import type { APIContext } from 'astro';
import type { ActingPerson } from '../audit/acting-person';
import type { FirmKeyCaller } from '../auth/firm-key';
import type { ResolvedIdentity } from '../auth/resolve-actor';
import type { Contributor } from '../contribute/contributor';
import type { FirmCaller } from '../firms/firm-caller';
import { activeFirmId } from './guards';

type Context = Pick<APIContext, 'clientAddress' | 'request'>;

/** The signed-in person as the audit log records them: their id, their active firm (if any), their address. */
export function actingPerson(context: Context, identity: ResolvedIdentity): ActingPerson & { userId: string } {
  return { userId: identity.user.id, firmId: identity.actor.firmId, ipAddress: context.clientAddress };
}

/** A member contributing for their active firm from the browser (403 when no firm is active). */
export function contributorOf(context: Context, identity: ResolvedIdentity): Contributor {
  return { userId: identity.user.id, firmId: activeFirmId(identity), ipAddress: context.clientAddress, via: 'browser' };
}

/** A firm's script contributing with the firm's API key. */
export function keyContributorOf(context: Context, caller: FirmKeyCaller): Contributor {
  return { userId: null, firmId: caller.firmId, ipAddress: context.clientAddress, via: 'api', apiKeyId: caller.keyId };
}

/** The signed-in person asking better-auth for a firm operation, with their session headers. */
export function firmCallerOf(context: Context, identity: ResolvedIdentity): FirmCaller {
  return { identity, headers: context.request.headers, ipAddress: context.clientAddress };
}
