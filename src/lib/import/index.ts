/**
 * The import core: pure functions shared by the browser (preview and column mapping) and the server
 * (which re-reads the uploaded file and validates every row). Row numbers follow row-numbers.ts.
 */
export { AGS4_READ_HEADINGS, type Ags4Options, type Ags4Result, readAgs4 } from './ags4';
export { type AnonymityFlag, type PrivatePart, type SharedPart, type SharedViewEntry, sharedView, splitRow } from './anonymise';
export { autoMapColumns, type ColumnMapping, type ColumnMatch, mappingToRemember, type RememberedMapping } from './column-match';
export type { CsvReadOptions } from './csv-reader';
export { type CsvRow, type CsvTable, columnLetter } from './csv-table';
export { decodeText } from './decode';
export { DELIMITER_NAMES, DELIMITERS, type Delimiter, isDelimiter } from './delimiter';
export { applyEdits } from './edit-rows';
export {
  formatRowError,
  IMPORT_ERROR_CODES,
  type ImportError,
  type ImportErrorCode,
  type ImportResult,
  type RowError,
} from './errors';
export {
  FIELD_BY_KEY,
  fieldKeysWithScope,
  IMPORT_FIELDS,
  type ImportField,
  type ImportFieldKey,
  isImportFieldKey,
  type PrivateFieldKey,
  type SharedFieldKey,
} from './fields';
export { formulaFlagReason, looksLikeFormula, neutraliseCell } from './formula-text';
export { rememberKey } from './header-text';
export { MAX_FILE_BYTES, MAX_ROWS } from './limits';
export { LOCATION_CELL_PATTERN, locationCellFromCoordinates } from './location-cell';
export { type MapRowsOptions, mapRows, type RowEdits } from './map-rows';
export { type CsvParseResult, parseCsv } from './parse-csv';
export { type CsvBlobOptions, type CsvProgress, parseCsvBlob } from './parse-csv-blob';
export type { RawIncrement, RawRow, RawValue } from './raw-row';
export { duplicateKey } from './row-key';
export { FIRST_DATA_ROW_NUMBER, HEADER_ROW_NUMBER } from './row-numbers';
export { SAMPLE_QUALITY_LABELS, type SampleQualityClass, sampleQualityClass } from './sample-quality';
export { type ColumnGuideEntry, columnGuide, templateCsv } from './template';
export { canonicalTestMethod, TEST_METHODS, type TestMethod } from './test-method';
export type { DerivedValue, TestRecordIncrement, TestRecordInput, TestRecordRow, TestRecordVocabulary } from './test-record';
export { testRecordRowSchema } from './test-record-row';
export { siUnit, toSi, UNIT_CHOICES, type UnitChoice } from './units';
export { canonicalUscs, USCS_SYMBOLS, type UscsSymbol } from './uscs';
export { type ValidationContext, type ValidationResult, type ValidRow, validateRows } from './validate-rows';
export type { VocabularyEntry } from './vocabulary-match';
