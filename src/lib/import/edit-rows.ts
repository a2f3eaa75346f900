import type { RowError } from './errors';
import { FIELD_BY_KEY } from './fields';
import type { RowEdits } from './map-rows';
import { parseNumberCell } from './parse-number';
import type { RawRow } from './raw-row';

/**
 * Applies cell corrections to rows that did not come through `mapRows` (AGS4 rows), values typed in the
 * bank's SI units with a decimal point. An edit replaces the value and clears the reading problem of
 * that field; an edit that is not a number for a numeric field becomes the field's problem. Edits naming
 * unknown fields are ignored. Returns new rows; the input is not changed.
 */
export function applyEdits(rows: readonly RawRow[], edits: RowEdits): RawRow[] {
  return rows.map((raw) => {
    const edit = Object.hasOwn(edits, String(raw.row)) ? edits[String(raw.row)] : undefined;
    if (!edit) return raw;
    const values = { ...raw.values };
    let problems: RowError[] = raw.problems ?? [];
    for (const [key, text] of Object.entries(edit)) {
      const field = FIELD_BY_KEY.get(key);
      if (!field || typeof text !== 'string') continue;
      problems = problems.filter((p) => p.field !== key);
      if (field.type === 'text') {
        values[field.key] = text.trim() === '' ? null : text.trim();
        continue;
      }
      const parsed = parseNumberCell(text, { decimalComma: false, percent: key.endsWith('Pct') });
      if (parsed.ok) values[field.key] = parsed.value;
      else {
        delete values[field.key];
        problems = [...problems, { row: raw.row, field: key, message: `${field.label}: ${parsed.message}` }];
      }
    }
    const { problems: _dropped, ...rest } = raw;
    return problems.length > 0 ? { ...rest, values, problems } : { ...rest, values };
  });
}
