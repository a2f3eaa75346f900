import { fieldName, fieldUnitLabel } from './field-labels';
import type { NumberFieldKey } from './fields';
import type { RowInput } from './row-input';
import {
  formatValue as f,
  GS_MIN_ORGANIC,
  MAX_SOIL_UNIT_WEIGHT,
  OCR_TOLERANCE,
  OVERBURDEN_SLACK_KPA,
  outsideRange,
  PI_TOLERANCE_PCT,
  rangeHint,
  rangeText,
  VALUE_RANGES,
  type ValueRange,
} from './row-ranges';

/** A number that passed its range check, else null. */
export type Checked = (key: NumberFieldKey) => number | null;

/**
 * Every number against its range, then the relations between them (depths, Atterberg limits, Cr < Cc,
 * stresses); gives the values that passed, PI and OCR (read or worked out).
 */
export function checkPhysicalValues(row: RowInput, organic: boolean) {
  const ok = checkRanges(row, organic);
  checkDepths(row, ok);
  const plasticity = checkAtterbergLimits(row, ok);
  checkCompressionIndices(row, ok);
  const stresses = checkStresses(row, ok);
  return { ok, plasticity, stresses };
}

/** Checks every number against its physical range (Gs may go lower for organic soils); returns the values that passed. */
export function checkRanges(row: RowInput, organic: boolean): Checked {
  const passed = new Set<NumberFieldKey>();
  for (const [key, base] of Object.entries(VALUE_RANGES) as [NumberFieldKey, ValueRange][]) {
    const value = row.num(key);
    if (value === null) continue;
    const range: ValueRange = key === 'specificGravity' && organic ? { ...base, min: GS_MIN_ORGANIC } : base;
    const side = outsideRange(value, range);
    if (side === null) {
      passed.add(key);
      continue;
    }
    const unit = fieldUnitLabel(key);
    row.add(
      key,
      `${fieldName(key)} is ${f(value)}${unit ? ` ${unit}` : ''}, outside the range Claybank accepts (${rangeText(range, unit)}).${rangeHint(range, side)}`,
    );
  }
  return (key) => (passed.has(key) ? row.num(key) : null);
}

export function checkDepths(row: RowInput, ok: Checked): void {
  const top = ok('depthTop');
  const bottom = ok('depthBottom');
  if (top !== null && bottom !== null && bottom <= top) {
    row.add(
      'depthBottom',
      `Depth bottom (${f(bottom)} m) is not below depth top (${f(top)} m). Check the two columns are not swapped.`,
    );
  }
}

/** PL ≤ LL, PI = LL − PL within 1 % point, PI ≤ LL; PI worked out from LL − PL when left blank. */
export function checkAtterbergLimits(row: RowInput, ok: Checked): { pi: number | null; derived: boolean } {
  const ll = ok('liquidLimitPct');
  const pl = ok('plasticLimitPct');
  const pi = ok('plasticityIndexPct');
  if (ll !== null && pl !== null && pl > ll) {
    row.add(
      'plasticLimitPct',
      `PL (${f(pl)} %) is above LL (${f(ll)} %); the plastic limit cannot exceed the liquid limit. Check the two columns are not swapped.`,
    );
  } else if (ll !== null && pl !== null && pi !== null && Math.abs(pi - (ll - pl)) > PI_TOLERANCE_PCT) {
    row.add(
      'plasticityIndexPct',
      `PI (${f(pi)} %) does not equal LL − PL (${f(ll)} − ${f(pl)} = ${f(ll - pl)} %). Check the three values, or leave PI blank to have it worked out.`,
    );
  } else if (ll !== null && pi !== null && pi > ll) {
    row.add('plasticityIndexPct', `PI (${f(pi)} %) is more than LL (${f(ll)} %), which cannot be. Check the two columns.`);
  } else if (ll !== null && pl !== null && row.num('plasticityIndexPct') === null) {
    return { pi: ll - pl, derived: true };
  }
  return { pi, derived: false };
}

export function checkCompressionIndices(row: RowInput, ok: Checked): void {
  const cc = ok('compressionIndex');
  const cr = ok('recompressionIndex');
  if (cc !== null && cr !== null && cr >= cc) {
    row.add(
      'recompressionIndex',
      `Cr (${f(cr)}) is not less than Cc (${f(cc)}); the recompression index is always smaller than the compression index. Check the two columns are not swapped.`,
    );
  }
}

/**
 * σ'v0 no more than the heaviest soil could give at the sample depth; OCR worked out as σ'p/σ'v0 when
 * blank, or checked against it within 10 % when given.
 */
export function checkStresses(row: RowInput, ok: Checked): { ocr: number | null; derived: boolean } {
  const sp = ok('preconsolidationStress');
  const sv = ok('verticalEffectiveStress');
  const ocr = ok('overconsolidationRatio');
  const depth = ok('depthBottom') ?? ok('depthTop');
  if (sv !== null && depth !== null) {
    const limit = MAX_SOIL_UNIT_WEIGHT * depth + OVERBURDEN_SLACK_KPA;
    if (sv > limit) {
      row.add(
        'verticalEffectiveStress',
        `σ'v0 (${f(sv)} kPa) at ${f(depth)} m depth is more than the weight of the soil above could give (about ${f(limit)} kPa at most). If the column is in psf or tsf, choose that unit.`,
      );
    }
  }
  if (sp === null || sv === null || sv <= 0) return { ocr, derived: false };
  const ratio = sp / sv;
  if (row.num('overconsolidationRatio') === null) {
    if (ratio >= 0.5) return { ocr: ratio, derived: true };
    row.add(
      'preconsolidationStress',
      `σ'p ÷ σ'v0 (${f(sp)} ÷ ${f(sv)}) gives an OCR of ${f(ratio)}; below 0.5 one of the two stresses must be wrong. Check both and their units.`,
    );
  } else if (ocr !== null && Math.abs(ocr - ratio) > OCR_TOLERANCE * ratio) {
    row.add(
      'overconsolidationRatio',
      `OCR (${f(ocr)}) does not match σ'p ÷ σ'v0 (${f(sp)} ÷ ${f(sv)} = ${f(ratio)}) within 10 %. Check the three values, or leave OCR blank to have it worked out.`,
    );
  }
  return { ocr, derived: false };
}
