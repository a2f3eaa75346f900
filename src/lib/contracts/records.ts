/** Test records as the API answers with them; values in the bank's SI units, named with their units. */

export const TEST_RECORD_STATUSES = ['pending', 'returned', 'published', 'rejected', 'withdrawn'] as const;
export type TestRecordStatus = (typeof TEST_RECORD_STATUSES)[number];

/** A flag raised on import for the steward: free text in a shared field that may identify a site. */
export interface ImportFlag {
  field: string;
  reason: string;
}

/** The shared (anonymised) values of a test record: what every firm may see once it is published. */
export interface SharedRecord {
  id: string;
  status: TestRecordStatus;
  bankVersion: number | null;
  recordKind: string;
  region: string;
  geologicalUnit: string;
  locationCell: string | null;
  depthTopM: number;
  depthBottomM: number;
  /** ASTM D2487 group symbol */
  uscsSymbol: string | null;
  samplingMethod: string | null;
  waterContentPct: number | null;
  liquidLimitPct: number | null;
  plasticLimitPct: number | null;
  plasticityIndexPct: number | null;
  specificGravity: number | null;
  bulkUnitWeightKnPerM3: number | null;
  initialVoidRatio: number | null;
  organicContentPct: number | null;
  testMethod: string | null;
  testStandard: string | null;
  /** Cc */
  compressionIndex: number | null;
  /** Cr */
  recompressionIndex: number | null;
  /** σ'p */
  preconsolidationStressKpa: number | null;
  /** σ'v0 at the sample depth */
  verticalEffectiveStressKpa: number | null;
  overconsolidationRatio: number | null;
  cvNcM2PerYear: number | null;
  cvOcM2PerYear: number | null;
  /** Cα */
  secondaryCompressionIndex: number | null;
  mvM2PerMn: number | null;
  permeabilityMPerS: number | null;
  /** Δe/e0, the sample quality measure of Lunne et al. (1997) */
  deltaEOverE0: number | null;
  sampleQualityClass: number | null;
}

/** The firm-private values of a test record: only its own firm sees them. */
export interface PrivateRecord {
  projectName: string | null;
  clientName: string | null;
  boreholeId: string | null;
  sampleId: string | null;
  eastingM: number | null;
  northingM: number | null;
  latitudeDeg: number | null;
  longitudeDeg: number | null;
  coordinateSystem: string | null;
  notes: string | null;
}

/** cv, Cα, mv and k over one stress increment of a test. */
export interface StressLevel {
  stressFromKpa: number;
  stressToKpa: number;
  stressRange: string;
  cvM2PerYear: number | null;
  secondaryCompressionIndex: number | null;
  mvM2PerMn: number | null;
  permeabilityMPerS: number | null;
  cvMethod: string | null;
}

/** `GET /api/records`: published records and the caller's firm's own. */
export interface RecordList {
  total: number;
  limit: number;
  offset: number;
  records: (SharedRecord & { mine: boolean })[];
}

/** `GET /api/records/:id`; `private` only for the owning firm (null when it has none stored). */
export interface RecordDetail {
  record: SharedRecord & { mine: boolean; stressLevels: StressLevel[] };
  private?: PrivateRecord | null;
}

/**
 * A record's value by its API name (`compressionIndex`, `cvNcM2PerYear`), for tables that list their
 * columns by name; undefined when the record has no such value.
 */
export function recordValue(record: Partial<SharedRecord & PrivateRecord>, name: string): unknown {
  return Object.hasOwn(record, name) ? (record as Record<string, unknown>)[name] : undefined;
}
