interface VocabularySelectProps {
  id: string;
  label: string;
  value: string;
  names: readonly string[];
  /** shown for the empty choice */
  placeholder: string;
  hint?: string;
  onChange(value: string): void;
  testId?: string;
}

/** A region or geological unit from the bank's vocabulary, by name. */
export default function VocabularySelect({
  id,
  label,
  value,
  names,
  placeholder,
  hint,
  onChange,
  testId,
}: VocabularySelectProps) {
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {label}
      </label>
      <select
        id={id}
        className="field-input"
        value={value}
        onChange={(event) => onChange(event.target.value)}
        data-testid={testId}
      >
        <option value="">{placeholder}</option>
        {names.map((name) => (
          <option key={name} value={name}>
            {name}
          </option>
        ))}
      </select>
      {hint && <p className="mt-1 text-xs text-ink-500">{hint}</p>}
    </div>
  );
}
