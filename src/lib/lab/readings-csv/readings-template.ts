import Papa from 'papaparse';
import { syntheticIncrementalTest } from '../synthetic/synthetic-test';
import { LAB_UNIT_CHOICES } from './lab-units';
import { INCREMENT_FIELDS, type ReadingsField, TIME_READING_FIELDS } from './readings-fields';
import { TIME_READINGS_MARKER } from './readings-sections';

const TEST_ID = 'QF-BH-01 U4 (invented)';
const STRESSES_KPA = [12.5, 25, 50, 100, 200, 400, 800, 200, 50];
/** the increments whose time readings the template shows */
const TIMED = new Set([5, 6]);

/** A column's template name: its label with the core's unit ("Applied stress (kPa)", "Water content (%)"). */
export function readingsHeader(field: ReadingsField): string {
  if (field.kind === 'percent') return `${field.label} (%)`;
  if (field.kind === 'none') return field.label;
  return `${field.label} (${LAB_UNIT_CHOICES[field.kind][0]?.label})`;
}

const mm = (v: number) => v.toFixed(3);

/**
 * The readings template: the increments of one invented test (the Saltreach demo scenario; no real site),
 * its specimen values on the first row, then a `[time readings]` section with the readings of two
 * increments. The numbers come from Terzaghi's solution and a chosen e–log σ′ curve (e0 2.10, Cc 0.85,
 * Cr 0.09, σ′p 72 kPa, cv 1.2 m²/yr) with 0.001 mm of noise, rounded to 0.001 mm. UTF-8 with a byte-order
 * mark, CRLF line ends, like the test-record template.
 */
export function readingsTemplateCsv(): string {
  const test = syntheticIncrementalTest({
    curve: { e0: 2.1, cc: 0.85, cr: 0.09, sigmaPKpa: 72, sigmaV0Kpa: 55, deltaEOverE0: 0.035, bendLogCycles: 0.03 },
    stressesKpa: STRESSES_KPA,
    cvM2PerYear: 1.2,
    cAlphaOverCc: 0.03,
    immediateShare: 0.02,
    initialHeightMm: 19,
    diameterMm: 75,
    specificGravity: 2.68,
    noiseMm: 0.001,
    seed: 2026,
  });
  const s = test.specimen;
  const incrementRows = test.increments.map((inc, i) => {
    const first = i === 0;
    const cells: Record<string, string> = {
      testId: TEST_ID,
      incrementNo: String(inc.incrementNo),
      stressKpa: String(inc.stressKpa),
      deformationMm: mm(inc.deformationMm ?? 0),
      voidRatio: '',
      initialHeightMm: first ? String(s.initialHeightMm) : '',
      diameterMm: first ? String(s.diameterMm) : '',
      waterContentPct: first ? (s.waterContentPct ?? 0).toFixed(1) : '',
      specificGravity: first ? String(s.specificGravity) : '',
      dryMassG: first ? (s.dryMassG ?? 0).toFixed(2) : '',
      initialVoidRatio: '',
    };
    return INCREMENT_FIELDS.map((f) => cells[f.key] ?? '');
  });
  const readingRows = test.increments
    .filter((inc) => TIMED.has(inc.incrementNo))
    .flatMap((inc) =>
      (inc.readings ?? []).map((r) => [TEST_ID, String(inc.incrementNo), String(r.elapsedMin), mm(r.deformationMm)]),
    );
  const increments = Papa.unparse([INCREMENT_FIELDS.map(readingsHeader), ...incrementRows], { newline: '\r\n' });
  const readings = Papa.unparse([TIME_READING_FIELDS.map(readingsHeader), ...readingRows], { newline: '\r\n' });
  return `\uFEFF${increments}\r\n\r\n${TIME_READINGS_MARKER}\r\n${readings}\r\n`;
}

export interface ReadingsColumnGuideEntry {
  section: 'increments' | 'time readings';
  column: string;
  key: string;
  required: boolean;
  units: string[];
  guide: string;
}

/** One entry per template column, for the guide shown beside the template download. */
export function readingsColumnGuide(): ReadingsColumnGuideEntry[] {
  const entry =
    (section: ReadingsColumnGuideEntry['section']) =>
    (f: ReadingsField): ReadingsColumnGuideEntry => ({
      section,
      column: readingsHeader(f),
      key: f.key,
      required: f.required,
      units: f.kind === 'none' ? [] : f.kind === 'percent' ? ['%'] : LAB_UNIT_CHOICES[f.kind].map((u) => u.label),
      guide: f.guide,
    });
  return [...INCREMENT_FIELDS.map(entry('increments')), ...TIME_READING_FIELDS.map(entry('time readings'))];
}
