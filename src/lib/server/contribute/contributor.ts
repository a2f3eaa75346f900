import type { ActingPerson } from '../audit/acting-person';

/** Who contributes: a member for their active firm, or a firm's script with its API key. */
export interface Contributor extends ActingPerson {
  firmId: string;
  /** how the contribution came in, for the audit log */
  via: 'browser' | 'api' | 'seed';
  apiKeyId?: string | null;
}
