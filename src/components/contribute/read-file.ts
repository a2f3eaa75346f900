import { type CsvTable, type Delimiter, parseCsvBlob, type RawRow, readAgs4 } from '../../lib/import';

export type UploadFormat = 'csv' | 'ags4';

/** What reading the chosen file in the browser gave: the table (CSV) or the tests (AGS4), or why not. */
export type FileRead =
  | { kind: 'none' }
  | { kind: 'reading'; fraction: number; rowsRead: number }
  | { kind: 'failed'; code: string; message: string }
  | { kind: 'csv'; table: CsvTable }
  | { kind: 'ags4'; rows: RawRow[]; geologyCodes: string[]; notices: string[] };

/** AGS4 files end in .ags; everything else is read as CSV until the person says otherwise. */
export function formatFromName(name: string): UploadFormat {
  return /\.ags4?$/i.test(name) ? 'ags4' : 'csv';
}

/**
 * Reads the file where the person can see it: CSV slice by slice with progress (the delimiter found in
 * the header row unless one is chosen), AGS4 whole. The server reads the same file again on check and submit.
 */
export async function readChosenFile(
  file: File,
  format: UploadFormat,
  delimiter: Delimiter | undefined,
  onProgress: (fraction: number, rowsRead: number) => void,
): Promise<FileRead> {
  if (format === 'ags4') {
    const bytes = new Uint8Array(await file.arrayBuffer());
    const read = readAgs4(bytes, { region: '' });
    if (!read.ok) return { kind: 'failed', code: read.error.code, message: read.error.message };
    return { kind: 'ags4', rows: read.rows, geologyCodes: read.geologyCodes, notices: read.notices };
  }
  const parsed = await parseCsvBlob(file, {
    delimiter,
    onProgress: (progress) => onProgress(progress.fraction, progress.rowsRead),
  });
  if (!parsed.ok) return { kind: 'failed', code: parsed.error.code, message: parsed.error.message };
  return { kind: 'csv', table: parsed.table };
}
