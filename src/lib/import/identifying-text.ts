/**
 * Spots free text that may identify a project, client or site: one of the row's own private values,
 * an e-mail address, a phone number, a web address, or a pair of coordinates. Used to flag shared text
 * for the data steward; the reasons never repeat the private value itself.
 */
const EMAIL = /[\w.+-]+@[\w-]+(\.[\w-]+)+/;
const URL_LIKE = /\bhttps?:\/\/|\bwww\.[\w-]+|\b[\w-]+\.(com|org|net|gov|edu|io|co\.uk|ac\.uk|org\.uk)\b/i;
const PHONE = /(?:\+|\b)\d[\d ().-]{6,}\d\b/g;
const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;
const DECIMAL_DEGREES_PAIR = /-?\d{1,3}\.\d{3,}\s*[,;/ ]\s*-?\d{1,3}\.\d{3,}/;
const GRID_PAIR = /\b[EN]?\s?\d{5,7}(\.\d+)?\s*[,;/ ]\s*[EN]?\s?\d{5,7}(\.\d+)?\b/i;

export interface PrivateValue {
  /** "the project name", "the borehole id" … */
  what: string;
  value: string | null;
}

/** The reasons a text looks identifying (empty when it does not). */
export function identifyingReasons(text: string, privateValues: readonly PrivateValue[]): string[] {
  const reasons: string[] = [];
  const lower = text.toLowerCase();
  for (const { what, value } of privateValues) {
    const v = value?.trim().toLowerCase() ?? '';
    if (v.length >= 3 && lower.includes(v)) reasons.push(`contains ${what}`);
  }
  if (EMAIL.test(text)) reasons.push('contains an e-mail address');
  if (URL_LIKE.test(text)) reasons.push('contains a web address');
  if (looksLikePhone(text)) reasons.push('contains what looks like a phone number');
  if (DECIMAL_DEGREES_PAIR.test(text) || GRID_PAIR.test(text)) reasons.push('contains what looks like a pair of coordinates');
  return reasons;
}

function looksLikePhone(text: string): boolean {
  for (const match of text.matchAll(PHONE)) {
    const candidate = match[0].trim();
    const digits = candidate.replace(/\D/g, '');
    if (digits.length >= 8 && digits.length <= 15 && !ISO_DATE.test(candidate) && /[ ()+-]|^\d{8,}$/.test(candidate)) return true;
  }
  return false;
}
