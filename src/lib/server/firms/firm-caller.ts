import type { ResolvedIdentity } from '../auth/resolve-actor';

/**
 * The signed-in person asking for a firm operation. better-auth carries the operations out as that
 * person, so their request headers (the session cookie) travel along and it checks them again.
 */
export interface FirmCaller {
  identity: ResolvedIdentity;
  headers: Headers;
  ipAddress: string;
}
