/**
 * Reads a number typed in a spreadsheet cell. Blank cells and the usual "not measured" marks (-, –, n/a,
 * NA) give null. A decimal comma is accepted only when the file is separated by semicolons or tabs
 * (where it is the local convention); a comma in a comma-separated file, or a number with both a point
 * and a comma, or grouped digits ("1 234", "1.234.567", "1'234") is refused because thousands
 * separators cannot be told from decimal marks.
 */
export type NumberCell = { ok: true; value: number | null } | { ok: false; message: string };

const NOT_MEASURED = new Set(['-', '–', '—', 'n/a', 'na', 'n.a.', 'nm']);
const PLAIN = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;

export function parseNumberCell(text: string, options: { decimalComma: boolean; percent?: boolean }): NumberCell {
  const plain = text.trim();
  if (PLAIN.test(plain)) {
    const value = Number(plain);
    if (Number.isFinite(value)) return { ok: true, value };
  }
  let s = plain.replace(/\u00a0|\u202f/g, ' ');
  if (s === '' || NOT_MEASURED.has(s.toLowerCase())) return { ok: true, value: null };
  if (options.percent && s.endsWith('%')) s = s.slice(0, -1).trim();
  s = s.replace(/^\u2212/, '-');
  const shown = `"${text.trim()}"`;
  if (/\d[ '’]\d/.test(s)) {
    return { ok: false, message: `${shown} has digits in groups; write it without thousands separators, e.g. 1234.5.` };
  }
  const commas = s.split(',').length - 1;
  const points = s.split('.').length - 1;
  if (commas > 0 && points > 0) {
    return {
      ok: false,
      message: `${shown} has both a point and a comma, so it is unclear which is the decimal mark; write it without thousands separators, e.g. 1234.5.`,
    };
  }
  if (points > 1 || commas > 1) {
    return {
      ok: false,
      message: `${shown} has more than one ${points > 1 ? 'point' : 'comma'}; write it without thousands separators, e.g. 1234.5.`,
    };
  }
  if (commas === 1) {
    if (!options.decimalComma) {
      return {
        ok: false,
        message: `${shown} has a comma; in a comma-separated file write numbers with a decimal point (e.g. 1.5) and no thousands separators.`,
      };
    }
    s = s.replace(',', '.');
  }
  if (!PLAIN.test(s))
    return { ok: false, message: `${shown} is not a number; enter a plain number such as 1.25, or leave the cell blank.` };
  const value = Number(s);
  if (!Number.isFinite(value)) return { ok: false, message: `${shown} is too large to be a measurement.` };
  return { ok: true, value };
}
