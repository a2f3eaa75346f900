import { failure, type ImportResult } from './errors';
import { MAX_FILE_BYTES } from './limits';

const SAVE_AS_CSV = 'Save it from your spreadsheet as "CSV UTF-8 (comma delimited)" and upload that file.';

export function formatBytes(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${(bytes / 1024 / 1024).toFixed(1)} MB` : `${Math.ceil(bytes / 1024)} KB`;
}

export function tooLarge(bytes: number) {
  return failure(
    'TOO_LARGE',
    `The file is ${formatBytes(bytes)}; the largest file Claybank reads is ${formatBytes(MAX_FILE_BYTES)}. Split it into smaller files.`,
  );
}

/**
 * Looks at the first bytes of a file (a few KB are enough) for things that are not UTF-8 text: UTF-16
 * byte-order marks or NUL-interleaved text, Excel workbooks (ZIP and OLE signatures), and NUL bytes.
 * Returns null when the bytes may be UTF-8 text.
 */
export function sniffBytes(head: Uint8Array) {
  const [b0, b1, b2, b3] = head;
  if ((b0 === 0xff && b1 === 0xfe) || (b0 === 0xfe && b1 === 0xff) || looksLikeUtf16WithoutMark(head)) {
    return failure('UTF16_FILE', `The file is saved as UTF-16 (Unicode text), which Claybank does not read. ${SAVE_AS_CSV}`);
  }
  if ((b0 === 0x50 && b1 === 0x4b && b2 === 0x03 && b3 === 0x04) || (b0 === 0xd0 && b1 === 0xcf && b2 === 0x11 && b3 === 0xe0)) {
    return failure('SPREADSHEET_FILE', `The file is a spreadsheet workbook, not a CSV text file. ${SAVE_AS_CSV}`);
  }
  if (head.includes(0)) return binary();
  return null;
}

function looksLikeUtf16WithoutMark(head: Uint8Array): boolean {
  const n = Math.min(head.length, 512) & ~1;
  if (n < 8) return false;
  let oddNuls = 0;
  let evenNuls = 0;
  for (let i = 0; i < n; i += 2) {
    if (head[i] === 0) evenNuls++;
    if (head[i + 1] === 0) oddNuls++;
  }
  const pairs = n / 2;
  return (oddNuls > pairs * 0.4 && evenNuls === 0) || (evenNuls > pairs * 0.4 && oddNuls === 0);
}

export function binary() {
  return failure('BINARY_FILE', `The file holds binary data (NUL bytes), so it is not a text file. ${SAVE_AS_CSV}`);
}

export function notUtf8() {
  return failure(
    'NOT_UTF8',
    `The file is not UTF-8 text (it may be saved in an older Windows or Mac encoding, or be binary). ${SAVE_AS_CSV}`,
  );
}

/** Drops one leading byte-order mark (U+FEFF). */
export function stripBom(text: string): string {
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}

/**
 * Turns an uploaded file into text: refuses empty, oversized, UTF-16, workbook, binary and invalid
 * UTF-8 content with a plain message, and strips a UTF-8 byte-order mark. A string is taken as already
 * decoded (it is still checked for emptiness, size and NUL characters).
 */
export function decodeText(input: Uint8Array | string): ImportResult<{ text: string; byteLength: number }> {
  if (typeof input === 'string') {
    const byteLength = utf8Length(input);
    if (byteLength > MAX_FILE_BYTES) return tooLarge(byteLength);
    const text = stripBom(input);
    if (text.trim().length === 0) return failure('EMPTY_FILE', 'The file is empty.');
    if (text.includes('\u0000')) return binary();
    return { ok: true, text, byteLength };
  }
  if (input.byteLength === 0) return failure('EMPTY_FILE', 'The file is empty.');
  if (input.byteLength > MAX_FILE_BYTES) return tooLarge(input.byteLength);
  const sniffed = sniffBytes(input.subarray(0, 4096));
  if (sniffed) return sniffed;
  if (input.includes(0)) return binary();
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true, ignoreBOM: true }).decode(input);
  } catch {
    return notUtf8();
  }
  text = stripBom(text);
  if (text.trim().length === 0) return failure('EMPTY_FILE', 'The file is empty.');
  return { ok: true, text, byteLength: input.byteLength };
}

/** Bytes the string takes in UTF-8, without encoding it. */
export function utf8Length(text: string): number {
  let bytes = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c < 0x80) bytes += 1;
    else if (c < 0x800) bytes += 2;
    else if (c >= 0xd800 && c <= 0xdbff && i + 1 < text.length) {
      bytes += 4;
      i++;
    } else bytes += 3;
  }
  return bytes;
}
