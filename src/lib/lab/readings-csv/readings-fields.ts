import type { LabUnitKind } from './lab-units';

/**
 * The columns of a readings file. Increments section: one row per increment (the specimen's values on the
 * first row of each test, or repeated). Time-readings section (or second file): one row per reading.
 * Header names are matched after lower-casing and dropping spaces, punctuation and a bracketed unit.
 */
export interface ReadingsField {
  key: string;
  label: string;
  kind: LabUnitKind;
  type: 'text' | 'number' | 'integer';
  required: boolean;
  synonyms: readonly string[];
  guide: string;
}

const f = (field: ReadingsField) => field;

const TEST_ID = f({
  key: 'testId',
  label: 'Test',
  kind: 'none',
  type: 'text',
  required: false,
  synonyms: ['test', 'test id', 'test ref', 'specimen', 'specimen id', 'specimen ref', 'sample', 'sample id'],
  guide: 'Your name for the test; needed only when the file holds more than one test.',
});

const INCREMENT = f({
  key: 'incrementNo',
  label: 'Increment',
  kind: 'none',
  type: 'integer',
  required: true,
  synonyms: ['increment', 'increment no', 'increment number', 'inc', 'inc no', 'stage', 'load stage', 'step', 'cons_incn'],
  guide: 'Whole number from 1, in the order the loads were applied.',
});

export const INCREMENT_FIELDS: readonly ReadingsField[] = [
  TEST_ID,
  INCREMENT,
  f({
    key: 'stressKpa',
    label: 'Applied stress',
    kind: 'stress',
    type: 'number',
    required: true,
    synonyms: ['stress', 'applied stress', 'vertical stress', 'applied pressure', 'pressure', 'load', 'sigma v', 'cons_incf'],
    guide: 'The vertical stress during the increment.',
  }),
  f({
    key: 'deformationMm',
    label: 'Deformation at end',
    kind: 'displacement',
    type: 'number',
    required: false,
    synonyms: ['deformation', 'end deformation', 'final deformation', 'cumulative deformation', 'settlement', 'compression'],
    guide: 'Settlement since the start of the test at the end of the increment; or give the void ratio.',
  }),
  f({
    key: 'voidRatio',
    label: 'Void ratio at end',
    kind: 'none',
    type: 'number',
    required: false,
    synonyms: ['void ratio', 'e', 'e end', 'end void ratio', 'cons_ince'],
    guide: 'The void ratio at the end of the increment, when the deformation is not given.',
  }),
  f({
    key: 'initialHeightMm',
    label: 'Initial height',
    kind: 'displacement',
    type: 'number',
    required: false,
    synonyms: ['initial height', 'height', 'specimen height', 'h0', 'cong_higt'],
    guide: 'Needed with deformations, and for cv.',
  }),
  f({
    key: 'diameterMm',
    label: 'Diameter',
    kind: 'displacement',
    type: 'number',
    required: false,
    synonyms: ['diameter', 'specimen diameter', 'cong_sdia'],
    guide: 'Needed with the dry mass.',
  }),
  f({
    key: 'waterContentPct',
    label: 'Water content',
    kind: 'percent',
    type: 'number',
    required: false,
    synonyms: ['water content', 'initial water content', 'moisture content', 'w', 'wn', 'cong_mci'],
    guide: 'Initial water content; gives e0 = w·Gs when nothing better is given.',
  }),
  f({
    key: 'specificGravity',
    label: 'Gs',
    kind: 'none',
    type: 'number',
    required: false,
    synonyms: ['gs', 'specific gravity', 'particle specific gravity', 'specific gravity of solids'],
    guide: 'Specific gravity of the soil particles.',
  }),
  f({
    key: 'dryMassG',
    label: 'Dry mass',
    kind: 'mass',
    type: 'number',
    required: false,
    synonyms: ['dry mass', 'oven dry mass', 'dry mass of specimen', 'md'],
    guide: 'Oven-dry mass of the specimen; with height, diameter and Gs it gives e0.',
  }),
  f({
    key: 'initialVoidRatio',
    label: 'e0',
    kind: 'none',
    type: 'number',
    required: false,
    synonyms: ['e0', 'initial void ratio', 'cong_ivr'],
    guide: 'Initial void ratio, when the dry mass is not given.',
  }),
];

export const TIME_READING_FIELDS: readonly ReadingsField[] = [
  TEST_ID,
  INCREMENT,
  f({
    key: 'elapsedMin',
    label: 'Elapsed time',
    kind: 'time',
    type: 'number',
    required: true,
    synonyms: ['elapsed time', 'time', 'elapsed', 't', 'time since loading'],
    guide: 'Time since the increment was applied.',
  }),
  f({
    key: 'deformationMm',
    label: 'Deformation',
    kind: 'displacement',
    type: 'number',
    required: true,
    synonyms: ['deformation', 'settlement', 'compression', 'displacement'],
    guide: 'Settlement since the start of the test, on the same datum as the increments.',
  }),
];

/** The specimen columns of the increments section (one value per test). */
export const SPECIMEN_KEYS = [
  'initialHeightMm',
  'diameterMm',
  'waterContentPct',
  'specificGravity',
  'dryMassG',
  'initialVoidRatio',
] as const;
