import type { ColumnType, Generated, GeneratedAlways, Insertable, Selectable, Updateable } from 'kysely';
import type { ImportFlag, TestRecordStatus } from '../../contracts/records';
import type { SubmissionSourceKind, SubmissionStatus } from '../../contracts/submissions';
import type { SampleQualityClass } from '../../import/sample-quality';
import { TEST_METHODS, type TestMethod } from '../../import/test-method';
import { USCS_SYMBOLS, type UscsSymbol } from '../../import/uscs';
import { GENESIS_VALUES } from '../../schemas/vocabulary';
import type { Timestamp } from './schema';

// Tables of migrations/20261202T0200_bank_model.ts. The closed lists mirror the CHECK constraints there.

/** Closed list shared with the vocabulary schema (src/lib/schemas/vocabulary.ts). */
export const GENESES = GENESIS_VALUES;
export type Genesis = (typeof GENESES)[number];

export { TEST_RECORD_STATUSES, type TestRecordStatus } from '../../contracts/records';
export {
  SUBMISSION_SOURCE_KINDS,
  SUBMISSION_STATUSES,
  type SubmissionSourceKind,
  type SubmissionStatus,
} from '../../contracts/submissions';
/** ASTM D2487 group symbols, loading methods and sample quality classes: the import core's closed lists. */
export { type SampleQualityClass, TEST_METHODS, type TestMethod, USCS_SYMBOLS, type UscsSymbol };
export const RECORD_KINDS = ['oedometer', 'field_back_analysis'] as const;
export type RecordKind = (typeof RECORD_KINDS)[number];
export const STRESS_RANGES = ['NC', 'OC'] as const;
export type StressRange = (typeof STRESS_RANGES)[number];
export const CV_METHODS = ['root_time', 'log_time', 'crs', 'other'] as const;
export type CvMethod = (typeof CV_METHODS)[number];
export type UnitSystem = 'SI' | 'US';
export type SearchOperation = 'upsert' | 'delete';

/** A timestamp column that may be null. */
export type NullableTimestamp = ColumnType<Date | null, Date | string | null | undefined, Date | string | null>;
/** jsonb comes back parsed; it is written as a JSON string (pg would turn a JS array into a PostgreSQL array). */
export type JsonObject = { [key: string]: unknown };
type JsonColumn = ColumnType<JsonObject, string, string>;
type NullableJsonColumn = ColumnType<JsonObject | null, string | null | undefined, string | null>;

