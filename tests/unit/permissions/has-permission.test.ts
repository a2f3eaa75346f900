import { describe, expect, it, test } from 'vitest';
import {
  type Action,
  type Actor,
  FIRM_ROLES,
  type FirmRole,
  hasPermission,
  PLATFORM_ROLES,
  type PlatformRole,
  type Resource,
  STATEMENT,
} from '../../../src/lib/permissions/roles';

/*
 * The expected grants, written by hand from the product's roles table and the README's "Who may do what"
 * (and, for reading submissions and estimates, the README's API table), never derived from roles.ts.
 *
 * Platform columns: 'yes' holds everywhere, 'own firm' only while the person has a firm active, 'no' never.
 * Firm columns: 'yes' holds while that firm is the active one (firm roles count only inside their firm).
 * A person's grants are those of the platform role and the firm role together (the rule stated with the roles
 * table). So a data steward who is also a member of a firm holds that firm role's grants inside that firm; the
 * product's "a steward never sees firm-private fields" is read as: never through the steward role.
 */
type PlatformCell = 'yes' | 'own firm' | 'no';
type FirmCell = 'yes' | 'no';
interface Row {
  capability: string;
  platform: { admin: PlatformCell; steward: PlatformCell; user: PlatformCell };
  firm: { owner: FirmCell; admin: FirmCell; engineer: FirmCell; estimator: FirmCell; contributor: FirmCell };
}

const EXPECTED: Record<string, Row> = {
  'bank:browse': {
    capability: 'browse published test records (an estimator gets statistics only)',
    platform: { admin: 'yes', steward: 'yes', user: 'no' },
    firm: { owner: 'yes', admin: 'yes', engineer: 'yes', estimator: 'no', contributor: 'yes' },
  },
  'bank:statistics': {
    capability: 'statistics and correlations',
    platform: { admin: 'yes', steward: 'yes', user: 'no' },
    firm: { owner: 'yes', admin: 'yes', engineer: 'yes', estimator: 'yes', contributor: 'yes' },
  },
  'record:read-private': {
    capability: "see own firm's private fields (a steward never does)",
    platform: { admin: 'own firm', steward: 'no', user: 'no' },
    firm: { owner: 'yes', admin: 'yes', engineer: 'yes', estimator: 'yes', contributor: 'yes' },
  },
  'submission:create': {
    capability: 'upload submissions for own firm',
    platform: { admin: 'own firm', steward: 'no', user: 'no' },
    firm: { owner: 'yes', admin: 'yes', engineer: 'yes', estimator: 'no', contributor: 'yes' },
  },
  'submission:read': {
    capability: "read the firm's submissions (the upload roles; stewards read them through review)",
    platform: { admin: 'own firm', steward: 'no', user: 'no' },
    firm: { owner: 'yes', admin: 'yes', engineer: 'yes', estimator: 'no', contributor: 'yes' },
  },
  'submission:review': {
    capability: 'review, accept, return submissions',
    platform: { admin: 'no', steward: 'yes', user: 'no' },
    firm: { owner: 'no', admin: 'no', engineer: 'no', estimator: 'no', contributor: 'no' },
  },
  'estimate:create': {
    capability: 'create and save estimates',
    platform: { admin: 'own firm', steward: 'no', user: 'no' },
    firm: { owner: 'yes', admin: 'yes', engineer: 'yes', estimator: 'yes', contributor: 'no' },
  },
  'estimate:read': {
    capability: "read the firm's saved estimates (the estimate roles)",
    platform: { admin: 'own firm', steward: 'no', user: 'no' },
    firm: { owner: 'yes', admin: 'yes', engineer: 'yes', estimator: 'yes', contributor: 'no' },
  },
  'vocabulary:manage': {
    capability: 'manage regions and geological units',
    platform: { admin: 'yes', steward: 'yes', user: 'no' },
    firm: { owner: 'no', admin: 'no', engineer: 'no', estimator: 'no', contributor: 'no' },
  },
  'firm:manage-members': {
    capability: 'manage firm members and invitations',
    platform: { admin: 'no', steward: 'no', user: 'no' },
    firm: { owner: 'yes', admin: 'yes', engineer: 'no', estimator: 'no', contributor: 'no' },
  },
  'firm:manage-api-keys': {
    capability: "manage the firm's API keys",
    platform: { admin: 'no', steward: 'no', user: 'no' },
    firm: { owner: 'yes', admin: 'yes', engineer: 'no', estimator: 'no', contributor: 'no' },
  },
  'firm:read-audit': {
    capability: "read the firm's audit log",
    platform: { admin: 'no', steward: 'no', user: 'no' },
    firm: { owner: 'yes', admin: 'yes', engineer: 'no', estimator: 'no', contributor: 'no' },
  },
  'audit:read-all': {
    capability: 'read the whole audit log',
    platform: { admin: 'yes', steward: 'no', user: 'no' },
    firm: { owner: 'no', admin: 'no', engineer: 'no', estimator: 'no', contributor: 'no' },
  },
  'bank:versions': {
    capability: 'list the bank versions (who published what, when)',
    platform: { admin: 'yes', steward: 'yes', user: 'no' },
    firm: { owner: 'no', admin: 'no', engineer: 'no', estimator: 'no', contributor: 'no' },
  },
  'people:manage': {
    capability: 'list people and firms, suspend a person, pass a firm to a new owner',
    platform: { admin: 'yes', steward: 'no', user: 'no' },
    firm: { owner: 'no', admin: 'no', engineer: 'no', estimator: 'no', contributor: 'no' },
  },
  'settings:manage': {
    capability: 'change bank-wide settings (the disclosure thresholds)',
    platform: { admin: 'yes', steward: 'no', user: 'no' },
    firm: { owner: 'no', admin: 'no', engineer: 'no', estimator: 'no', contributor: 'no' },
  },
};

