import { CsvReader, type CsvReadOptions } from './csv-reader';
import { binary, notUtf8, sniffBytes, stripBom, tooLarge } from './decode';
import { failure } from './errors';
import { MAX_FILE_BYTES } from './limits';
import type { CsvParseResult } from './parse-csv';

/** How far reading a file has got; `fraction` runs from 0 to 1 by bytes read. */
export interface CsvProgress {
  bytesRead: number;
  totalBytes: number;
  rowsRead: number;
  fraction: number;
}

export interface CsvBlobOptions extends CsvReadOptions {
  onProgress?: (progress: CsvProgress) => void;
  /** bytes read per slice (default 1 MiB) */
  sliceBytes?: number;
  /** stops reading; the result is then a READ_FAILED error */
  signal?: AbortSignal;
}

/**
 * Reads a File or Blob in the browser slice by slice, reporting progress after each slice, and gives the
 * same result as `parseCsv` on the whole file. Slices are decoded with one streaming UTF-8 decoder, so a
 * character split across two slices is joined correctly and invalid UTF-8 is refused; the decoded text
 * goes to the same reader (papaparse with an explicit delimiter, an unfinished row carried over). The
 * bytes are read here rather than by papaparse's own file streamer because that decodes each slice on
 * its own, which corrupts characters at slice boundaries. Each slice awaits the file read, so the page
 * stays responsive. After a file-level error the remaining bytes are still checked (binary, UTF-8), so the
 * error reported is the one `parseCsv` would report.
 */
export async function parseCsvBlob(blob: Blob, options: CsvBlobOptions = {}): Promise<CsvParseResult> {
  const totalBytes = blob.size;
  if (totalBytes === 0) return failure('EMPTY_FILE', 'The file is empty.');
  if (totalBytes > MAX_FILE_BYTES) return tooLarge(totalBytes);
  const sliceBytes = Math.max(1, Math.floor(options.sliceBytes ?? 1024 * 1024));
  const decoder = new TextDecoder('utf-8', { fatal: true, ignoreBOM: true });
  const reader = new CsvReader(options);
  let first = true;
  let hasText = false;
  try {
    const sniffed = sniffBytes(new Uint8Array(await blob.slice(0, 4096).arrayBuffer()));
    if (sniffed) return sniffed;
    for (let start = 0; start < totalBytes; start += sliceBytes) {
      if (options.signal?.aborted) return failure('READ_FAILED', 'Reading the file was stopped.');
      const bytes = new Uint8Array(await blob.slice(start, Math.min(start + sliceBytes, totalBytes)).arrayBuffer());
      if (bytes.includes(0)) return binary();
      let text: string;
      try {
        text = decoder.decode(bytes, { stream: true });
      } catch {
        return notUtf8();
      }
      if (first && text.length > 0) {
        text = stripBom(text);
        first = false;
      }
      hasText ||= /\S/.test(text);
      reader.push(text);
      const bytesRead = Math.min(start + sliceBytes, totalBytes);
      options.onProgress?.({ bytesRead, totalBytes, rowsRead: reader.rowCount, fraction: bytesRead / totalBytes });
    }
    let tail: string;
    try {
      tail = decoder.decode();
    } catch {
      return notUtf8();
    }
    hasText ||= /\S/.test(tail);
    if (!hasText) return failure('EMPTY_FILE', 'The file is empty.');
    if (reader.failed) return { ok: false, error: reader.failed };
    reader.push(tail);
    const result = reader.finish();
    return result.ok ? { ok: true, table: result.table, byteLength: totalBytes } : result;
  } catch {
    return failure('READ_FAILED', 'The file could not be read. Choose it again, or save it again as CSV UTF-8.');
  }
}
