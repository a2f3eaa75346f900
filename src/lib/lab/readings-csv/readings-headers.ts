import { columnName } from '../../import/csv-table';
import { normaliseName } from '../../import/header-text';
import type { UnitChoice } from '../../import/units';
import { labUnit, unitList } from './lab-units';
import type { ReadingsField } from './readings-fields';

export interface HeaderMatch {
  /** field per column, null for a column not read */
  fields: (ReadingsField | null)[];
  /** multiply a column's numbers by this to get the core's unit */
  factors: number[];
  notices: string[];
  /** a column whose unit is written but cannot be converted, or a required field no column names */
  problem: string | null;
}

const BRACKETED = /^(.*?)\s*[([]([^()[\]]*)[)\]]\s*$/;
const TRAILING_WORD = /^(.*\S)\s+(\S+)$/;

/**
 * Matches each header to a field by its name and synonyms, and reads a unit written in brackets or as the
 * last word ("Deformation (µm)", "Stress kPa");
 * a field without a written unit is taken in the core's unit (mm, min, g, kPa). A field named twice keeps
 * its first column.
 */
export function matchHeaders(headers: readonly string[], fields: readonly ReadingsField[], section: string): HeaderMatch {
  const byName = new Map<string, ReadingsField>();
  for (const field of fields)
    for (const name of [field.key, field.label, ...field.synonyms]) byName.set(normaliseName(name), field);
  const out: HeaderMatch = { fields: [], factors: [], notices: [], problem: null };
  const taken = new Set<string>();
  for (const [i, header] of headers.entries()) {
    const bracket = BRACKETED.exec(header.trim()) ?? TRAILING_WORD.exec(header.trim());
    let field = byName.get(normaliseName(header)) ?? null;
    let unit: UnitChoice | null | 'wrong' = null;
    if (bracket) {
      const named = byName.get(normaliseName(bracket[1] ?? ''));
      const written = named ? labUnit(named.kind, bracket[2] ?? '') : null;
      if (named && written !== null) {
        field = named;
        unit = written;
      }
    }
    if (field && taken.has(field.key)) {
      out.notices.push(
        `${section}: ${columnName(i)} "${header}" names ${field.label} again; only the first such column is read.`,
      );
      field = null;
    }
    if (unit === 'wrong' && field) {
      out.problem ??= `${section}: ${columnName(i)} "${header}" gives a unit Claybank cannot convert for ${field.label}; use ${unitList(field.kind)}.`;
    }
    if (!field) {
      if (header.trim() !== '')
        out.notices.push(`${section}: ${columnName(i)} "${header}" is not a readings column and was not read.`);
      out.fields.push(null);
      out.factors.push(1);
      continue;
    }
    taken.add(field.key);
    out.fields.push(field);
    out.factors.push(unit && unit !== 'wrong' ? unit.toSi : 1);
  }
  const missing = fields.filter((f) => f.required && !taken.has(f.key)).map((f) => f.label);
  if (missing.length > 0)
    out.problem ??= `${section}: no column for ${missing.join(', ')}; add ${missing.length === 1 ? 'it' : 'them'} (see the template).`;
  return out;
}
