/** The largest upload the importer reads, in bytes (20 MiB); a larger file is refused before it is read. */
export const MAX_FILE_BYTES = 20 * 1024 * 1024;

/** The most data rows (CSV) or consolidation tests (AGS4 CONG records) one upload may hold. */
export const MAX_ROWS = 100_000;
