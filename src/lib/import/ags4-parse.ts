import { failure, type ImportIssue, type ImportResult } from './errors';

/**
 * The structure of an AGS4 file: groups, each with a HEADING line, UNIT and TYPE lines and DATA lines.
 * Every line is a comma-separated list of quoted fields whose first field says what the line is.
 * source: AGS4 data-transfer format (Association of Geotechnical & Geoenvironmental Specialists).
 */
export interface Ags4Record {
  /** 1-based line of the file */
  line: number;
  values: Readonly<Record<string, string>>;
}

export interface Ags4Group {
  name: string;
  line: number;
  headings: string[];
  units: Readonly<Record<string, string>>;
  /** the UNIT line, for messages */
  unitLine: number | null;
  rows: Ags4Record[];
}

const DESCRIPTORS = new Set(['GROUP', 'HEADING', 'UNIT', 'TYPE', 'DATA']);
const MAX_ISSUES = 50;

/** Splits one AGS4 line into its fields: quoted ("" is a quote inside), or bare as a lenient reading. */
export function splitAgsLine(line: string): { ok: true; fields: string[] } | { ok: false; message: string } {
  const fields: string[] = [];
  let i = 0;
  const n = line.length;
  for (;;) {
    while (i < n && (line[i] === ' ' || line[i] === '\t')) i++;
    let field = '';
    if (line[i] === '"') {
      i++;
      for (;;) {
        const q = line.indexOf('"', i);
        if (q < 0) return { ok: false, message: 'a quote is opened but never closed.' };
        field += line.slice(i, q);
        if (line[q + 1] === '"') {
          field += '"';
          i = q + 2;
        } else {
          i = q + 1;
          break;
        }
      }
      while (i < n && (line[i] === ' ' || line[i] === '\t')) i++;
      if (i < n && line[i] !== ',')
        return { ok: false, message: 'there is text after a closing quote; every field must be in quotes, separated by commas.' };
    } else {
      const comma = line.indexOf(',', i);
      field = (comma < 0 ? line.slice(i) : line.slice(i, comma)).trim();
      i = comma < 0 ? n : comma;
    }
    fields.push(field);
    if (i >= n) return { ok: true, fields };
    i++;
  }
}

/**
 * Reads the groups of an AGS4 file. Structural faults (a DATA line before its HEADING, a line with the
 * wrong number of fields, an unknown descriptor, a group given twice) are collected with their line
 * numbers and returned together as AGS4_MALFORMED; a file that does not start with a GROUP line is NOT_AGS4.
 */
export function parseAgs4Groups(text: string): ImportResult<{ groups: Map<string, Ags4Group> }> {
  const lines = text.split(/\r\n|\n|\r/);
  const groups = new Map<string, Ags4Group>();
  const issues: ImportIssue[] = [];
  const problem = (line: number, message: string) => {
    if (issues.length < MAX_ISSUES) issues.push({ line, message: `Line ${line}: ${message}` });
  };
  let group: Ags4Group | null = null;
  let sawGroup = false;
  for (const [index, raw] of lines.entries()) {
    const line = index + 1;
    if (raw.trim() === '') continue;
    const split = splitAgsLine(raw);
    if (!split.ok) {
      if (!sawGroup) return notAgs4();
      problem(line, split.message);
      continue;
    }
    const [descriptor = '', ...rest] = split.fields;
    if (!sawGroup && descriptor !== 'GROUP') return notAgs4();
    if (!DESCRIPTORS.has(descriptor)) {
      problem(
        line,
        `the line starts with "${descriptor.slice(0, 40)}"; AGS4 lines start with GROUP, HEADING, UNIT, TYPE or DATA.`,
      );
      continue;
    }
    if (descriptor === 'GROUP') {
      sawGroup = true;
      const name = rest[0] ?? '';
      group = null;
      if (name === '' || rest.slice(1).some((f) => f !== ''))
        problem(line, 'a GROUP line holds the group name only, e.g. "GROUP","CONG".');
      else if (groups.has(name))
        problem(line, `group ${name} is given again (first at line ${groups.get(name)?.line}); AGS4 lists each group once.`);
      else {
        group = { name, line, headings: [], units: {}, unitLine: null, rows: [] };
        groups.set(name, group);
      }
      continue;
    }
    if (!group) continue;
    if (descriptor === 'HEADING') {
      if (group.headings.length > 0) problem(line, `group ${group.name} has a second HEADING line.`);
      else if (group.rows.length > 0) problem(line, `the HEADING line of group ${group.name} comes after its DATA.`);
      else {
        const duplicate = rest.find((h, i) => h === '' || rest.indexOf(h) !== i);
        if (duplicate !== undefined)
          problem(line, duplicate === '' ? 'a heading is empty.' : `heading ${duplicate} is given twice.`);
        else group.headings = rest;
      }
      continue;
    }
    if (group.headings.length === 0) {
      problem(line, `${descriptor} line in group ${group.name} comes before its HEADING line.`);
      continue;
    }
    if (rest.length !== group.headings.length) {
      problem(
        line,
        `the ${descriptor} line has ${rest.length} fields but group ${group.name} has ${group.headings.length} headings.`,
      );
      continue;
    }
    const values = Object.fromEntries(group.headings.map((h, i) => [h, rest[i] ?? '']));
    if (descriptor === 'UNIT') {
      group.units = values;
      group.unitLine = line;
    } else if (descriptor === 'DATA') group.rows.push({ line, values });
  }
  if (!sawGroup) return notAgs4();
  if (issues.length > 0) {
    const more = issues.length >= MAX_ISSUES ? ` (the first ${MAX_ISSUES} are listed)` : '';
    return failure(
      'AGS4_MALFORMED',
      `The AGS4 file is not well formed: ${issues.length} problem${issues.length === 1 ? '' : 's'}${more}. The first: ${issues[0]?.message}`,
      issues,
    );
  }
  return { ok: true, groups };
}

function notAgs4() {
  return failure(
    'NOT_AGS4',
    'This does not look like an AGS4 file: its first line should be a GROUP line such as "GROUP","PROJ".',
  );
}
