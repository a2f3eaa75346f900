import { type SyntheticEvent, useState } from 'react';
import { type OwnRecord, recordCorrectionSchema } from '../../lib/contracts/submissions';
import type { Vocabulary } from '../../lib/contracts/vocabulary';
import { FIELD_BY_KEY } from '../../lib/import';
import FormMessage from '../account/FormMessage';
import { fieldErrorsFromServer, fieldErrorsFromZod } from '../account/field-errors';
import { requestJson } from '../account/post-json';
import { fieldHeading, PRIVATE_FIELDS, SHARED_FIELDS } from './record-fields';
import { changedValues, valueText } from './record-values';

interface RecordEditorProps {
  submissionId: string;
  record: OwnRecord;
  vocabulary: Vocabulary | null;
  onSaved(): Promise<void>;
  onClose(): void;
}

const GROUPS = [
  { title: 'Shared values', fields: SHARED_FIELDS },
  { title: 'Private to your firm', fields: PRIVATE_FIELDS },
];

/** Corrects one returned record in place: every value in the bank's units, checked by the server as an upload row is. */
export default function RecordEditor({ submissionId, record, vocabulary, onSaved, onClose }: RecordEditorProps) {
  const [texts, setTexts] = useState<Record<string, string>>(() =>
    Object.fromEntries([...SHARED_FIELDS, ...PRIVATE_FIELDS].map((f) => [f.key, valueText(record, f.key)])),
  );
  const [errors, setErrors] = useState<Record<string, string | undefined>>({});
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function save(event: SyntheticEvent) {
    event.preventDefault();
    setProblem(null);
    const parsed = changedValues(record, texts);
    if (!parsed.ok) {
      setErrors(parsed.errors);
      return;
    }
    if (Object.keys(parsed.values).length === 0) {
      setProblem('Nothing has changed yet. Correct the values the steward commented on.');
      return;
    }
    const body = recordCorrectionSchema.safeParse({ values: parsed.values });
    if (!body.success) {
      setErrors(fieldErrorsFromZod(body.error.issues.map((issue) => ({ ...issue, path: issue.path.slice(1) }))));
      return;
    }
    setBusy(true);
    const result = await requestJson('PATCH', `/api/submissions/${submissionId}/records/${record.id}`, body.data);
    setBusy(false);
    if (!result.ok) {
      const issues = result.failure.issues.map((i) => ({ ...i, path: i.path.replace(/^values\./, '') }));
      const elsewhere = issues.filter((i) => !(i.path in texts)).map((i) => i.message);
      setErrors(fieldErrorsFromServer(issues));
      setProblem([result.failure.message, ...elsewhere].join(' '));
      return;
    }
    setErrors({});
    await onSaved();
  }

  const vocabularyNames: Record<string, string[] | undefined> = {
    region: vocabulary?.regions.map((r) => r.name),
    geologicalUnit: vocabulary?.units.map((u) => u.name),
  };

  return (
    <form onSubmit={save} className="space-y-3 p-3" data-testid="record-editor" noValidate>
      <p className="text-xs text-ink-600">
        Values in the bank's units (depth m, stress kPa, cv m²/yr, %). Derived values (PI, OCR, location cell) are worked out
        again when you leave them blank.
      </p>
      {problem && <FormMessage kind="error">{problem}</FormMessage>}
      {GROUPS.map((group) => (
        <fieldset key={group.title}>
          <legend className="field-label mb-1">{group.title}</legend>
          <div className="grid grid-cols-2 gap-x-3 gap-y-2 sm:grid-cols-4 xl:grid-cols-6">
            {group.fields.map((f) => {
              const id = `edit-${record.id}-${f.key}`;
              const error = errors[f.key];
              const names = vocabularyNames[f.key];
              const changed = texts[f.key] !== valueText(record, f.key);
              const inputClass = `mt-0.5 block w-full rounded border px-1.5 py-0.5 text-sm ${error ? 'border-fault-500' : changed ? 'border-tide-500 bg-tide-50' : 'border-ink-300'}`;
              return (
                <div key={f.key}>
                  <label
                    htmlFor={id}
                    className="block truncate text-2xs font-medium text-ink-600"
                    title={FIELD_BY_KEY.get(f.key)?.guide}
                  >
                    {fieldHeading(f.key)}
                  </label>
                  {names ? (
                    <select
                      id={id}
                      className={inputClass}
                      value={texts[f.key] ?? ''}
                      onChange={(event) => setTexts({ ...texts, [f.key]: event.target.value })}
                    >
                      {names.map((name) => (
                        <option key={name}>{name}</option>
                      ))}
                    </select>
                  ) : (
                    <input
                      id={id}
                      className={inputClass}
                      value={texts[f.key] ?? ''}
                      inputMode={f.type === 'text' ? undefined : 'decimal'}
                      aria-invalid={error ? true : undefined}
                      onChange={(event) => setTexts({ ...texts, [f.key]: event.target.value })}
                      data-testid={`edit-${f.key}`}
                    />
                  )}
                  {error && <p className="mt-0.5 text-2xs text-fault-700">{error}</p>}
                </div>
              );
            })}
          </div>
        </fieldset>
      ))}
      <div className="flex gap-2">
        <button type="submit" className="btn-primary" disabled={busy} data-testid="save-record">
          {busy ? 'Saving…' : 'Save the correction'}
        </button>
        <button type="button" className="btn-quiet" onClick={onClose} disabled={busy}>
          Close
        </button>
      </div>
    </form>
  );
}
