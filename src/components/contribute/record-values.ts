import { recordValue } from '../../lib/contracts/records';
import type { OwnRecord } from '../../lib/contracts/submissions';
import { FIELD_BY_KEY } from '../../lib/import';
import { storedName } from './record-fields';

/** A stored value as editable text (SI units, decimal point). */
export function valueText(record: OwnRecord, field: string): string {
  const value = recordValue(record, storedName(field));
  return value === null || value === undefined ? '' : String(value);
}

export type ParsedValues =
  | { ok: true; values: Record<string, number | string | null> }
  | { ok: false; errors: Record<string, string> };

/** The fields whose text changed, as the correction endpoint takes them: numbers, text, or null for blank. */
export function changedValues(record: OwnRecord, texts: Readonly<Record<string, string>>): ParsedValues {
  const values: Record<string, number | string | null> = {};
  const errors: Record<string, string> = {};
  for (const [field, raw] of Object.entries(texts)) {
    const text = raw.trim();
    if (text === valueText(record, field)) continue;
    const definition = FIELD_BY_KEY.get(field);
    if (!definition) continue;
    if (text === '') values[field] = null;
    else if (definition.type === 'text') values[field] = text;
    else {
      const number = Number(text.replace(',', '.'));
      if (Number.isFinite(number)) values[field] = number;
      else errors[field] = 'Enter a number, with a decimal point.';
    }
  }
  return Object.keys(errors).length ? { ok: false, errors } : { ok: true, values };
}
