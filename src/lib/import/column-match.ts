import { columnName } from './csv-table';
import { FIELD_BY_KEY, IMPORT_FIELDS, type ImportFieldKey, isImportFieldKey } from './fields';
import { headerParts, rememberKey } from './header-text';
import { fieldForHeader } from './synonym-index';
import { parseUnit, siUnit, unitChoice } from './units';

/** What a firm chose for a header in an earlier upload: the field (or null for "do not import") and unit. */
export interface RememberedColumn {
  field: string | null;
  unit?: string | null;
}
/** Keyed by `rememberKey(header)`. */
export type RememberedMapping = Readonly<Record<string, RememberedColumn>>;

export interface ColumnMatch {
  /** 0-based column index */
  column: number;
  header: string;
  field: ImportFieldKey | null;
  /** unit id of the field's kind (UNIT_CHOICES), SI unless the header or the firm said otherwise; null for unitless fields */
  unit: string | null;
  /** how the field was found */
  source: 'remembered' | 'header' | null;
  /** a remark for the person: why a column was left out, or a unit that did not fit */
  note: string | null;
}

export interface ColumnMapping {
  columns: ColumnMatch[];
  /** field per column, as `mapRows` takes it */
  mapping: (ImportFieldKey | null)[];
  /** unit per mapped field, as `mapRows` takes it */
  units: Partial<Record<ImportFieldKey, string>>;
  /** required fields no column was matched to */
  missingRequired: ImportFieldKey[];
}

/**
 * Matches each column to an import field: first from the firm's remembered choices for the same header,
 * then by the header's name against each field's label and synonyms (case, punctuation, Greek letters and
 * bracketed units ignored). A unit written in the header ("Depth top (ft)") is taken when it fits the
 * field; a remembered unit wins over it. No field is given to two columns: the later column is left
 * unmatched with a note.
 */
export function autoMapColumns(headers: readonly string[], remembered: RememberedMapping = {}): ColumnMapping {
  const columns: ColumnMatch[] = headers.map((header, column) => ({
    column,
    header,
    field: null,
    unit: null,
    source: null,
    note: null,
  }));
  const taken = new Map<ImportFieldKey, number>();
  const claim = (match: ColumnMatch, field: ImportFieldKey, source: 'remembered' | 'header'): void => {
    const owner = taken.get(field);
    if (owner !== undefined) {
      match.note = `Looks like ${FIELD_BY_KEY.get(field)?.label}, which is already matched to ${columnName(owner)}; not imported. Choose a field if it holds something else.`;
      return;
    }
    taken.set(field, match.column);
    match.field = field;
    match.source = source;
  };

  const pending: ColumnMatch[] = [];
  for (const match of columns) {
    const choice = Object.hasOwn(remembered, rememberKey(match.header)) ? remembered[rememberKey(match.header)] : undefined;
    if (choice && (choice.field === null || isImportFieldKey(choice.field))) {
      if (choice.field === null) match.source = 'remembered';
      else claim(match, choice.field, 'remembered');
    } else pending.push(match);
  }
  for (const match of pending) {
    const field = fieldForHeader(match.header);
    if (field) claim(match, field, 'header');
  }

  for (const match of columns) {
    if (!match.field) continue;
    const kind = FIELD_BY_KEY.get(match.field)?.unitKind ?? 'none';
    match.unit = siUnit(kind);
    const rememberedUnit = match.source === 'remembered' ? remembered[rememberKey(match.header)]?.unit : undefined;
    const written = headerParts(match.header).unitText;
    if (rememberedUnit && unitChoice(kind, rememberedUnit)) match.unit = rememberedUnit;
    else if (written) {
      const parsed = parseUnit(written);
      if (parsed && parsed.kind === kind) match.unit = parsed.unit.id;
      else if (match.unit)
        match.note = `The header says "${written}", which is not a unit for ${FIELD_BY_KEY.get(match.field)?.label}; ${match.unit} assumed. Check the unit.`;
    }
  }

  const mapping = columns.map((c) => c.field);
  const units: Partial<Record<ImportFieldKey, string>> = {};
  for (const c of columns) if (c.field && c.unit) units[c.field] = c.unit;
  const missingRequired = IMPORT_FIELDS.filter((f) => f.required && !taken.has(f.key)).map((f) => f.key);
  return { columns, mapping, units, missingRequired };
}

/** The choices to remember for next time, keyed as `autoMapColumns` looks them up. */
export function mappingToRemember(
  headers: readonly string[],
  mapping: readonly (string | null)[],
  units: Readonly<Partial<Record<string, string>>>,
): Record<string, RememberedColumn> {
  const out: Record<string, RememberedColumn> = {};
  for (const [i, header] of headers.entries()) {
    const field = mapping[i] ?? null;
    out[rememberKey(header)] = { field, unit: field ? (units[field] ?? null) : null };
  }
  return out;
}
