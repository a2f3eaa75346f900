/**
 * Who is acting, as the audit log records it: the person (null for a firm's API key or the system),
 * the firm they act for, and the client address. Built once per request by the helpers in
 * `http/acting.ts`; services take it as it is.
 */
export interface ActingPerson {
  userId: string | null;
  firmId: string | null;
  ipAddress: string | null;
}
