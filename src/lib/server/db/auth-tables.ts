import type { ColumnType, Generated } from 'kysely';
import type { Timestamp } from './schema';

/** better-auth's tables (camelCase columns, text ids), as far as our own queries read them. */
export interface UserTable {
  id: string;
  name: string;
  email: string;
  emailVerified: boolean;
  image: string | null;
  createdAt: Timestamp;
  updatedAt: Timestamp;
  role: string | null;
  banned: boolean | null;
  banReason: string | null;
  banExpires: Date | null;
}

export interface OrganizationTable {
  id: string;
  name: string;
  slug: string;
  logo: string | null;
  createdAt: Timestamp;
  metadata: string | null;
}

export interface MemberTable {
  id: string;
  organizationId: string;
  userId: string;
  role: string;
  createdAt: Timestamp;
}

export interface InvitationTable {
  id: string;
  organizationId: string;
  email: string;
  role: string | null;
  status: string;
  expiresAt: Timestamp;
  createdAt: Timestamp;
  inviterId: string;
}

export interface SessionTable {
  id: string;
  expiresAt: Timestamp;
  token: string;
  createdAt: Timestamp;
  updatedAt: Timestamp;
  ipAddress: string | null;
  userAgent: string | null;
  userId: string;
  activeOrganizationId: string | null;
  impersonatedBy: string | null;
}

export interface ApiKeyTable {
  id: string;
  configId: string;
  name: string | null;
  start: string | null;
  referenceId: string;
  prefix: string | null;
  enabled: boolean | null;
  lastRequest: Date | null;
  expiresAt: Date | null;
  createdAt: Timestamp;
  permissions: string | null;
}

export interface RateLimitBucketTable {
  key: string;
  window_started_ms: number;
  count: number;
}

export interface AuditLogTable {
  id: Generated<number>;
  occurred_at: Timestamp;
  actor_user_id: string | null;
  firm_id: string | null;
  action: string;
  outcome: 'ok' | 'refused' | 'failed';
  object_type: string | null;
  object_id: string | null;
  summary: ColumnType<Record<string, unknown>, string | undefined, string>;
  ip_address: string | null;
}

export interface AuthTables {
  user: UserTable;
  organization: OrganizationTable;
  member: MemberTable;
  invitation: InvitationTable;
  session: SessionTable;
  apikey: ApiKeyTable;
  rate_limit_bucket: RateLimitBucketTable;
  audit_log: AuditLogTable;
}
