import type { NumberFieldKey, TextFieldKey } from '../../../src/lib/import/fields';
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
export type DemoRecordFields = { [K in TextFieldKey]: string | null } & { [K in NumberFieldKey]: number | null };

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
