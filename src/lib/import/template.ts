import Papa from 'papaparse';
import { IMPORT_FIELDS, type ImportFieldKey } from './fields';
import { neutraliseCell } from './formula-text';
import { isMeasuredKind, UNIT_CHOICES } from './units';

/**
 * One invented example test (the Saltreach demo scenario; no real site), in the bank's SI units. It
 * passes every check: OCR = 72 / 55, PI = LL − PL, Cr < Cc, and k ≈ cv·mv·γw.
 */
const EXAMPLE: Readonly<Record<ImportFieldKey, string>> = {
  projectName: 'Quayside Relief Road (invented)',
  clientName: 'Saltreach Harbour Board (invented)',
  boreholeId: 'QF-BH-01',
  sampleId: 'U4',
  easting: '412300',
  northing: '286700',
  latitude: '',
  longitude: '',
  coordinateSystem: 'Saltreach local grid (invented)',
  notes: 'Example row; replace with your own tests.',
  region: 'Saltreach Estuary',
  geologicalUnit: 'Saltreach Estuarine Clay',
  locationCell: '',
  depthTop: '6.00',
  depthBottom: '6.45',
  uscsSymbol: 'CH',
  samplingMethod: 'piston',
  waterContentPct: '78',
  liquidLimitPct: '82',
  plasticLimitPct: '32',
  plasticityIndexPct: '50',
  specificGravity: '2.68',
  bulkUnitWeight: '15.6',
  initialVoidRatio: '2.10',
  organicContentPct: '3.5',
  testMethod: 'incremental',
  testStandard: 'ASTM D2435',
  compressionIndex: '0.85',
  recompressionIndex: '0.09',
  preconsolidationStress: '72',
  verticalEffectiveStress: '55',
  overconsolidationRatio: '1.31',
  cvNc: '1.2',
  cvOc: '8',
  secondaryCompressionIndex: '0.035',
  mv: '1.1',
  permeability: '4.1E-10',
  deltaEOverE0: '0.035',
};

/** A field's template column name: the label, with its SI unit in brackets when it has one ("Depth top (m)"). */
export function templateHeader(field: (typeof IMPORT_FIELDS)[number]): string {
  return isMeasuredKind(field.unitKind) ? `${field.label} (${UNIT_CHOICES[field.unitKind][0]?.label})` : field.label;
}

/**
 * The CSV template: a header of every import field with its SI unit, and one invented example row.
 * Starts with a UTF-8 byte-order mark so spreadsheets show σ', Δ and ² correctly; lines end in CRLF.
 * Every text cell goes through neutraliseCell, as in every download (numbers stay numbers, so a
 * negative value is never turned into text).
 */
export function templateCsv(): string {
  const header = IMPORT_FIELDS.map((f) => neutraliseCell(templateHeader(f)));
  const example = IMPORT_FIELDS.map((f) => {
    const value = EXAMPLE[f.key] ?? '';
    return f.type === 'text' ? neutraliseCell(value) : value;
  });
  return `\uFEFF${Papa.unparse([header, example], { newline: '\r\n' })}\r\n`;
}

export interface ColumnGuideEntry {
  column: string;
  field: ImportFieldKey;
  required: boolean;
  /** unit choices the mapping step offers, SI first; empty for unitless fields */
  units: string[];
  /** where the value ends up: private to the firm, or shared in the bank */
  scope: 'private' | 'shared';
  guide: string;
}

/** One entry per template column, for the guide shown beside the template download. */
export function columnGuide(): ColumnGuideEntry[] {
  return IMPORT_FIELDS.map((f) => ({
    column: templateHeader(f),
    field: f.key,
    required: f.required,
    units: isMeasuredKind(f.unitKind) ? UNIT_CHOICES[f.unitKind].map((u) => u.label) : [],
    scope: f.scope,
    guide: f.guide,
  }));
}
