import { type Kysely, sql } from 'kysely';

/**
 * The bank: vocabulary (regions, geological units), versions, submissions and their history, the shared
 * anonymised test records with their stress levels, increments and readings, the firm-private details,
 * and the search and mail outboxes.
 *
 * Row-level security is the second wall of tenancy (the first is the permission check in every endpoint).
 * The app sets `app.firm_id` and `app.platform_role` with set_config(…, true) in each transaction; an unset
 * setting (NULL) and '' both mean "no firm" / "no role". Every table with RLS is FORCEd so that the owner
 * is bound too; only referential-integrity checks and cascades pass through, as PostgreSQL intends.
 */

const FIRM = `nullif(current_setting('app.firm_id', true), '')`;
const ROLE = `nullif(current_setting('app.platform_role', true), '')`;
const CURATOR = `${ROLE} in ('steward', 'admin')`;
const STEWARD = `${ROLE} = 'steward'`;

const GENESIS = [
  'marine',
  'estuarine',
  'lacustrine',
  'glaciolacustrine',
  'glacial',
  'alluvial',
  'fluvial',
  'organic',
  'residual',
  'aeolian',
  'colluvial',
  'other',
];
// biome-ignore format: coarse, dual-symbol coarse and fine groups on their own lines
const USCS_SYMBOLS = [
  'GW', 'GP', 'GM', 'GC', 'GC-GM', 'GW-GM', 'GW-GC', 'GP-GM', 'GP-GC',
  'SW', 'SP', 'SM', 'SC', 'SC-SM', 'SW-SM', 'SW-SC', 'SP-SM', 'SP-SC',
  'CL', 'ML', 'OL', 'CH', 'MH', 'OH', 'CL-ML', 'Pt',
];
const SUBMISSION_STATUSES = ['draft', 'submitted', 'in_review', 'accepted', 'returned', 'rejected', 'withdrawn'];
const RECORD_STATUSES = ['pending', 'returned', 'published', 'rejected', 'withdrawn'];

const PRIVATE_TABLES = ['test_record_private', 'submission_file', 'estimate', 'field_mapping'];
const SCOPED_TABLES = [
  'submission',
  'submission_event',
  'test_record',
  'test_record_stress_level',
  'oedometer_increment',
  'oedometer_reading',
];
const FIRM_TABLES = ['submission', 'test_record', ...PRIVATE_TABLES];

/** Tables in creation order; down() drops them in reverse. */
const TABLES = [
  'region',
  'geological_unit',
  'bank_version',
  'submission',
  'submission_event',
  'test_record',
  'test_record_stress_level',
  'oedometer_increment',
  'oedometer_reading',
  ...PRIVATE_TABLES,
  'search_outbox',
  'mail_outbox',
];

const list = (values: readonly string[]) => values.map((value) => `'${value}'`).join(', ');
const run = (db: Kysely<unknown>, statement: string) => sql.raw(statement).execute(db);

async function comment(db: Kysely<unknown>, target: string, text: string): Promise<void> {
  await sql`comment on ${sql.raw(target)} is ${sql.lit(text)}`.execute(db);
}

async function columnComments(db: Kysely<unknown>, table: string, comments: Record<string, string>): Promise<void> {
  for (const [column, text] of Object.entries(comments)) await comment(db, `column ${table}.${column}`, text);
}

