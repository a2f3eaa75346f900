import { type SyntheticEvent, useState } from 'react';
import type { Json } from '../../lib/contracts/json';
import type { MergedUnit } from '../../lib/contracts/vocabulary';
import FormMessage from '../account/FormMessage';
import { postJson } from '../account/post-json';

interface MergeUnitFormProps {
  unit: { id: string; name: string; recordCount: number };
  candidates: { id: string; name: string }[];
  onMerged(message: string): Promise<void>;
  onCancel(): void;
}

/** Merges a unit into another after naming what will happen to its records. */
export default function MergeUnitForm({ unit, candidates, onMerged, onCancel }: MergeUnitFormProps) {
  const [intoUnitId, setInto] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const into = candidates.find((c) => c.id === intoUnitId);

  async function merge(event: SyntheticEvent) {
    event.preventDefault();
    if (!into) {
      setProblem('Choose the unit that takes over the records.');
      return;
    }
    setBusy(true);
    setProblem(null);
    const result = await postJson<Json<MergedUnit>>(`/api/vocabulary/units/${unit.id}/merge`, { intoUnitId });
    setBusy(false);
    if (!result.ok) {
      setProblem(result.failure.message);
      return;
    }
    const { movedRecords, bankVersion } = result.data;
    await onMerged(
      `Merged “${unit.name}” into “${into.name}”: ${movedRecords} test records moved${bankVersion ? `, recorded as bank version ${bankVersion}` : ''}. Uploads naming “${unit.name}” now go to “${into.name}”.`,
    );
  }

  return (
    <form
      onSubmit={merge}
      className="mt-2 space-y-2 rounded border border-caution-300 bg-caution-50 p-3"
      data-testid="merge-form"
    >
      <label htmlFor={`merge-into-${unit.id}`} className="field-label">
        Merge “{unit.name}” into
      </label>
      <select
        id={`merge-into-${unit.id}`}
        className="field-input"
        value={intoUnitId}
        onChange={(e) => setInto(e.target.value)}
        data-testid="merge-into"
      >
        <option value="">Choose a geological unit…</option>
        {candidates.map((c) => (
          <option key={c.id} value={c.id}>
            {c.name}
          </option>
        ))}
      </select>
      <p className="text-xs text-caution-900">
        {unit.recordCount} test records move to {into ? `“${into.name}”` : 'the unit you choose'}; published ones change the bank,
        so a new bank version records the move. “{unit.name}” is then retired and its names become synonyms of the other. This
        cannot be undone.
      </p>
      {problem && <FormMessage kind="error">{problem}</FormMessage>}
      <div className="flex gap-2">
        <button
          type="submit"
          className="btn border-caution-700 bg-caution-700 text-white"
          disabled={busy}
          data-testid="merge-confirm"
        >
          {busy ? 'Merging…' : 'Merge and move the records'}
        </button>
        <button type="button" className="btn-quiet" onClick={onCancel}>
          Cancel
        </button>
      </div>
    </form>
  );
}
