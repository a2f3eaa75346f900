import { IMPORT_FIELDS } from '../../lib/import';

interface FieldSelectProps {
  id: string;
  label: string;
  value: string | null;
  onChange(field: string | null): void;
}

const GROUPS = [
  { scope: 'shared', label: 'Shared with other firms (anonymised)' },
  { scope: 'private', label: 'Private to your firm' },
] as const;

/** The Claybank field a column holds, or "not imported". */
export default function FieldSelect({ id, label, value, onChange }: FieldSelectProps) {
  return (
    <>
      <label htmlFor={id} className="sr-only">
        {label}
      </label>
      <select
        id={id}
        className="w-full rounded border border-ink-300 bg-white px-1 py-0.5 text-sm"
        value={value ?? ''}
        onChange={(event) => onChange(event.target.value === '' ? null : event.target.value)}
        data-testid="mapping-field"
      >
        <option value="">Not imported</option>
        {GROUPS.map((group) => (
          <optgroup key={group.scope} label={group.label}>
            {IMPORT_FIELDS.filter((f) => f.scope === group.scope).map((f) => (
              <option key={f.key} value={f.key}>
                {f.label}
                {f.required ? ' (required)' : ''}
              </option>
            ))}
          </optgroup>
        ))}
      </select>
    </>
  );
}