export interface RegionTable {
  id: Generated<string>;
  name: string;
  slug: string;
  description: string | null;
  synonyms: Generated<string[]>;
  retired_at: NullableTimestamp;
  created_by: string | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface GeologicalUnitTable {
  id: Generated<string>;
  name: string;
  slug: string;
  description: string | null;
  genesis: Genesis;
  age: string | null;
  typical_region_id: string | null;
  synonyms: Generated<string[]>;
  retired_at: NullableTimestamp;
  merged_into_id: string | null;
  created_by: string | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface BankVersionTable {
  id: GeneratedAlways<number>;
  published_at: Timestamp;
  published_by: string | null;
  note: string | null;
  record_count: Generated<number>;
}

export interface SubmissionTable {
  id: Generated<string>;
  firm_id: string;
  submitted_by: string | null;
  source_kind: SubmissionSourceKind;
  source_file_name: string | null;
  source_checksum_sha256: string | null;
  source_size_bytes: number | null;
  status: Generated<SubmissionStatus>;
  steward_comment: string | null;
  row_count: Generated<number>;
  submitted_at: NullableTimestamp;
  decided_at: NullableTimestamp;
  decided_by: string | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface SubmissionEventTable {
  id: Generated<number>;
  submission_id: string;
  occurred_at: Timestamp;
  actor_user_id: string | null;
  from_status: SubmissionStatus | null;
  to_status: SubmissionStatus;
  comment: string | null;
}

export interface TestRecordTable {
  id: Generated<string>;
  submission_id: string;
  firm_id: string;
  status: Generated<TestRecordStatus>;
  bank_version_id: number | null;
  record_kind: Generated<RecordKind>;
  region_id: string;
  location_cell: string | null;
  depth_top_m: number;
  depth_bottom_m: number;
  geological_unit_id: string;
  uscs_symbol: UscsSymbol | null;
  sampling_method: string | null;
  water_content_pct: number | null;
  liquid_limit_pct: number | null;
  plastic_limit_pct: number | null;
  plasticity_index_pct: number | null;
  specific_gravity: number | null;
  bulk_unit_weight_kn_per_m3: number | null;
  initial_void_ratio: number | null;
  organic_content_pct: number | null;
  test_method: TestMethod | null;
  test_standard: string | null;
  compression_index: number | null;
  recompression_index: number | null;
  preconsolidation_stress_kpa: number | null;
  vertical_effective_stress_kpa: number | null;
  overconsolidation_ratio: number | null;
  cv_nc_m2_per_year: number | null;
  cv_oc_m2_per_year: number | null;
  secondary_compression_index: number | null;
  mv_m2_per_mn: number | null;
  permeability_m_per_s: number | null;
  delta_e_over_e0: number | null;
  sample_quality_class: SampleQualityClass | null;
  /** the steward's comment when the record was returned (migration 20261202T0300) */
  review_comment: string | null;
  /** flags raised on import for the steward: [{ field, reason }] */
  import_flags: ColumnType<ImportFlag[], string | undefined, string>;
  /** row of the uploaded file the record came from */
  row_number: number | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export type { ImportFlag } from '../../contracts/records';

export interface TestRecordStressLevelTable {
  id: Generated<string>;
  test_record_id: string;
  stress_from_kpa: number;
  stress_to_kpa: number;
  stress_range: StressRange;
  cv_m2_per_year: number | null;
  secondary_compression_index: number | null;
  mv_m2_per_mn: number | null;
  permeability_m_per_s: number | null;
  cv_method: CvMethod | null;
}

export interface OedometerIncrementTable {
  id: Generated<string>;
  test_record_id: string;
  increment_no: number;
  applied_stress_kpa: number;
  is_unloading: Generated<boolean>;
  duration_hours: number | null;
  end_deformation_mm: number | null;
  end_void_ratio: number | null;
  specimen_height_mm: number | null;
}

export interface OedometerReadingTable {
  id: Generated<number>;
  increment_id: string;
  elapsed_minutes: number;
  deformation_mm: number;
}

export interface TestRecordPrivateTable {
  test_record_id: string;
  firm_id: string;
  project_name: string | null;
  client_name: string | null;
  borehole_id: string | null;
  sample_id: string | null;
  easting_m: number | null;
  northing_m: number | null;
  latitude_deg: number | null;
  longitude_deg: number | null;
  coordinate_system: string | null;
  notes: string | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface SubmissionFileTable {
  id: Generated<string>;
  submission_id: string;
  firm_id: string;
  storage_name: string;
  original_name: string;
  media_type: string;
  size_bytes: number;
  sha256: string;
  content: Buffer;
  created_at: Timestamp;
}

export interface EstimateTable {
  id: Generated<string>;
  firm_id: string;
  created_by: string | null;
  name: string;
  unit_system: Generated<UnitSystem>;
  input: JsonColumn;
  result_summary: NullableJsonColumn;
  bank_version_id: number | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface FieldMappingTable {
  id: Generated<string>;
  firm_id: string;
  name: string;
  mapping: JsonColumn;
  updated_at: Timestamp;
}

export interface SearchOutboxTable {
  id: Generated<number>;
  entity_type: string;
  entity_id: string;
  operation: SearchOperation;
  enqueued_at: Timestamp;
  processed_at: NullableTimestamp;
  attempts: Generated<number>;
  last_error: string | null;
}

export interface MailOutboxTable {
  id: Generated<number>;
  to_address: string;
  subject: string;
  body_text: string;
  body_html: string | null;
  kind: string;
  dedupe_key: string | null;
  created_at: Timestamp;
  send_after: Timestamp;
  sent_at: NullableTimestamp;
  attempts: Generated<number>;
  last_error: string | null;
}

/** The bank's tables, merged into Database in schema.ts. */
export interface BankTables {
  region: RegionTable;
  geological_unit: GeologicalUnitTable;
  bank_version: BankVersionTable;
  submission: SubmissionTable;
  submission_event: SubmissionEventTable;
  test_record: TestRecordTable;
  test_record_stress_level: TestRecordStressLevelTable;
  oedometer_increment: OedometerIncrementTable;
  oedometer_reading: OedometerReadingTable;
  test_record_private: TestRecordPrivateTable;
  submission_file: SubmissionFileTable;
  estimate: EstimateTable;
  field_mapping: FieldMappingTable;
  search_outbox: SearchOutboxTable;
  mail_outbox: MailOutboxTable;
}

export type Region = Selectable<RegionTable>;
export type NewRegion = Insertable<RegionTable>;
export type RegionUpdate = Updateable<RegionTable>;
export type GeologicalUnit = Selectable<GeologicalUnitTable>;
export type NewGeologicalUnit = Insertable<GeologicalUnitTable>;
export type GeologicalUnitUpdate = Updateable<GeologicalUnitTable>;
export type BankVersion = Selectable<BankVersionTable>;
export type NewBankVersion = Insertable<BankVersionTable>;
export type BankVersionUpdate = Updateable<BankVersionTable>;
export type Submission = Selectable<SubmissionTable>;
export type NewSubmission = Insertable<SubmissionTable>;
export type SubmissionUpdate = Updateable<SubmissionTable>;
export type SubmissionEvent = Selectable<SubmissionEventTable>;
export type NewSubmissionEvent = Insertable<SubmissionEventTable>;
export type TestRecord = Selectable<TestRecordTable>;
export type NewTestRecord = Insertable<TestRecordTable>;
export type TestRecordUpdate = Updateable<TestRecordTable>;
export type TestRecordStressLevel = Selectable<TestRecordStressLevelTable>;
export type NewTestRecordStressLevel = Insertable<TestRecordStressLevelTable>;
export type TestRecordStressLevelUpdate = Updateable<TestRecordStressLevelTable>;
export type OedometerIncrement = Selectable<OedometerIncrementTable>;
export type NewOedometerIncrement = Insertable<OedometerIncrementTable>;
export type OedometerIncrementUpdate = Updateable<OedometerIncrementTable>;
export type OedometerReading = Selectable<OedometerReadingTable>;
export type NewOedometerReading = Insertable<OedometerReadingTable>;
export type OedometerReadingUpdate = Updateable<OedometerReadingTable>;
export type TestRecordPrivate = Selectable<TestRecordPrivateTable>;
export type NewTestRecordPrivate = Insertable<TestRecordPrivateTable>;
export type TestRecordPrivateUpdate = Updateable<TestRecordPrivateTable>;
export type SubmissionFile = Selectable<SubmissionFileTable>;
export type NewSubmissionFile = Insertable<SubmissionFileTable>;
export type SubmissionFileUpdate = Updateable<SubmissionFileTable>;
export type Estimate = Selectable<EstimateTable>;
export type NewEstimate = Insertable<EstimateTable>;
export type EstimateUpdate = Updateable<EstimateTable>;
export type FieldMapping = Selectable<FieldMappingTable>;
export type NewFieldMapping = Insertable<FieldMappingTable>;
export type FieldMappingUpdate = Updateable<FieldMappingTable>;
export type SearchOutboxEntry = Selectable<SearchOutboxTable>;
export type NewSearchOutboxEntry = Insertable<SearchOutboxTable>;
export type SearchOutboxEntryUpdate = Updateable<SearchOutboxTable>;
export type MailOutboxEntry = Selectable<MailOutboxTable>;
export type NewMailOutboxEntry = Insertable<MailOutboxTable>;
export type MailOutboxEntryUpdate = Updateable<MailOutboxTable>;
