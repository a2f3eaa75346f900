import type { Genesis } from '../schemas/vocabulary';

export {
  type CreateRegionInput,
  type CreateUnitInput,
  createRegionSchema,
  createUnitSchema,
  GENESIS_VALUES,
  type Genesis,
  type MergeUnitInput,
  mergeUnitSchema,
  type RetireInput,
  retireSchema,
  type UpdateRegionInput,
  type UpdateUnitInput,
  updateRegionSchema,
  updateUnitSchema,
} from '../schemas/vocabulary';

export interface Region {
  id: string;
  name: string;
  slug: string;
  description: string | null;
  /** other names uploads may use: earlier names, names of units merged into it */
  synonyms: string[];
  /** set when retired: no new uploads; its records stay */
  retiredAt: Date | null;
}

export interface GeologicalUnit extends Region {
  genesis: Genesis;
  age: string | null;
  typicalRegionId: string | null;
  /** the unit that absorbed this one and its records */
  mergedIntoId: string | null;
}

/** A vocabulary entry as the admin area lists it, with the test records that name it. */
export type CuratedRegion = Region & { recordCount: number };
export type CuratedUnit = GeologicalUnit & { recordCount: number };

/** `GET /api/admin/vocabulary` */
export interface CuratedVocabulary {
  regions: CuratedRegion[];
  units: CuratedUnit[];
}

/** `POST /api/vocabulary/units/:id/merge` */
export interface MergedUnit {
  unit: GeologicalUnit;
  into: GeologicalUnit;
  movedRecords: number;
  movedPublishedRecords: number;
  /** the bank version that records the move, when published records moved */
  bankVersion: number | null;
}

/** `GET /api/vocabulary` */
export interface Vocabulary {
  regions: Region[];
  units: GeologicalUnit[];
}
