import type { FirmRole } from '../permissions/roles';

export {
  changeMemberRoleSchema,
  createApiKeySchema,
  createFirmSchema,
  inviteMemberSchema,
  switchFirmSchema,
} from '../schemas/firm';

export interface FirmMember {
  memberId: string;
  userId: string;
  name: string;
  email: string;
  role: FirmRole;
  joinedAt: Date;
}

export interface FirmInvitation {
  id: string;
  email: string;
  role: FirmRole;
  status: string;
  expiresAt: Date;
}

/** `GET /api/firm`: invitations only for those who manage members (empty otherwise). */
export interface FirmOverview {
  firm: { id: string; name: string; slug: string };
  myRole: FirmRole | null;
  members: FirmMember[];
  invitations: FirmInvitation[];
}

/** `POST /api/firms` (201) */
export interface CreatedFirm {
  firm: { id: string; name: string; slug: string };
}

/** `POST /api/firm/invitations` (201) */
export interface SentInvitation {
  invitation: FirmInvitation;
}

/** `PATCH /api/firm/members/:memberId` */
export interface ChangedMember {
  member: { memberId: string; userId: string; role: FirmRole };
}

/** An API key without its secret: only its first characters are kept. */
export interface FirmApiKey {
  id: string;
  name: string | null;
  start: string | null;
  createdAt: Date;
  lastUsedAt: Date | null;
  enabled: boolean | null;
}

/** `GET /api/firm/api-keys` */
export interface ApiKeyList {
  keys: FirmApiKey[];
}

/** `POST /api/firm/api-keys` (201): the secret is in this answer only. */
export interface CreatedApiKey {
  key: Pick<FirmApiKey, 'id' | 'name' | 'start' | 'createdAt'>;
  secret: string;
}

/** `GET /api/invitations/:id`: an invitation addressed to the signed-in person. */
export interface InvitationForRecipient {
  invitation: FirmInvitation & { firmName: string };
}

/** `POST /api/invitations/:id/accept` */
export interface JoinedFirm {
  firm: { id: string; name: string };
}

/** `POST /api/session/active-firm` */
export interface ActiveFirm {
  activeFirm: { id: string; name: string; role: FirmRole };
}

/** `GET /api/partner/whoami`: the firm a key belongs to and what it may do (`resource:action`). */
export interface PartnerIdentity {
  firm: { id: string; name: string };
  key: { id: string; name: string | null };
  may: string[];
}