const PERMISSIONS = (Object.keys(STATEMENT) as Resource[]).flatMap((resource) =>
  (STATEMENT[resource] as readonly string[]).map((action) => `${resource}:${action}`),
);

function expected(platformRole: PlatformRole, firmRole: FirmRole | null, firmActive: boolean, permission: string): boolean {
  const row = EXPECTED[permission];
  if (!row) throw new Error(`No expectation for ${permission}`);
  const platform = row.platform[platformRole];
  if (platform === 'yes') return true;
  if (!firmActive) return false;
  return platform === 'own firm' || (firmRole !== null && row.firm[firmRole] === 'yes');
}

function actual(actor: Actor | null, permission: string): boolean {
  const [resource, action] = permission.split(':') as [Resource, string];
  return hasPermission(actor, resource, action as Action<typeof resource>);
}

const ACTORS = PLATFORM_ROLES.flatMap((platformRole) => [
  { label: `${platformRole}, no firm`, platformRole, firmRole: null, firmActive: false },
  ...FIRM_ROLES.flatMap((firmRole) => [
    { label: `${platformRole}, firm ${firmRole}, firm active`, platformRole, firmRole, firmActive: true },
    { label: `${platformRole}, firm ${firmRole}, no firm active`, platformRole, firmRole, firmActive: false },
  ]),
]) satisfies { label: string; platformRole: PlatformRole; firmRole: FirmRole | null; firmActive: boolean }[];

describe('hasPermission over the whole roles table', () => {
  it('has an expectation for every permission and a column for every role, and no more', () => {
    expect(Object.keys(EXPECTED).sort()).toEqual([...PERMISSIONS].sort());
    for (const row of Object.values(EXPECTED)) {
      expect(Object.keys(row.platform).sort()).toEqual([...PLATFORM_ROLES].sort());
      expect(Object.keys(row.firm).sort()).toEqual([...FIRM_ROLES].sort());
    }
  });

  test.each(ACTORS)('$label', ({ platformRole, firmRole, firmActive }) => {
    const actor: Actor = { userId: 'u1', platformRole, firmId: firmActive ? 'f1' : null, firmRole };
    const got = Object.fromEntries(PERMISSIONS.map((p) => [p, actual(actor, p)]));
    const want = Object.fromEntries(PERMISSIONS.map((p) => [p, expected(platformRole, firmRole, firmActive, p)]));
    expect(got).toEqual(want);
  });

  it('grants nothing to nobody (no session)', () => {
    expect(PERMISSIONS.filter((p) => actual(null, p))).toEqual([]);
  });

  it('reads the table as written: spot checks of single cells', () => {
    const member = (platformRole: PlatformRole, firmRole: FirmRole | null, firmId: string | null): Actor => ({
      userId: 'u1',
      platformRole,
      firmId,
      firmRole,
    });
    expect(hasPermission(member('user', 'estimator', 'f1'), 'bank', 'browse')).toBe(false);
    expect(hasPermission(member('user', 'estimator', 'f1'), 'bank', 'statistics')).toBe(true);
    expect(hasPermission(member('steward', null, null), 'submission', 'review')).toBe(true);
    expect(hasPermission(member('steward', null, 'f1'), 'record', 'read-private')).toBe(false);
    expect(hasPermission(member('steward', null, null), 'record', 'read-private')).toBe(false);
    expect(hasPermission(member('admin', null, null), 'estimate', 'create')).toBe(false);
    expect(hasPermission(member('admin', 'contributor', 'f1'), 'estimate', 'create')).toBe(true);
    expect(hasPermission(member('admin', 'contributor', 'f1'), 'firm', 'manage-api-keys')).toBe(false);
    expect(hasPermission(member('user', 'owner', null), 'firm', 'manage-members')).toBe(false);
  });
});
