import { type SyntheticEvent, useState } from 'react';
import { GENESIS_VALUES } from '../../lib/schemas/vocabulary';
import FormMessage from '../account/FormMessage';
import { postJson } from '../account/post-json';

interface AddEntryFormProps {
  kind: 'region' | 'geological unit';
  onAdded(message: string): Promise<void>;
}

/** Adds a region, or a geological unit with its genesis. */
export default function AddEntryForm({ kind, onAdded }: AddEntryFormProps) {
  const [name, setName] = useState('');
  const [genesis, setGenesis] = useState<string>('estuarine');
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const isUnit = kind === 'geological unit';
  const id = isUnit ? 'new-unit' : 'new-region';

  async function add(event: SyntheticEvent) {
    event.preventDefault();
    setBusy(true);
    setProblem(null);
    const result = await postJson(isUnit ? '/api/vocabulary/units' : '/api/vocabulary/regions', {
      name,
      ...(isUnit ? { genesis } : {}),
    });
    setBusy(false);
    if (!result.ok) {
      setProblem([result.failure.message, ...result.failure.issues.map((i) => i.message)].join(' '));
      return;
    }
    setName('');
    await onAdded(`Added the ${kind} “${name.trim()}”.`);
  }

  return (
    <form onSubmit={add} className="flex flex-wrap items-end gap-2 border-b border-ink-100 px-4 py-3">
      <div className="min-w-56 flex-1">
        <label htmlFor={`${id}-name`} className="field-label">
          New {kind}
        </label>
        <input id={`${id}-name`} className="field-input" value={name} onChange={(e) => setName(e.target.value)} />
      </div>
      {isUnit && (
        <div>
          <label htmlFor={`${id}-genesis`} className="field-label">
            Genesis
          </label>
          <select id={`${id}-genesis`} className="field-input" value={genesis} onChange={(e) => setGenesis(e.target.value)}>
            {GENESIS_VALUES.map((g) => (
              <option key={g} value={g}>
                {g}
              </option>
            ))}
          </select>
        </div>
      )}
      <button type="submit" className="btn-primary" disabled={busy}>
        {busy ? 'Adding…' : 'Add'}
      </button>
      {problem && (
        <div className="w-full">
          <FormMessage kind="error">{problem}</FormMessage>
        </div>
      )}
    </form>
  );
}
