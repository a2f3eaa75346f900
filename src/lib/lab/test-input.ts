/**
 * An incremental-loading oedometer test as the laboratory records it (ASTM D2435/D2435M, ISO 17892-5).
 * Units: lengths and deformations mm, stress kPa, time minutes since the increment was applied,
 * mass g, water content %. Deformation is the settlement of the specimen since the start of the test
 * (compression positive), read at the same datum for increments and time readings.
 */
export interface SpecimenInput {
  /** initial specimen height, mm */
  initialHeightMm: number | null;
  /** specimen diameter, mm */
  diameterMm: number | null;
  /** initial water content, % */
  waterContentPct?: number | null;
  /** specific gravity of the soil particles, Gs */
  specificGravity?: number | null;
  /** oven-dry mass of the specimen, g */
  dryMassG?: number | null;
  /** initial void ratio e0, when the laboratory gives it */
  initialVoidRatio?: number | null;
}

/** One reading of deformation against elapsed time within an increment. */
export interface TimeReading {
  /** minutes since the increment was applied (≥ 0) */
  elapsedMin: number;
  /** settlement since the start of the test, mm */
  deformationMm: number;
}

export interface IncrementInput {
  /** the laboratory's increment number, from 1 */
  incrementNo: number;
  /** applied vertical stress during the increment, kPa (≥ 0) */
  stressKpa: number;
  /** settlement since the start of the test at the end of the increment, mm */
  deformationMm?: number | null;
  /** void ratio at the end of the increment, when given instead of the deformation (AGS4 CONS_INCE) */
  voidRatio?: number | null;
  /** time–deformation readings of this increment, when recorded */
  readings?: readonly TimeReading[];
}

/** Drainage of the specimen during an increment: both faces (the usual oedometer) or one face. */
export type SpecimenDrainage = 'double' | 'single';

export interface IncrementalTestInput {
  specimen: SpecimenInput;
  /** in the order applied (increment numbers ascending) */
  increments: readonly IncrementInput[];
  /** default 'double' */
  drainage?: SpecimenDrainage;
}
