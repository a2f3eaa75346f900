import { FIELD_BY_KEY } from './fields';

const SI_LABEL: Readonly<Record<string, string>> = {
  length: 'm',
  stress: 'kPa',
  cv: 'm²/yr',
  unitWeight: 'kN/m³',
  mv: 'm²/MN',
  permeability: 'm/s',
};

/** The field's name for messages, without a bracketed unit ("wn (%)" → "wn"); the key when unknown. */
export function fieldName(key: string): string {
  const label = FIELD_BY_KEY.get(key)?.label ?? key;
  return label.replace(/\s*\(%\)$/, '');
}

/** The bank's unit for a field as people write it ("m", "kPa", "%"), or '' when it has none. */
export function fieldUnitLabel(key: string): string {
  const field = FIELD_BY_KEY.get(key);
  if (!field) return '';
  if (key.endsWith('Pct')) return '%';
  return SI_LABEL[field.unitKind] ?? '';
}
