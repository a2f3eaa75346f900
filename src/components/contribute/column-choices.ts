import { type ColumnMapping, columnLetter, FIELD_BY_KEY, IMPORT_FIELDS, siUnit, UNIT_CHOICES } from '../../lib/import';

/** One column's field and unit, and how they were decided. */
export interface ColumnChoice {
  field: string | null;
  unit: string | null;
  source: 'remembered' | 'header' | 'you' | null;
  note: string | null;
}

export function choicesFromAuto(auto: ColumnMapping): ColumnChoice[] {
  return auto.columns.map((c) => ({ field: c.field, unit: c.unit, source: c.source, note: c.note }));
}

/** Gives `field` to one column; a column that had it loses it (one field per column, one column per field). */
export function chooseField(choices: readonly ColumnChoice[], index: number, field: string | null): ColumnChoice[] {
  const kind = field ? (FIELD_BY_KEY.get(field)?.unitKind ?? 'none') : 'none';
  return choices.map((choice, i) => {
    if (i === index) return { field, unit: field ? siUnit(kind) : null, source: 'you', note: null };
    if (field && choice.field === field) {
      return {
        field: null,
        unit: null,
        source: 'you',
        note: `${FIELD_BY_KEY.get(field)?.label} moved to column ${columnLetter(index)}.`,
      };
    }
    return choice;
  });
}

export function chooseUnit(choices: readonly ColumnChoice[], index: number, unit: string): ColumnChoice[] {
  return choices.map((choice, i) => (i === index ? { ...choice, unit, source: 'you' } : choice));
}

/** The mapping and units as the upload options carry them. */
export function mappingOptions(choices: readonly ColumnChoice[]): { mapping: (string | null)[]; units: Record<string, string> } {
  const units: Record<string, string> = {};
  for (const c of choices) if (c.field && c.unit) units[c.field] = c.unit;
  return { mapping: choices.map((c) => c.field), units };
}

/** Required fields no column gives; the region may come from the whole-file choice instead. */
export function missingRequired(choices: readonly ColumnChoice[], regionForFile: boolean): string[] {
  const given = new Set(choices.map((c) => c.field));
  return IMPORT_FIELDS.filter((f) => f.required && !given.has(f.key) && !(f.key === 'region' && regionForFile)).map((f) => f.key);
}

/** The unit a column is written in, for headings and edits ("ft"), or the bank's unit when it has no column. */
export function columnUnitOf(choices: readonly ColumnChoice[], field: string): string | null {
  const kind = FIELD_BY_KEY.get(field)?.unitKind ?? 'none';
  return choices.find((c) => c.field === field)?.unit ?? siUnit(kind);
}

/** The label of a unit id for a field ("m2/yr" → "m²/yr"), or null for a field without units. */
export function unitLabelOf(field: string, unitId: string | null): string | null {
  const kind = FIELD_BY_KEY.get(field)?.unitKind ?? 'none';
  if (kind === 'none' || !unitId) return null;
  return UNIT_CHOICES[kind].find((u) => u.id === unitId)?.label ?? unitId;
}
