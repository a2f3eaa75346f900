import type { CallResult } from './world';

/**
 * The people the access matrix acts as. Firm A is Quillfen, firm B is Ellery & Voss (demo seed).
 * The platform admin and the steward belong to no firm.
 */
export const ROLES = ['anon', 'platformAdmin', 'steward', 'aOwner', 'aEngineer', 'aEstimator', 'aContributor', 'bAdmin'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_EMAILS: Record<Exclude<Role, 'anon'>, string> = {
  platformAdmin: 'admin@example.test',
  steward: 'steward@example.test',
  aOwner: 'owner@quillfen.example.test',
  aEngineer: 'engineer@quillfen.example.test',
  aEstimator: 'estimator@quillfen.example.test',
  aContributor: 'contributor@quillfen.example.test',
  bAdmin: 'admin@ellery-voss.example.test',
};

export const FIRM_OF: Record<Role, 'A' | 'B' | null> = {
  anon: null,
  platformAdmin: null,
  steward: null,
  aOwner: 'A',
  aEngineer: 'A',
  aEstimator: 'A',
  aContributor: 'A',
  bAdmin: 'B',
};

/** What one cell expects: a status, or a status with a check of the answer. */
export type Expectation =
  | number
  | {
      status: number;
      check?: (result: CallResult) => void;
      /** act with a new session of the same person (for calls that end the session) */
      freshSession?: boolean;
      /** act as a new member with the same firm role (for calls that would change the person's own membership) */
      standIn?: boolean;
      /** search the answer for private details only, not ids (the audit log quotes requested paths) */
      privateMarkersOnly?: boolean;
    };

/** The same expectation for every role, with some overridden. */
export function everyone(status: Expectation, overrides: Partial<Record<Role, Expectation>> = {}): Record<Role, Expectation> {
  return Object.fromEntries(ROLES.map((role) => [role, overrides[role] ?? status])) as Record<Role, Expectation>;
}
