import { UNIT_CHOICES, type UnitChoice, unitKey } from '../../import/units';

/** Kinds of quantity in a readings file, and the units each may be written in (the first is the core's unit). */
export type LabUnitKind = 'displacement' | 'time' | 'mass' | 'stress' | 'percent' | 'none';

const choice = (id: string, label: string, toSi: number, aliases: readonly string[]): UnitChoice => ({
  id,
  label,
  toSi,
  aliases,
});

/** 1 in = 25.4 mm exactly (NIST SP 811 (2008), Appendix B). */
const MM_PER_INCH = 25.4;

export const LAB_UNIT_CHOICES: Readonly<Record<Exclude<LabUnitKind, 'none' | 'percent'>, readonly UnitChoice[]>> = {
  displacement: [
    choice('mm', 'mm', 1, ['mm', 'millimetre', 'millimetres', 'millimeter', 'millimeters']),
    choice('µm', 'µm', 0.001, ['µm', 'μm', 'um', 'micron', 'microns']),
    choice('cm', 'cm', 10, ['cm']),
    choice('in', 'in', MM_PER_INCH, ['in', 'inch', 'inches']),
  ],
  time: [
    choice('min', 'min', 1, ['min', 'mins', 'minute', 'minutes']),
    choice('s', 's', 1 / 60, ['s', 'sec', 'secs', 'second', 'seconds']),
    choice('h', 'h', 60, ['h', 'hr', 'hrs', 'hour', 'hours']),
    choice('day', 'day', 1440, ['d', 'day', 'days']),
  ],
  mass: [choice('g', 'g', 1, ['g', 'gram', 'grams']), choice('kg', 'kg', 1000, ['kg'])],
  stress: UNIT_CHOICES.stress,
};

const PERCENT = new Set(['%', 'percent']);
const UNITLESS = new Set(['-', '–', '—', 'none', 'dimensionless', 'ratio']);

/** The unit written for a column of `kind`: the choice, null when the text is no unit at all, or 'wrong' when it is a unit of another kind. */
export function labUnit(kind: LabUnitKind, text: string): UnitChoice | null | 'wrong' {
  const key = unitKey(text);
  if (kind === 'percent') return PERCENT.has(key) ? choice('%', '%', 1, ['%']) : anyUnit(key) ? 'wrong' : null;
  if (kind === 'none') return UNITLESS.has(key) ? choice('', '', 1, []) : anyUnit(key) ? 'wrong' : null;
  const found = LAB_UNIT_CHOICES[kind].find((c) => c.aliases.includes(key));
  return found ?? (anyUnit(key) ? 'wrong' : null);
}

/** True when the text names a unit of any kind (so a bracketed "(kPa)" is not mistaken for part of a name). */
function anyUnit(key: string): boolean {
  if (PERCENT.has(key) || UNITLESS.has(key)) return true;
  for (const list of Object.values(LAB_UNIT_CHOICES)) if (list.some((c) => c.aliases.includes(key))) return true;
  return Object.values(UNIT_CHOICES).some((list) => list.some((c) => c.aliases.includes(key)));
}

/** "mm, µm, cm or in" */
export function unitList(kind: LabUnitKind): string {
  if (kind === 'percent') return '%';
  if (kind === 'none') return 'no unit';
  const labels = LAB_UNIT_CHOICES[kind].map((c) => c.label);
  return labels.length > 1 ? `${labels.slice(0, -1).join(', ')} or ${labels.at(-1)}` : (labels[0] ?? '');
}
