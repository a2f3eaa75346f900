import type { SampleQualityClass } from '../../../src/lib/import/sample-quality';
import type { DemoIncrement } from './curve';

export type { SampleQualityClass } from '../../../src/lib/import/sample-quality';
export type { DemoIncrement } from './curve';

/** The deliberate, plausible-looking mistakes planted for the data steward to catch. */
export type PlantedOutlierKind = 'stress-in-psf' | 'peat-labelled-as-silt' | 'depth-in-feet' | 'permeability-in-cm-per-s';

/**
 * The import fields of src/lib/import/fields.ts, in the bank's SI units (depth m, stress kPa,
 * cv m²/yr, unit weight kN/m³, mv m²/MN, k m/s, percentages %); null leaves the cell blank.
 */
export interface DemoRecordFields {
  projectName: string | null;
  clientName: string | null;
  boreholeId: string | null;
  sampleId: string | null;
  easting: number | null;
  northing: number | null;
  latitude: number | null;
  longitude: number | null;
  coordinateSystem: string | null;
  notes: string | null;
  region: string | null;
  geologicalUnit: string | null;
  locationCell: string | null;
  depthTop: number | null;
  depthBottom: number | null;
  uscsSymbol: string | null;
  samplingMethod: string | null;
  waterContentPct: number | null;
  liquidLimitPct: number | null;
  plasticLimitPct: number | null;
  plasticityIndexPct: number | null;
  specificGravity: number | null;
  bulkUnitWeight: number | null;
  initialVoidRatio: number | null;
  organicContentPct: number | null;
  testMethod: string | null;
  testStandard: string | null;
  compressionIndex: number | null;
  recompressionIndex: number | null;
  preconsolidationStress: number | null;
  verticalEffectiveStress: number | null;
  overconsolidationRatio: number | null;
  cvNc: number | null;
  cvOc: number | null;
  secondaryCompressionIndex: number | null;
  mv: number | null;
  permeability: number | null;
  deltaEOverE0: number | null;
}

/** An invented test record: the import fields plus what a seeder needs beside them. */
export interface DemoRecord extends DemoRecordFields {
  /** slug of the invented firm that contributes it (scripts/demo/people.ts) */
  firmSlug: string;
  /**
   * from Δe/e0 and the record's OCR as the importer works it out (Lunne, Berre & Strandvik 1997):
   * 1 very good to excellent … 4 very poor; null where OCR is above 4 and the classes are not defined
   */
  sampleQualityClass: SampleQualityClass | null;
  /** incremental-loading steps, for about a third of the records; null otherwise */
  increments: DemoIncrement[] | null;
  /** set on the planted mistakes only; never part of the CSV */
  plantedOutlier: PlantedOutlierKind | null;
}
