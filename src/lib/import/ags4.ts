import { type Ags4Group, parseAgs4Groups } from './ags4-parse';
import { buildAgs4Rows } from './ags4-rows';
import { AgsValues, groupFactors } from './ags4-values';
import { decodeText } from './decode';
import { failure, type ImportResult } from './errors';
import { MAX_ROWS } from './limits';
import type { RawRow } from './raw-row';

const SAMPLE_KEY = ['LOCA_ID', 'SAMP_TOP', 'SAMP_REF', 'SAMP_TYPE', 'SAMP_ID'];
const SPECIMEN_KEY = [...SAMPLE_KEY, 'SPEC_REF', 'SPEC_DPTH'];

/** The groups Claybank reads and the headings it uses in each (headings per the AGS4 dictionary). */
export const AGS4_READ_HEADINGS: Readonly<Record<string, readonly string[]>> = {
  PROJ: ['PROJ_ID', 'PROJ_NAME', 'PROJ_CLNT'],
  LOCA: ['LOCA_ID', 'LOCA_NATE', 'LOCA_NATN', 'LOCA_GREF'],
  SAMP: [...SAMPLE_KEY, 'SAMP_BASE'],
  GEOL: ['LOCA_ID', 'GEOL_TOP', 'GEOL_BASE', 'GEOL_GEOL', 'GEOL_GEO2'],
  LLPL: [...SPECIMEN_KEY, 'LLPL_LL', 'LLPL_PL', 'LLPL_PI'],
  LNMC: [...SPECIMEN_KEY, 'LNMC_MC'],
  LDEN: [...SPECIMEN_KEY, 'LDEN_BDEN'],
  LPDN: [...SPECIMEN_KEY, 'LPDN_PDEN'],
  CONG: [...SPECIMEN_KEY, 'CONG_TYPE', 'CONG_HIGT', 'CONG_MCI', 'CONG_BDEN', 'CONG_PDEN', 'CONG_IVR', 'CONG_REM', 'CONG_METH'],
  CONS: [...SPECIMEN_KEY, 'CONS_INCN', 'CONS_IVR', 'CONS_INCF', 'CONS_INCE', 'CONS_INMV', 'CONS_INSC', 'CONS_CVRT', 'CONS_CVLG'],
};

/** Groups that describe the file itself; skipped without a notice. */
const FILE_GROUPS = new Set(['TRAN', 'UNIT', 'ABBR', 'TYPE', 'DICT', 'FILE']);
/** Headings that are bookkeeping in every group; skipped without a notice. */
const QUIET_HEADINGS = new Set(['FILE_FSET']);

const REQUIRED_HEADINGS: Readonly<Record<string, readonly string[]>> = {
  CONG: ['LOCA_ID', 'SAMP_TOP'],
  CONS: ['LOCA_ID', 'SAMP_TOP', 'CONS_INCN', 'CONS_INCF'],
};

export interface Ags4Options {
  /** the region every test in the file belongs to (AGS4 has no region heading; the person chooses it) */
  region: string;
  /** geology code (GEOL_GEOL or GEOL_GEO2) → the bank's geological unit name; unmapped codes are used as written */
  geologyMap?: Readonly<Record<string, string>>;
}

export type Ags4Result = ImportResult<{
  /** one per CONG record, `row` being the CONG DATA line; the same shape the CSV path gives */
  rows: RawRow[];
  /** remarks for the person: groups and headings not read, CONS rows without a test, unknown test types */
  notices: string[];
  /** the distinct GEOL_GEOL / GEOL_GEO2 codes, for mapping them to the bank's geological units */
  geologyCodes: string[];
}>;

/**
 * Reads an AGS4 file into raw rows (one per consolidation test) for `validateRows`, honouring each
 * group's UNIT line. Never throws. File-level errors: the decoding ones of `decodeText`, NOT_AGS4,
 * AGS4_MALFORMED (with every offending line), AGS4_NO_TESTS, AGS4_UNKNOWN_UNIT and TOO_MANY_ROWS.
 */
export function readAgs4(input: Uint8Array | string, options: Ags4Options): Ags4Result {
  try {
    const decoded = decodeText(input);
    if (!decoded.ok) return decoded;
    const parsed = parseAgs4Groups(decoded.text);
    if (!parsed.ok) return parsed;
    const { groups } = parsed;
    const cong = groups.get('CONG');
    if (!cong || cong.rows.length === 0) {
      return failure(
        'AGS4_NO_TESTS',
        'The file has no consolidation tests (no DATA in a CONG group), so there is nothing for Claybank to import.',
      );
    }
    if (cong.rows.length > MAX_ROWS) {
      return failure(
        'TOO_MANY_ROWS',
        `The file has ${cong.rows.length.toLocaleString('en-GB')} consolidation tests; split it into files of at most ${MAX_ROWS.toLocaleString('en-GB')}.`,
      );
    }
    for (const [name, required] of Object.entries(REQUIRED_HEADINGS)) {
      const group = groups.get(name);
      const missing = group ? required.filter((h) => !group.headings.includes(h)) : [];
      if (group && missing.length > 0) {
        return failure(
          'AGS4_MALFORMED',
          `Group ${name} (line ${group.line}) has no ${missing.join(', ')} heading; Claybank needs it to read the tests.`,
          [{ line: group.line, message: `Line ${group.line}: group ${name} lacks ${missing.join(', ')}.` }],
        );
      }
    }
    const factors = new Map<string, Map<string, number>>();
    for (const name of Object.keys(AGS4_READ_HEADINGS)) {
      const group = groups.get(name);
      if (!group) continue;
      const result = groupFactors(group);
      if (!('factors' in result)) {
        const line = group.unitLine ?? group.line;
        return failure(
          'AGS4_UNKNOWN_UNIT',
          `Group ${name} gives ${result.heading} in "${result.unit}", a unit Claybank cannot convert (line ${line}). Use the AGS4 unit for that heading.`,
          [{ line, message: `Line ${line}: unit "${result.unit}" of ${result.heading}.` }],
        );
      }
      factors.set(name, result.factors);
    }
    const read = (name: string, record: Ags4Group['rows'][number]) =>
      new AgsValues(groups.get(name) as Ags4Group, factors.get(name) ?? new Map(), record);
    const built = buildAgs4Rows(groups, read, options);
    return {
      ok: true,
      rows: built.rows,
      notices: [...skippedNotices(groups), ...built.notices],
      geologyCodes: built.geologyCodes,
    };
  } catch {
    return failure('READ_FAILED', 'The AGS4 file could not be read. Check it opens in an AGS4 checker and retry.');
  }
}

function skippedNotices(groups: ReadonlyMap<string, Ags4Group>): string[] {
  const notices: string[] = [];
  for (const group of groups.values()) {
    const used = Object.hasOwn(AGS4_READ_HEADINGS, group.name) ? AGS4_READ_HEADINGS[group.name] : undefined;
    if (!used) {
      if (!FILE_GROUPS.has(group.name)) {
        const n = group.rows.length;
        notices.push(`Group ${group.name} is not read by Claybank; its ${n} row${n === 1 ? ' was' : 's were'} skipped.`);
      }
      continue;
    }
    const unused = group.headings.filter((h) => !used.includes(h) && !QUIET_HEADINGS.has(h));
    if (unused.length > 0) {
      notices.push(
        `Group ${group.name}: heading${unused.length === 1 ? '' : 's'} ${unused.join(', ')} ${unused.length === 1 ? 'is' : 'are'} not read by Claybank.`,
      );
    }
  }
  return notices;
}
