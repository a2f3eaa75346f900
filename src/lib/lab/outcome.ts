/**
 * Every derived value is either determined, with the construction that gave it, or plainly not
 * determined, with the reason: never a plausible number from readings that cannot support one.
 */

/** The parameters the interpretation derives, by key; `PARAMETER_LABELS` gives the trade's own symbol. */
export type LabParameter =
  | 'e0'
  | 'curve'
  | 'cc'
  | 'cr'
  | 'sigmaPCasagrande'
  | 'sigmaPStrainEnergy'
  | 'cvRootTime'
  | 'cvLogTime'
  | 'cAlpha'
  | 'mv'
  | 'k'
  | 'deltaEOverE0'
  | 'crs';

export const PARAMETER_LABELS: Readonly<Record<LabParameter, string>> = {
  e0: 'e0',
  curve: 'the e–log σ′ curve',
  cc: 'Cc',
  cr: 'Cr',
  sigmaPCasagrande: 'σ′p (Casagrande)',
  sigmaPStrainEnergy: 'σ′p (strain energy)',
  cvRootTime: 'cv (root time)',
  cvLogTime: 'cv (log time)',
  cAlpha: 'Cα',
  mv: 'mv',
  k: 'k',
  deltaEOverE0: 'Δe/e0',
  crs: 'the CRS curve',
};

/** Why a value could not be determined. */
export type CannotReason =
  | 'missing-input'
  | 'too-few-points'
  | 'no-virgin-branch'
  | 'goes-backwards'
  | 'too-noisy'
  | 'no-unloading'
  | 'no-readings'
  | 'incomplete'
  | 'no-intersection'
  | 'out-of-range';

export interface Determined<T> {
  ok: true;
  value: T;
}

export interface Undetermined {
  ok: false;
  parameter: LabParameter;
  reason: CannotReason;
  /** what is wrong, in plain English, without the "cannot determine" prefix */
  detail: string;
  /** "cannot determine σ′p (Casagrande): <detail>" */
  message: string;
}

export type Derived<T> = Determined<T> | Undetermined;

export function determined<T>(value: T): Determined<T> {
  return { ok: true, value };
}

export function cannot(parameter: LabParameter, reason: CannotReason, detail: string): Undetermined {
  return { ok: false, parameter, reason, detail, message: `cannot determine ${PARAMETER_LABELS[parameter]}: ${detail}` };
}

/** The same failure, reported for a parameter that depends on the one that failed. */
export function because(parameter: LabParameter, failed: Undetermined): Undetermined {
  return failed.parameter === parameter ? failed : cannot(parameter, failed.reason, failed.detail);
}

/** A number for messages: up to 3 significant figures, no exponent for everyday magnitudes. */
export function shown(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  const abs = Math.abs(value);
  if (abs !== 0 && (abs < 0.001 || abs >= 1e6)) return value.toExponential(2);
  return String(Number(value.toPrecision(3)));
}
