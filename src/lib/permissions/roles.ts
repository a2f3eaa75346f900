/**
 * Who may do what, as data. Platform roles belong to a person; firm roles to a person within one
 * firm. A person's permissions are the union of both, and firm-scoped grants apply only inside the
 * firm that is active in their session.
 */
export const PLATFORM_ROLES = ['admin', 'steward', 'user'] as const;
export type PlatformRole = (typeof PLATFORM_ROLES)[number];

export const FIRM_ROLES = ['owner', 'admin', 'engineer', 'estimator', 'contributor'] as const;
export type FirmRole = (typeof FIRM_ROLES)[number];

/** Roles a firm owner or admin may give to members (ownership passes only by the owner). */
export const ASSIGNABLE_FIRM_ROLES = ['admin', 'engineer', 'estimator', 'contributor'] as const satisfies readonly FirmRole[];

export const STATEMENT = {
  bank: ['browse', 'statistics', 'versions'],
  record: ['read-private'],
  submission: ['create', 'read', 'review'],
  estimate: ['create', 'read'],
  vocabulary: ['manage'],
  firm: ['manage-members', 'manage-api-keys', 'read-audit'],
  audit: ['read-all'],
  people: ['manage'],
  settings: ['manage'],
} as const;

export type Resource = keyof typeof STATEMENT;
export type Action<R extends Resource> = (typeof STATEMENT)[R][number];
export type Grants = { [R in Resource]?: readonly Action<R>[] };

export const PLATFORM_ROLE_LABELS: Record<PlatformRole, string> = {
  admin: 'Platform admin',
  steward: 'Data steward',
  user: 'Member',
};

export const FIRM_ROLE_LABELS: Record<FirmRole, string> = {
  owner: 'Firm owner',
  admin: 'Firm admin',
  engineer: 'Engineer',
  estimator: 'Estimator',
  contributor: 'Contributor',
};

const engineerGrants = {
  bank: ['browse', 'statistics'],
  record: ['read-private'],
  submission: ['create', 'read'],
  estimate: ['create', 'read'],
} as const satisfies Grants;

const firmAdminGrants = {
  ...engineerGrants,
  firm: ['manage-members', 'manage-api-keys', 'read-audit'],
} as const satisfies Grants;

/** Grants of a firm role, valid only inside that firm. */
export const FIRM_ROLE_GRANTS: Record<FirmRole, Grants> = {
  owner: firmAdminGrants,
  admin: firmAdminGrants,
  engineer: engineerGrants,
  estimator: { bank: ['statistics'], record: ['read-private'], estimate: ['create', 'read'] },
  contributor: { bank: ['browse', 'statistics'], record: ['read-private'], submission: ['create', 'read'] },
};

/** Grants of a platform role: `everywhere` needs no firm; `inOwnFirm` applies inside the person's active firm. */
export const PLATFORM_ROLE_GRANTS: Record<PlatformRole, { everywhere: Grants; inOwnFirm: Grants }> = {
  admin: {
    everywhere: {
      bank: ['browse', 'statistics', 'versions'],
      vocabulary: ['manage'],
      audit: ['read-all'],
      people: ['manage'],
      settings: ['manage'],
    },
    inOwnFirm: { record: ['read-private'], submission: ['create', 'read'], estimate: ['create', 'read'] },
  },
  steward: {
    everywhere: { bank: ['browse', 'statistics', 'versions'], submission: ['review'], vocabulary: ['manage'] },
    inOwnFirm: {},
  },
  user: { everywhere: {}, inOwnFirm: {} },
};

/** Grants of a firm API key: a partner script may only contribute to the key's own firm. */
export const API_KEY_GRANTS = { submission: ['create'] } as const satisfies Grants;

/** Grants as `resource:action` strings, e.g. for an API answer. */
export function grantList(grants: Grants): string[] {
  return Object.entries(grants).flatMap(([resource, actions]) => (actions ?? []).map((action) => `${resource}:${action}`));
}

/** What the permission check needs to know about the person asking. */
export interface Actor {
  userId: string;
  platformRole: PlatformRole;
  /** The firm active in the session (never a firm id sent by the client). */
  firmId: string | null;
  firmRole: FirmRole | null;
}

function grantIncludes(grants: Grants, resource: Resource, action: string): boolean {
  return ((grants[resource] ?? []) as readonly string[]).includes(action);
}

/** The one permission check used by endpoints and pages. */
export function hasPermission<R extends Resource>(actor: Actor | null, resource: R, action: Action<R>): boolean {
  if (!actor) return false;
  const platform = PLATFORM_ROLE_GRANTS[actor.platformRole];
  if (grantIncludes(platform.everywhere, resource, action)) return true;
  if (!actor.firmId) return false;
  if (grantIncludes(platform.inOwnFirm, resource, action)) return true;
  return actor.firmRole !== null && grantIncludes(FIRM_ROLE_GRANTS[actor.firmRole], resource, action);
}

export function isPlatformRole(value: unknown): value is PlatformRole {
  return typeof value === 'string' && (PLATFORM_ROLES as readonly string[]).includes(value);
}

export function isFirmRole(value: unknown): value is FirmRole {
  return typeof value === 'string' && (FIRM_ROLES as readonly string[]).includes(value);
}
