import type { IncrementalInterpretation } from './interpret-incremental';
import { cannot, type Derived, determined, shown } from './outcome';

/** Values the contributing laboratory submitted, in the bank's units (the import field names). */
export interface SubmittedValues {
  initialVoidRatio?: number | null;
  compressionIndex?: number | null;
  recompressionIndex?: number | null;
  preconsolidationStress?: number | null;
  cvNc?: number | null;
  cvOc?: number | null;
  secondaryCompressionIndex?: number | null;
  deltaEOverE0?: number | null;
}

export type ReviewedParameter = keyof SubmittedValues;

/** A tolerance: relative (|derived/submitted − 1|), a factor (ratio within 1/f…f) or absolute. */
export type Tolerance = { relative: number } | { factor: number } | { absolute: number };

/**
 * common practice (our own tolerances): how far a submitted value may sit from the one derived from the
 * readings before a steward is asked to look. cv is compared by a factor because the two fitting methods
 * themselves commonly differ by up to about 1.5 times (root time above log time).
 */
export const REVIEW_TOLERANCES: Readonly<Record<ReviewedParameter, Tolerance>> = {
  initialVoidRatio: { absolute: 0.05 },
  compressionIndex: { relative: 0.15 },
  recompressionIndex: { relative: 0.3 },
  preconsolidationStress: { relative: 0.2 },
  cvNc: { factor: 2 },
  cvOc: { factor: 2 },
  secondaryCompressionIndex: { relative: 0.3 },
  deltaEOverE0: { absolute: 0.01 },
};

export interface ReviewFlag {
  parameter: ReviewedParameter;
  kind: 'disagrees' | 'not-derivable';
  submitted: number;
  /** the derived values compared (one per method where there are two); empty when none could be derived */
  derived: number[];
  tolerance: Tolerance;
  message: string;
}

const LABELS: Readonly<Record<ReviewedParameter, string>> = {
  initialVoidRatio: 'e0',
  compressionIndex: 'Cc',
  recompressionIndex: 'Cr',
  preconsolidationStress: 'σ′p',
  cvNc: 'cv (NC range)',
  cvOc: 'cv (OC range)',
  secondaryCompressionIndex: 'Cα',
  deltaEOverE0: 'Δe/e0',
};

/** Reasons that mean the readings simply lack the data (no flag), as opposed to readings that are wrong. */
const ABSENT: ReadonlySet<string> = new Set(['no-readings', 'no-unloading', 'missing-input']);

/**
 * Review flags for a steward: each submitted value that lies outside its tolerance of every value derived
 * for it ('disagrees'), and each submitted value whose derivation the readings refuse for a reason other than
 * missing data ('not-derivable', with that reason). σ′p is compared with both constructions; cv (NC range)
 * with the median cv of the loading increments that start at or above σ′p, cv (OC range) with those that
 * end at or below it, each method on its own; Cα with the median of the virgin increments.
 */
export function reviewFlags(
  interpretation: IncrementalInterpretation,
  submitted: SubmittedValues,
  tolerances: Readonly<Record<ReviewedParameter, Tolerance>> = REVIEW_TOLERANCES,
): ReviewFlag[] {
  const i = interpretation;
  const sigmaP = i.sigmaPCasagrande.ok
    ? i.sigmaPCasagrande.value.sigmaPKpa
    : i.sigmaPStrainEnergy.ok
      ? i.sigmaPStrainEnergy.value.sigmaPKpa
      : null;
  const loading = i.increments.filter((inc) => inc.branch === 'loading');
  const nc = sigmaP === null ? [] : loading.filter((inc) => inc.previousStressKpa >= sigmaP);
  const oc = sigmaP === null ? [] : loading.filter((inc) => inc.stressKpa <= sigmaP && inc.previousStressKpa > 0);
  const cvOf = (list: typeof loading) => [
    median(list.map((inc) => value(inc.rootTime, (v) => v.cvM2PerYear))),
    median(list.map((inc) => value(inc.logTime, (v) => v.cvM2PerYear))),
  ];
  const candidates: Record<ReviewedParameter, Derived<number>[]> = {
    initialVoidRatio: [value(i.curve, (v) => v.initial.e0)],
    compressionIndex: [value(i.cc, (v) => v.value)],
    recompressionIndex: [value(i.cr, (v) => v.value)],
    preconsolidationStress: [value(i.sigmaPCasagrande, (v) => v.sigmaPKpa), value(i.sigmaPStrainEnergy, (v) => v.sigmaPKpa)],
    cvNc: cvOf(nc),
    cvOc: cvOf(oc),
    secondaryCompressionIndex: [median(nc.map((inc) => value(inc.cAlpha, (v) => v.cAlpha)))],
    deltaEOverE0: [value(i.sampleQuality, (v) => v.deltaEOverE0)],
  };
  const flags: ReviewFlag[] = [];
  for (const parameter of Object.keys(LABELS) as ReviewedParameter[]) {
    const s = submitted[parameter];
    if (typeof s !== 'number' || !Number.isFinite(s)) continue;
    const tolerance = tolerances[parameter];
    const found = candidates[parameter].flatMap((d) => (d.ok ? [d.value] : []));
    const label = LABELS[parameter];
    if (found.length === 0) {
      const refused = candidates[parameter].find((d) => !d.ok && !ABSENT.has(d.reason));
      if (refused && !refused.ok) {
        flags.push({
          parameter,
          kind: 'not-derivable',
          submitted: s,
          derived: [],
          tolerance,
          message: `${label} was submitted as ${shown(s)}, but the readings do not support it: ${refused.message.replace(/\.$/, '')}.`,
        });
      }
      continue;
    }
    if (found.some((d) => within(s, d, tolerance))) continue;
    flags.push({
      parameter,
      kind: 'disagrees',
      submitted: s,
      derived: found,
      tolerance,
      message: `${label} was submitted as ${shown(s)}; the readings give ${found.map(shown).join(' and ')}, outside ${toleranceText(tolerance)}.`,
    });
  }
  return flags;
}

function within(submitted: number, derived: number, t: Tolerance): boolean {
  if ('absolute' in t) return Math.abs(submitted - derived) <= t.absolute;
  if (!(submitted > 0 && derived > 0)) return false;
  if ('factor' in t) return submitted <= derived * t.factor && submitted >= derived / t.factor;
  return Math.abs(derived / submitted - 1) <= t.relative;
}

function toleranceText(t: Tolerance): string {
  if ('absolute' in t) return `±${shown(t.absolute)}`;
  if ('factor' in t) return `a factor of ${shown(t.factor)}`;
  return `±${shown(100 * t.relative)} %`;
}

function value<T>(d: Derived<T>, pick: (v: T) => number): Derived<number> {
  return d.ok ? determined(pick(d.value)) : d;
}

/** The median of the values derived, or the first refusal when none was (an absent-data refusal for an empty list). */
function median(list: Derived<number>[]): Derived<number> {
  const values = list.flatMap((d) => (d.ok ? [d.value] : [])).sort((a, b) => a - b);
  if (values.length === 0)
    return list.find((d) => !d.ok) ?? cannot('cvLogTime', 'no-readings', 'no increment falls in this range.');
  const mid = Math.floor(values.length / 2);
  return determined(values.length % 2 ? (values[mid] as number) : ((values[mid - 1] as number) + (values[mid] as number)) / 2);
}
