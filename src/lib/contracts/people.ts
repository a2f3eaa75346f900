import type { FirmRole, PlatformRole } from '../permissions/roles';

export {
  type DirectoryQuery,
  directoryQuerySchema,
  type PassOwnershipInput,
  passOwnershipSchema,
  type SuspendPersonInput,
  suspendPersonSchema,
} from '../schemas/people';

/** A person as the admin area lists them. */
export interface PersonEntry {
  id: string;
  name: string;
  email: string;
  platformRole: PlatformRole;
  emailVerified: boolean;
  suspended: boolean;
  suspendedReason: string | null;
  createdAt: Date;
  firms: { firmId: string; firmName: string; role: FirmRole }[];
}

/** `GET /api/admin/people` */
export interface PeopleList {
  people: PersonEntry[];
  total: number;
}

/** A firm as the admin area lists it, with its members (for passing ownership). */
export interface FirmEntry {
  id: string;
  name: string;
  createdAt: Date;
  members: { memberId: string; userId: string; name: string; email: string; role: FirmRole }[];
}

/** `GET /api/admin/firms` */
export interface FirmDirectory {
  firms: FirmEntry[];
  total: number;
}

/** `POST /api/admin/people/:id/suspension` */
export interface SuspensionResult {
  person: PersonEntry;
}

/** `POST /api/admin/firms/:id/ownership` */
export interface OwnershipResult {
  firm: FirmEntry;
  newOwner: { userId: string; name: string };
  previousOwners: { userId: string; name: string }[];
}
