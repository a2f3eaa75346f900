import { createAccessControl } from 'better-auth/plugins/access';
import { adminAc as adminPluginAdminAc, defaultStatements as adminPluginStatements } from 'better-auth/plugins/admin/access';
import { adminAc, defaultStatements, memberAc, ownerAc } from 'better-auth/plugins/organization/access';

/**
 * better-auth's own checks for the firm-management endpoints it serves (invitations, member roles,
 * API keys). Our product permissions live in src/lib/permissions/roles.ts; this only maps firm roles
 * onto better-auth's organization statements.
 */
const firmStatement = { ...defaultStatements, apiKey: ['create', 'read', 'update', 'delete'] } as const;
export const firmAccessControl = createAccessControl(firmStatement);

const manageKeys = { apiKey: ['create', 'read', 'update', 'delete'] } as const;

export const firmAccessRoles = {
  owner: firmAccessControl.newRole({ ...ownerAc.statements, ...manageKeys }),
  admin: firmAccessControl.newRole({ ...adminAc.statements, ...manageKeys }),
  engineer: firmAccessControl.newRole({ ...memberAc.statements }),
  estimator: firmAccessControl.newRole({ ...memberAc.statements }),
  contributor: firmAccessControl.newRole({ ...memberAc.statements }),
};

/** Platform roles for better-auth's admin plugin: only the platform admin manages users. */
export const platformAccessControl = createAccessControl(adminPluginStatements);
export const platformAccessRoles = {
  admin: platformAccessControl.newRole({ ...adminPluginAdminAc.statements }),
  steward: platformAccessControl.newRole({ user: [], session: [] }),
  user: platformAccessControl.newRole({ user: [], session: [] }),
};