async function createVocabulary(db: Kysely<unknown>): Promise<void> {
  await db.schema
    .createTable('region')
    .addColumn('id', 'uuid', (col) => col.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('name', 'text', (col) => col.notNull().unique())
    .addColumn('slug', 'text', (col) => col.notNull().unique())
    .addColumn('description', 'text')
    .addColumn('created_by', 'text', (col) => col.references('user.id').onDelete('set null'))
    .addColumn('created_at', 'timestamptz', (col) => col.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (col) => col.notNull().defaultTo(sql`now()`))
    .addCheckConstraint('region_slug_format', sql`slug ~ '^[a-z0-9]+(-[a-z0-9]+)*$'`)
    .execute();
  await comment(
    db,
    'table region',
    'Regions curated by data stewards (public vocabulary, no row-level security; writes are permission-checked in the app).',
  );

  await db.schema
    .createTable('geological_unit')
    .addColumn('id', 'uuid', (col) => col.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('name', 'text', (col) => col.notNull().unique())
    .addColumn('slug', 'text', (col) => col.notNull().unique())
    .addColumn('description', 'text')
    .addColumn('genesis', 'text', (col) => col.notNull())
    .addColumn('age', 'text')
    .addColumn('typical_region_id', 'uuid', (col) => col.references('region.id').onDelete('set null'))
    .addColumn('created_by', 'text', (col) => col.references('user.id').onDelete('set null'))
    .addColumn('created_at', 'timestamptz', (col) => col.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (col) => col.notNull().defaultTo(sql`now()`))
    .addCheckConstraint('geological_unit_slug_format', sql`slug ~ '^[a-z0-9]+(-[a-z0-9]+)*$'`)
    .addCheckConstraint('geological_unit_genesis_known', sql.raw(`genesis in (${list(GENESIS)})`))
    .execute();
  await comment(
    db,
    'table geological_unit',
    'Geological units (deposits) curated by data stewards (public vocabulary, no row-level security; writes are permission-checked in the app).',
  );
  await columnComments(db, 'geological_unit', {
    genesis:
      'How the deposit formed, one word from a closed list; a marine-estuarine clay is stored as estuarine, a glacial lake clay as glaciolacustrine.',
    age: "Geological age in words, e.g. 'Holocene', 'Pleistocene'.",
  });

  await db.schema
    .createTable('bank_version')
    .addColumn('id', 'integer', (col) => col.primaryKey().generatedAlwaysAsIdentity())
    .addColumn('published_at', 'timestamptz', (col) => col.notNull().defaultTo(sql`now()`))
    .addColumn('published_by', 'text', (col) => col.references('user.id').onDelete('set null'))
    .addColumn('note', 'text')
    .addColumn('record_count', 'integer', (col) => col.notNull().defaultTo(0))
    .addCheckConstraint('bank_version_record_count_not_negative', sql`record_count >= 0`)
    .execute();
  await comment(
    db,
    'table bank_version',
    'Published versions of the bank; id is the version number. Public, no row-level security; publishing is permission-checked in the app.',
  );
  await columnComments(db, 'bank_version', {
    record_count: 'Number of published test records in the bank as of this version.',
  });
}

async function createSubmissions(db: Kysely<unknown>): Promise<void> {
  await db.schema
    .createTable('submission')
    .addColumn('id', 'uuid', (col) => col.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('firm_id', 'text', (col) => col.notNull().references('organization.id'))
    .addColumn('submitted_by', 'text', (col) => col.references('user.id').onDelete('set null'))
    .addColumn('source_kind', 'text', (col) => col.notNull())
    .addColumn('source_file_name', 'text')
    .addColumn('source_checksum_sha256', 'text')
    .addColumn('source_size_bytes', 'bigint')
    .addColumn('status', 'text', (col) => col.notNull().defaultTo('draft'))
    .addColumn('steward_comment', 'text')
    .addColumn('row_count', 'integer', (col) => col.notNull().defaultTo(0))
    .addColumn('submitted_at', 'timestamptz')
    .addColumn('decided_at', 'timestamptz')
    .addColumn('decided_by', 'text', (col) => col.references('user.id').onDelete('set null'))
    .addColumn('created_at', 'timestamptz', (col) => col.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (col) => col.notNull().defaultTo(sql`now()`))
    .addUniqueConstraint('submission_id_firm_unique', ['id', 'firm_id'])
    .addCheckConstraint('submission_source_kind_known', sql`source_kind in ('csv', 'ags4', 'api', 'seed')`)
    .addCheckConstraint('submission_status_known', sql.raw(`status in (${list(SUBMISSION_STATUSES)})`))
    .addCheckConstraint(
      'submission_checksum_format',
      sql`source_checksum_sha256 is null or source_checksum_sha256 ~ '^[0-9a-f]{64}$'`,
    )
    .addCheckConstraint('submission_size_not_negative', sql`source_size_bytes is null or source_size_bytes >= 0`)
    .addCheckConstraint('submission_row_count_not_negative', sql`row_count >= 0`)
    .execute();
  await db.schema.createIndex('submission_firm_status_idx').on('submission').columns(['firm_id', 'status']).execute();
  await db.schema.createIndex('submission_status_submitted_idx').on('submission').columns(['status', 'submitted_at']).execute();
  await comment(
    db,
    'table submission',
    'One upload of test records by a firm, reviewed as a whole. Row-level security: the owning firm and stewards/admins see it (never public); the firm writes its own but cannot accept or reject it; stewards update it (review decisions).',
  );
  await columnComments(db, 'submission', {
    submitted_by: 'The person who uploaded; null when that account was deleted.',
    source_checksum_sha256: 'SHA-256 of the uploaded file, 64 lower-case hex digits.',
    row_count: 'Number of test records the submission carries.',
    steward_comment: 'The reviewing steward’s comment to the contributor, shown when returned or rejected.',
  });

  await db.schema
    .createTable('submission_event')
    .addColumn('id', 'bigserial', (col) => col.primaryKey())
    .addColumn('submission_id', 'uuid', (col) => col.notNull().references('submission.id').onDelete('cascade'))
    .addColumn('occurred_at', 'timestamptz', (col) => col.notNull().defaultTo(sql`now()`))
    .addColumn('actor_user_id', 'text', (col) => col.references('user.id').onDelete('set null'))
    .addColumn('from_status', 'text')
    .addColumn('to_status', 'text', (col) => col.notNull())
    .addColumn('comment', 'text')
    .addCheckConstraint(
      'submission_event_status_known',
      sql.raw(
        `(from_status is null or from_status in (${list(SUBMISSION_STATUSES)})) and to_status in (${list(SUBMISSION_STATUSES)})`,
      ),
    )
    .execute();
  await db.schema
    .createIndex('submission_event_submission_idx')
    .on('submission_event')
    .columns(['submission_id', 'occurred_at'])
    .execute();
  await comment(
    db,
    'table submission_event',
    'Status history of a submission. Append-only through row-level security: visible with its submission; the firm and stewards may add events, nobody may change or delete them (only the submission’s own deletion cascades).',
  );
  await columnComments(db, 'submission_event', { from_status: 'Null for the event that created the submission.' });
}

async function createTestRecord(db: Kysely<unknown>): Promise<void> {
  await db.schema
    .createTable('test_record')
    .addColumn('id', 'uuid', (col) => col.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('submission_id', 'uuid', (col) => col.notNull())
    .addColumn('firm_id', 'text', (col) => col.notNull().references('organization.id'))
    .addColumn('status', 'text', (col) => col.notNull().defaultTo('pending'))
    .addColumn('bank_version_id', 'integer', (col) => col.references('bank_version.id'))
    .addColumn('record_kind', 'text', (col) => col.notNull().defaultTo('oedometer'))
    .addColumn('region_id', 'uuid', (col) => col.notNull().references('region.id'))
    .addColumn('location_cell', 'text')
    .addColumn('depth_top_m', 'numeric', (col) => col.notNull())
    .addColumn('depth_bottom_m', 'numeric', (col) => col.notNull())
    .addColumn('geological_unit_id', 'uuid', (col) => col.notNull().references('geological_unit.id'))
    .addColumn('uscs_symbol', 'text')
    .addColumn('sampling_method', 'text')
    .addColumn('water_content_pct', 'numeric')
    .addColumn('liquid_limit_pct', 'numeric')
    .addColumn('plastic_limit_pct', 'numeric')
    .addColumn('plasticity_index_pct', 'numeric')
    .addColumn('specific_gravity', 'numeric')
    .addColumn('bulk_unit_weight_kn_per_m3', 'numeric')
    .addColumn('initial_void_ratio', 'numeric')
    .addColumn('organic_content_pct', 'numeric')
    .addColumn('test_method', 'text')
    .addColumn('test_standard', 'text')
    .addColumn('compression_index', 'numeric')
    .addColumn('recompression_index', 'numeric')
    .addColumn('preconsolidation_stress_kpa', 'numeric')
    .addColumn('vertical_effective_stress_kpa', 'numeric')
    .addColumn('overconsolidation_ratio', 'numeric')
    .addColumn('cv_nc_m2_per_year', 'numeric')
    .addColumn('cv_oc_m2_per_year', 'numeric')
    .addColumn('secondary_compression_index', 'numeric')
    .addColumn('mv_m2_per_mn', 'numeric')
    .addColumn('permeability_m_per_s', 'numeric')
    .addColumn('delta_e_over_e0', 'numeric')
    .addColumn('sample_quality_class', 'integer')
    .addColumn('created_at', 'timestamptz', (col) => col.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (col) => col.notNull().defaultTo(sql`now()`))
    .addUniqueConstraint('test_record_id_firm_unique', ['id', 'firm_id'])
    .addForeignKeyConstraint('test_record_submission_same_firm', ['submission_id', 'firm_id'], 'submission', ['id', 'firm_id'])
    .addCheckConstraint('test_record_status_known', sql.raw(`status in (${list(RECORD_STATUSES)})`))
    .addCheckConstraint('test_record_published_has_version', sql`status <> 'published' or bank_version_id is not null`)
    .addCheckConstraint('test_record_kind_known', sql`record_kind in ('oedometer', 'field_back_analysis')`)
    .addCheckConstraint('test_record_location_cell_format', sql`location_cell ~ '^E[0-9]{2,4}-N[0-9]{2,4}$'`)
    .addCheckConstraint('test_record_depth_top_not_negative', sql`depth_top_m >= 0`)
    .addCheckConstraint('test_record_depth_bottom_below_top', sql`depth_bottom_m > depth_top_m`)
    .addCheckConstraint('test_record_uscs_symbol_known', sql.raw(`uscs_symbol in (${list(USCS_SYMBOLS)})`))
    .addCheckConstraint('test_record_water_content_not_negative', sql`water_content_pct >= 0`)
    .addCheckConstraint('test_record_liquid_limit_range', sql`liquid_limit_pct between 0 and 1000`)
    .addCheckConstraint('test_record_plastic_limit_range', sql`plastic_limit_pct between 0 and 1000`)
    .addCheckConstraint('test_record_plasticity_index_range', sql`plasticity_index_pct between 0 and 1000`)
    .addCheckConstraint('test_record_plasticity_index_within_ll', sql`plasticity_index_pct <= liquid_limit_pct`)
    .addCheckConstraint('test_record_specific_gravity_range', sql`specific_gravity between 1 and 6`)
    .addCheckConstraint('test_record_unit_weight_range', sql`bulk_unit_weight_kn_per_m3 > 0 and bulk_unit_weight_kn_per_m3 < 40`)
    .addCheckConstraint('test_record_initial_void_ratio_positive', sql`initial_void_ratio > 0`)
    .addCheckConstraint('test_record_organic_content_range', sql`organic_content_pct between 0 and 100`)
    .addCheckConstraint('test_record_test_method_known', sql`test_method in ('incremental', 'crs')`)
    .addCheckConstraint('test_record_cc_positive', sql`compression_index > 0`)
    .addCheckConstraint('test_record_cr_not_negative', sql`recompression_index >= 0`)
    .addCheckConstraint('test_record_preconsolidation_positive', sql`preconsolidation_stress_kpa > 0`)
    .addCheckConstraint('test_record_vertical_stress_not_negative', sql`vertical_effective_stress_kpa >= 0`)
    .addCheckConstraint('test_record_ocr_positive', sql`overconsolidation_ratio > 0`)
    .addCheckConstraint('test_record_cv_positive', sql`cv_nc_m2_per_year > 0 and cv_oc_m2_per_year > 0`)
    .addCheckConstraint('test_record_calpha_not_negative', sql`secondary_compression_index >= 0`)
    .addCheckConstraint('test_record_mv_not_negative', sql`mv_m2_per_mn >= 0`)
    .addCheckConstraint('test_record_permeability_positive', sql`permeability_m_per_s > 0`)
    .addCheckConstraint('test_record_delta_e_range', sql`delta_e_over_e0 > -1 and delta_e_over_e0 < 1`)
    .addCheckConstraint('test_record_quality_class_range', sql`sample_quality_class between 1 and 4`)
    .execute();
  await db.schema
    .createIndex('test_record_status_unit_idx')
    .on('test_record')
    .columns(['status', 'geological_unit_id'])
    .execute();
  await db.schema.createIndex('test_record_status_region_idx').on('test_record').columns(['status', 'region_id']).execute();
  await db.schema.createIndex('test_record_firm_status_idx').on('test_record').columns(['firm_id', 'status']).execute();
  await db.schema.createIndex('test_record_submission_idx').on('test_record').column('submission_id').execute();

  await comment(
    db,
    'table test_record',
    'The shared, anonymised part of one oedometer test (or field back-analysis). Identifying details live in test_record_private. Row-level security: published records are visible to all; unpublished ones to the owning firm and stewards/admins; the firm writes its own but cannot publish them; stewards update them (review).',
  );
  await columnComments(db, 'test_record', {
    firm_id: 'Owning firm: for tenancy and for counting firms behind a statistic. Never shown to other firms.',
    bank_version_id: 'The bank version in which the record was published; required while status is published.',
    location_cell:
      "Coarse location cell of about 5 km, e.g. 'E12-N07'; never exact coordinates (those are in test_record_private).",
    uscs_symbol:
      "ASTM D2487 group symbol, including dual symbols (e.g. 'SP-SM') and 'CL-ML'; peat is stored as 'Pt'. Null when not classified.",
    sampling_method: "How the sample was taken, e.g. 'piston', 'open-drive thin-wall', 'block'.",
    water_content_pct: 'Natural water content wn, % of dry mass (may exceed 100 %, peats several hundred).',
    liquid_limit_pct: 'Liquid limit LL, %.',
    plastic_limit_pct: 'Plastic limit PL, %.',
    plasticity_index_pct: 'Plasticity index PI = LL - PL, %; 0 for non-plastic soil.',
    specific_gravity: 'Specific gravity of solids Gs, dimensionless.',
    initial_void_ratio: 'Initial void ratio e0 of the specimen, dimensionless.',
    organic_content_pct: 'Organic content, % of dry mass (loss on ignition or equivalent).',
    test_method: 'incremental = incremental loading (ASTM D2435, ISO 17892-5); crs = constant rate of strain (ASTM D4186).',
    test_standard: "Standard followed, e.g. 'ASTM D2435', 'ASTM D4186', 'ISO 17892-5'.",
    compression_index: "Compression index Cc: slope of the e-log10 σ' curve in the normally consolidated range, dimensionless.",
    recompression_index:
      "Recompression (swelling) index Cr: slope of the e-log10 σ' curve on unloading/reloading, dimensionless.",
    preconsolidation_stress_kpa: "Preconsolidation stress σ'p.",
    vertical_effective_stress_kpa: "In-situ vertical effective stress σ'v0 at the sample depth.",
    overconsolidation_ratio: "OCR = σ'p / σ'v0, dimensionless.",
    cv_nc_m2_per_year: 'Summary coefficient of consolidation cv over the normally consolidated stress range.',
    cv_oc_m2_per_year: 'Summary coefficient of consolidation cv over the overconsolidated stress range.',
    secondary_compression_index:
      'Secondary compression index Cα = Δe / Δlog10 t, summary over the normally consolidated range, dimensionless.',
    mv_m2_per_mn: 'Coefficient of volume compressibility mv over the design stress range.',
    permeability_m_per_s: 'Hydraulic conductivity k.',
    delta_e_over_e0: "Sample disturbance Δe/e0 on reconsolidation to σ'v0 (Lunne, Berre & Strandvik 1997), dimensionless.",
    sample_quality_class:
      'Sample quality class after Lunne, Berre & Strandvik (1997) from Δe/e0: 1 very good to excellent, 2 good to fair, 3 poor, 4 very poor. For OCR 1-2 the limits are 0.04, 0.07, 0.14; for OCR 2-4 they are 0.03, 0.05, 0.10.',
  });
}

async function createTestDetails(db: Kysely<unknown>): Promise<void> {
  await db.schema
    .createTable('test_record_stress_level')
    .addColumn('id', 'uuid', (col) => col.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('test_record_id', 'uuid', (col) => col.notNull().references('test_record.id').onDelete('cascade'))
    .addColumn('stress_from_kpa', 'numeric', (col) => col.notNull())
    .addColumn('stress_to_kpa', 'numeric', (col) => col.notNull())
    .addColumn('stress_range', 'text', (col) => col.notNull())
    .addColumn('cv_m2_per_year', 'numeric')
    .addColumn('secondary_compression_index', 'numeric')
    .addColumn('mv_m2_per_mn', 'numeric')
    .addColumn('permeability_m_per_s', 'numeric')
    .addColumn('cv_method', 'text')
    .addCheckConstraint(
      'stress_level_stresses_valid',
      sql`stress_from_kpa >= 0 and stress_to_kpa >= 0 and stress_to_kpa <> stress_from_kpa`,
    )
    .addCheckConstraint('stress_level_range_known', sql`stress_range in ('NC', 'OC')`)
    .addCheckConstraint('stress_level_cv_positive', sql`cv_m2_per_year > 0`)
    .addCheckConstraint('stress_level_calpha_not_negative', sql`secondary_compression_index >= 0`)
    .addCheckConstraint('stress_level_mv_not_negative', sql`mv_m2_per_mn >= 0`)
    .addCheckConstraint('stress_level_permeability_positive', sql`permeability_m_per_s > 0`)
    .addCheckConstraint('stress_level_cv_method_known', sql`cv_method in ('root_time', 'log_time', 'crs', 'other')`)
    .execute();
  await db.schema
    .createIndex('stress_level_test_record_idx')
    .on('test_record_stress_level')
    .columns(['test_record_id', 'stress_from_kpa'])
    .execute();
  await comment(
    db,
    'table test_record_stress_level',
    'cv, Cα, mv and k per load increment of a test. Visibility and writes follow the parent test_record.',
  );
  await columnComments(db, 'test_record_stress_level', {
    stress_range: "NC = the increment lies above σ'p (normally consolidated); OC = below σ'p (overconsolidated).",
    secondary_compression_index: 'Cα = Δe / Δlog10 t for this increment, dimensionless.',
    cv_method: 'root_time = Taylor, log_time = Casagrande, crs = from a constant-rate-of-strain test, other.',
  });

  await db.schema
    .createTable('oedometer_increment')
    .addColumn('id', 'uuid', (col) => col.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('test_record_id', 'uuid', (col) => col.notNull().references('test_record.id').onDelete('cascade'))
    .addColumn('increment_no', 'integer', (col) => col.notNull())
    .addColumn('applied_stress_kpa', 'numeric', (col) => col.notNull())
    .addColumn('is_unloading', 'boolean', (col) => col.notNull().defaultTo(false))
    .addColumn('duration_hours', 'numeric')
    .addColumn('end_deformation_mm', 'numeric')
    .addColumn('end_void_ratio', 'numeric')
    .addColumn('specimen_height_mm', 'numeric')
    .addUniqueConstraint('oedometer_increment_number_unique', ['test_record_id', 'increment_no'])
    .addCheckConstraint('oedometer_increment_number_positive', sql`increment_no >= 1`)
    .addCheckConstraint('oedometer_increment_stress_not_negative', sql`applied_stress_kpa >= 0`)
    .addCheckConstraint('oedometer_increment_duration_positive', sql`duration_hours > 0`)
    .addCheckConstraint('oedometer_increment_void_ratio_positive', sql`end_void_ratio > 0`)
    .addCheckConstraint('oedometer_increment_height_positive', sql`specimen_height_mm > 0`)
    .execute();
  await comment(
    db,
    'table oedometer_increment',
    'Raw load increments of a test, kept for interpretation. Visibility and writes follow the parent test_record.',
  );
  await columnComments(db, 'oedometer_increment', {
    end_deformation_mm: 'Cumulative specimen deformation at the end of the increment, compression positive.',
    end_void_ratio: 'Void ratio at the end of the increment, dimensionless.',
    specimen_height_mm: 'Specimen height at the start of the test; given on increment 1, null on the others.',
  });

  await db.schema
    .createTable('oedometer_reading')
    .addColumn('id', 'bigserial', (col) => col.primaryKey())
    .addColumn('increment_id', 'uuid', (col) => col.notNull().references('oedometer_increment.id').onDelete('cascade'))
    .addColumn('elapsed_minutes', 'numeric', (col) => col.notNull())
    .addColumn('deformation_mm', 'numeric', (col) => col.notNull())
    .addCheckConstraint('oedometer_reading_elapsed_not_negative', sql`elapsed_minutes >= 0`)
    .execute();
  await db.schema
    .createIndex('oedometer_reading_increment_idx')
    .on('oedometer_reading')
    .columns(['increment_id', 'elapsed_minutes'])
    .execute();
  await comment(
    db,
    'table oedometer_reading',
    'Time-deformation readings within one increment. Visibility and writes follow the test_record of the increment.',
  );
  await columnComments(db, 'oedometer_reading', {
    deformation_mm: 'Dial or transducer deformation since the start of the test, compression positive.',
  });
}

async function createPrivateTables(db: Kysely<unknown>): Promise<void> {
  await db.schema
    .createTable('test_record_private')
    .addColumn('test_record_id', 'uuid', (col) => col.primaryKey())
    .addColumn('firm_id', 'text', (col) => col.notNull())
    .addColumn('project_name', 'text')
    .addColumn('client_name', 'text')
    .addColumn('borehole_id', 'text')
    .addColumn('sample_id', 'text')
    .addColumn('easting_m', 'numeric')
    .addColumn('northing_m', 'numeric')
    .addColumn('latitude_deg', 'numeric')
    .addColumn('longitude_deg', 'numeric')
    .addColumn('coordinate_system', 'text')
    .addColumn('notes', 'text')
    .addColumn('created_at', 'timestamptz', (col) => col.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (col) => col.notNull().defaultTo(sql`now()`))
    .addForeignKeyConstraint(
      'test_record_private_same_firm',
      ['test_record_id', 'firm_id'],
      'test_record',
      ['id', 'firm_id'],
      (fk) => fk.onDelete('cascade'),
    )
    .addCheckConstraint('test_record_private_latitude_range', sql`latitude_deg between -90 and 90`)
    .addCheckConstraint('test_record_private_longitude_range', sql`longitude_deg between -180 and 180`)
    .execute();
  await comment(
    db,
    'table test_record_private',
    'Identifying details of a test record (project, client, borehole, sample, exact position, notes). Firm-private: row-level security shows and accepts only rows of the firm in app.firm_id; stewards never see them.',
  );
  await columnComments(db, 'test_record_private', {
    coordinate_system: "Coordinate reference of easting_m/northing_m, e.g. 'EPSG:27700'.",
  });

  await db.schema
    .createTable('submission_file')
    .addColumn('id', 'uuid', (col) => col.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('submission_id', 'uuid', (col) => col.notNull())
    .addColumn('firm_id', 'text', (col) => col.notNull())
    .addColumn('storage_name', 'text', (col) => col.notNull().unique())
    .addColumn('original_name', 'text', (col) => col.notNull())
    .addColumn('media_type', 'text', (col) => col.notNull())
    .addColumn('size_bytes', 'bigint', (col) => col.notNull())
    .addColumn('sha256', 'text', (col) => col.notNull())
    .addColumn('content', 'bytea', (col) => col.notNull())
    .addColumn('created_at', 'timestamptz', (col) => col.notNull().defaultTo(sql`now()`))
    .addForeignKeyConstraint('submission_file_same_firm', ['submission_id', 'firm_id'], 'submission', ['id', 'firm_id'], (fk) =>
      fk.onDelete('cascade'),
    )
    .addCheckConstraint('submission_file_sha256_format', sql`sha256 ~ '^[0-9a-f]{64}$'`)
    .addCheckConstraint('submission_file_size_matches', sql`size_bytes = octet_length(content)`)
    .execute();
  await db.schema.createIndex('submission_file_submission_idx').on('submission_file').column('submission_id').execute();
  await comment(
    db,
    'table submission_file',
    'Original uploaded files, byte for byte. Firm-private: row-level security shows and accepts only rows of the firm in app.firm_id.',
  );
  await columnComments(db, 'submission_file', {
    storage_name: 'Server-generated name; never derived from the uploaded file name.',
    original_name: 'File name as uploaded, for display only.',
    sha256: 'SHA-256 of content, 64 lower-case hex digits.',
  });

  await db.schema
    .createTable('estimate')
    .addColumn('id', 'uuid', (col) => col.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('firm_id', 'text', (col) => col.notNull().references('organization.id'))
    .addColumn('created_by', 'text', (col) => col.references('user.id').onDelete('set null'))
    .addColumn('name', 'text', (col) => col.notNull())
    .addColumn('unit_system', 'text', (col) => col.notNull().defaultTo('SI'))
    .addColumn('input', 'jsonb', (col) => col.notNull())
    .addColumn('result_summary', 'jsonb')
    .addColumn('bank_version_id', 'integer', (col) => col.references('bank_version.id'))
    .addColumn('created_at', 'timestamptz', (col) => col.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (col) => col.notNull().defaultTo(sql`now()`))
    .addCheckConstraint('estimate_unit_system_known', sql`unit_system in ('SI', 'US')`)
    .execute();
  await db.schema.createIndex('estimate_firm_updated_idx').on('estimate').columns(['firm_id', 'updated_at']).execute();
  await comment(
    db,
    'table estimate',
    'Saved settlement estimates. Firm-private: row-level security shows and accepts only rows of the firm in app.firm_id.',
  );
  await columnComments(db, 'estimate', {
    unit_system: 'Units the estimate is shown in (SI or US customary); input is stored in SI.',
    input: 'Everything needed to recompute the estimate (profile, load, parameters, options).',
    bank_version_id: 'Bank version the parameters were drawn from, so the estimate can be reproduced.',
  });

  await db.schema
    .createTable('field_mapping')
    .addColumn('id', 'uuid', (col) => col.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('firm_id', 'text', (col) => col.notNull().references('organization.id'))
    .addColumn('name', 'text', (col) => col.notNull())
    .addColumn('mapping', 'jsonb', (col) => col.notNull())
    .addColumn('updated_at', 'timestamptz', (col) => col.notNull().defaultTo(sql`now()`))
    .addUniqueConstraint('field_mapping_firm_name_unique', ['firm_id', 'name'])
    .execute();
  await comment(
    db,
    'table field_mapping',
    'CSV column mappings a firm has saved for reuse. Firm-private: row-level security shows and accepts only rows of the firm in app.firm_id.',
  );
  await columnComments(db, 'field_mapping', { mapping: 'Our field name → column heading in the firm’s spreadsheets.' });
}

async function createOutboxes(db: Kysely<unknown>): Promise<void> {
  await db.schema
    .createTable('search_outbox')
    .addColumn('id', 'bigserial', (col) => col.primaryKey())
    .addColumn('entity_type', 'text', (col) => col.notNull())
    .addColumn('entity_id', 'text', (col) => col.notNull())
    .addColumn('operation', 'text', (col) => col.notNull())
    .addColumn('enqueued_at', 'timestamptz', (col) => col.notNull().defaultTo(sql`now()`))
    .addColumn('processed_at', 'timestamptz')
    .addColumn('attempts', 'integer', (col) => col.notNull().defaultTo(0))
    .addColumn('last_error', 'text')
    .addCheckConstraint('search_outbox_operation_known', sql`operation in ('upsert', 'delete')`)
    .execute();
  await db.schema
    .createIndex('search_outbox_pending_idx')
    .on('search_outbox')
    .column('id')
    .where(sql.ref('processed_at'), 'is', null)
    .execute();
  await comment(
    db,
    'table search_outbox',
    'Changes still to be sent to the search index, written in the same transaction as the change. App-internal, no row-level security.',
  );

  await db.schema
    .createTable('mail_outbox')
    .addColumn('id', 'bigserial', (col) => col.primaryKey())
    .addColumn('to_address', 'text', (col) => col.notNull())
    .addColumn('subject', 'text', (col) => col.notNull())
    .addColumn('body_text', 'text', (col) => col.notNull())
    .addColumn('body_html', 'text')
    .addColumn('kind', 'text', (col) => col.notNull())
    .addColumn('dedupe_key', 'text', (col) => col.unique())
    .addColumn('created_at', 'timestamptz', (col) => col.notNull().defaultTo(sql`now()`))
    .addColumn('send_after', 'timestamptz', (col) => col.notNull().defaultTo(sql`now()`))
    .addColumn('sent_at', 'timestamptz')
    .addColumn('attempts', 'integer', (col) => col.notNull().defaultTo(0))
    .addColumn('last_error', 'text')
    .execute();
  await db.schema
    .createIndex('mail_outbox_unsent_idx')
    .on('mail_outbox')
    .column('send_after')
    .where(sql.ref('sent_at'), 'is', null)
    .execute();
  await comment(
    db,
    'table mail_outbox',
    'E-mail waiting to be sent, so a mail failure never rolls back data. App-internal, no row-level security.',
  );
  await columnComments(db, 'mail_outbox', {
    kind: "What the mail is about, e.g. 'submission_returned'.",
    dedupe_key: 'Set when the same mail must never be queued twice.',
  });
}

async function enableRowLevelSecurity(db: Kysely<unknown>): Promise<void> {
  for (const table of [...PRIVATE_TABLES, ...SCOPED_TABLES]) {
    await run(db, `alter table ${table} enable row level security`);
    await run(db, `alter table ${table} force row level security`);
  }

  for (const table of PRIVATE_TABLES) {
    await run(db, `create policy ${table}_own_firm on ${table} for all using (firm_id = ${FIRM}) with check (firm_id = ${FIRM})`);
  }

  // A firm writes its own rows but cannot give them a review outcome: publishing a record or accepting or
  // rejecting a submission needs the steward's policy.
  const firmOwned = `firm_id = ${FIRM}`;
  const scoped: Array<[table: string, visible: string, firmStatuses: string[]]> = [
    ['submission', `${firmOwned} or ${CURATOR}`, ['draft', 'submitted', 'returned', 'withdrawn']],
    ['test_record', `status = 'published' or ${firmOwned} or ${CURATOR}`, ['pending', 'returned', 'withdrawn']],
  ];
  for (const [table, visible, firmStatuses] of scoped) {
    const firmWrite = `${firmOwned} and status in (${list(firmStatuses)})`;
    await run(db, `create policy ${table}_select on ${table} for select using (${visible})`);
    await run(db, `create policy ${table}_insert_own on ${table} for insert with check (${firmWrite})`);
    await run(db, `create policy ${table}_update_own on ${table} for update using (${firmOwned}) with check (${firmWrite})`);
    await run(db, `create policy ${table}_update_steward on ${table} for update using (${STEWARD}) with check (${STEWARD})`);
    await run(db, `create policy ${table}_delete_own on ${table} for delete using (${firmOwned})`);
  }

  const submissionVisible = `exists (select 1 from submission s where s.id = submission_id and (s.firm_id = ${FIRM} or ${CURATOR}))`;
  const submissionWritable = `exists (select 1 from submission s where s.id = submission_id and (s.firm_id = ${FIRM} or ${STEWARD}))`;
  await run(db, `create policy submission_event_select on submission_event for select using (${submissionVisible})`);
  await run(db, `create policy submission_event_insert on submission_event for insert with check (${submissionWritable})`);

  const recordVisible = `(t.status = 'published' or t.firm_id = ${FIRM} or ${CURATOR})`;
  const recordOwned = `t.firm_id = ${FIRM}`;
  const children: Array<[table: string, parentOf: (condition: string) => string]> = [
    ['test_record_stress_level', (c) => `exists (select 1 from test_record t where t.id = test_record_id and ${c})`],
    ['oedometer_increment', (c) => `exists (select 1 from test_record t where t.id = test_record_id and ${c})`],
    [
      'oedometer_reading',
      (c) =>
        `exists (select 1 from oedometer_increment i join test_record t on t.id = i.test_record_id where i.id = increment_id and ${c})`,
    ],
  ];
  for (const [table, parentOf] of children) {
    const visible = parentOf(recordVisible);
    const owned = parentOf(recordOwned);
    await run(db, `create policy ${table}_select on ${table} for select using (${visible})`);
    await run(db, `create policy ${table}_insert_own on ${table} for insert with check (${owned})`);
    await run(db, `create policy ${table}_update_own on ${table} for update using (${owned}) with check (${owned})`);
    await run(db, `create policy ${table}_delete_own on ${table} for delete using (${owned})`);
  }

  // A steward's review may update a row of any firm; this keeps the row in its firm.
  await run(
    db,
    `create function firm_id_is_fixed() returns trigger language plpgsql as $$
     begin
       if new.firm_id is distinct from old.firm_id then
         raise exception 'firm_id of % cannot change', tg_table_name using errcode = 'check_violation';
       end if;
       return new;
     end $$`,
  );
  for (const table of FIRM_TABLES) {
    await run(
      db,
      `create trigger ${table}_firm_id_fixed before update of firm_id on ${table} for each row execute function firm_id_is_fixed()`,
    );
  }
}

export async function up(db: Kysely<unknown>): Promise<void> {
  await createVocabulary(db);
  await createSubmissions(db);
  await createTestRecord(db);
  await createTestDetails(db);
  await createPrivateTables(db);
  await createOutboxes(db);
  await enableRowLevelSecurity(db);
}

export async function down(db: Kysely<unknown>): Promise<void> {
  for (const table of [...TABLES].reverse()) await sql`drop table if exists ${sql.id(table)} cascade`.execute(db);
  await sql`drop function if exists firm_id_is_fixed()`.execute(db);
}
