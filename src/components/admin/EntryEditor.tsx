import { type SyntheticEvent, useState } from 'react';
import FormMessage from '../account/FormMessage';
import { requestJson } from '../account/post-json';

interface EntryEditorProps {
  /** `/api/vocabulary/units/<id>` or `/api/vocabulary/regions/<id>` */
  url: string;
  kind: 'region' | 'geological unit';
  name: string;
  description: string | null;
  onSaved(message: string): Promise<void>;
  onCancel(): void;
}

/** Renames or describes a region or unit; a new name keeps the old one as a synonym for uploads. */
export default function EntryEditor({ url, kind, name, description, onSaved, onCancel }: EntryEditorProps) {
  const [newName, setNewName] = useState(name);
  const [text, setText] = useState(description ?? '');
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const idBase = url.split('/').pop();

  async function save(event: SyntheticEvent) {
    event.preventDefault();
    setBusy(true);
    setProblem(null);
    const body = { ...(newName.trim() !== name ? { name: newName } : {}), description: text.trim() === '' ? null : text };
    const result = await requestJson('PATCH', url, body);
    setBusy(false);
    if (!result.ok) {
      setProblem([result.failure.message, ...result.failure.issues.map((i) => i.message)].join(' '));
      return;
    }
    await onSaved(
      newName.trim() !== name
        ? `Renamed “${name}” to “${newName.trim()}”. Uploads that still say “${name}” are matched to it.`
        : `Saved the description of “${name}”.`,
    );
  }

  return (
    <form onSubmit={save} className="mt-2 space-y-2 rounded border border-ink-200 bg-ink-50 p-3" data-testid="entry-editor">
      <div>
        <label htmlFor={`name-${idBase}`} className="field-label">
          Name of the {kind}
        </label>
        <input id={`name-${idBase}`} className="field-input" value={newName} onChange={(e) => setNewName(e.target.value)} />
        <p className="mt-1 text-xs text-ink-500">
          After a rename the old name stays as a synonym, so earlier spreadsheets still match.
        </p>
      </div>
      <div>
        <label htmlFor={`description-${idBase}`} className="field-label">
          Description
        </label>
        <textarea
          id={`description-${idBase}`}
          className="field-input min-h-16"
          value={text}
          onChange={(e) => setText(e.target.value)}
        />
      </div>
      {problem && <FormMessage kind="error">{problem}</FormMessage>}
      <div className="flex gap-2">
        <button type="submit" className="btn-primary" disabled={busy} data-testid="entry-save">
          {busy ? 'Saving…' : 'Save'}
        </button>
        <button type="button" className="btn-quiet" onClick={onCancel}>
          Cancel
        </button>
      </div>
    </form>
  );
}
