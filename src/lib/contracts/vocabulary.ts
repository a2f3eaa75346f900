import type { Genesis } from '../schemas/vocabulary';

export {
  type CreateRegionInput,
  type CreateUnitInput,
  createRegionSchema,
  createUnitSchema,
  GENESIS_VALUES,
  type Genesis,
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
}

export interface GeologicalUnit extends Region {
  genesis: Genesis;
  age: string | null;
  typicalRegionId: string | null;
}

/** `GET /api/vocabulary` */
export interface Vocabulary {
  regions: Region[];
  units: GeologicalUnit[];
}
