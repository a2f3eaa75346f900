import type { FirmRole } from '../../lib/permissions/roles';

/** Shapes the firm endpoints answer with (see the API contract in the README). */
export interface FirmMember {
  memberId: string;
  userId: string;
  name: string;
  email: string;
  role: FirmRole;
  joinedAt: string;
}

export interface FirmInvitation {
  id: string;
  email: string;
  role: FirmRole;
  status: string;
  expiresAt: string;
}

export interface FirmOverview {
  firm: { id: string; name: string; slug: string };
  myRole: FirmRole;
  members: FirmMember[];
  invitations: FirmInvitation[];
}

export interface FirmApiKey {
  id: string;
  name: string;
  start: string | null;
  createdAt: string;
  lastUsedAt: string | null;
  enabled: boolean;
}

const DATE = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });

/** A date as "3 Dec 2026", or a dash when there is none. */
export function formatDate(value: string | null | undefined): string {
  if (!value) return '—';
  const date = new Date(value);
  return Number.isNaN(date.getTime()) ? '—' : DATE.format(date);
}
