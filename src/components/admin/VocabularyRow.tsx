import { useState } from 'react';
import type { Json } from '../../lib/contracts/json';
import type { CuratedRegion, CuratedUnit } from '../../lib/contracts/vocabulary';
import { postJson } from '../account/post-json';
import ConfirmButton from '../firm/ConfirmButton';
import EntryEditor from './EntryEditor';
import MergeUnitForm from './MergeUnitForm';

interface VocabularyRowProps {
  entry: Json<CuratedRegion> | Json<CuratedUnit>;
  kind: 'region' | 'geological unit';
  /** units to merge into (units only) */
  mergeTargets?: { id: string; name: string }[];
  mergedIntoName?: string | null;
  onChanged(message: string): Promise<void>;
  onProblem(message: string): void;
}

/** One region or unit: its names, state and records, and what a curator can do with it. */
export default function VocabularyRow({ entry, kind, mergeTargets, mergedIntoName, onChanged, onProblem }: VocabularyRowProps) {
  const [open, setOpen] = useState<'edit' | 'merge' | null>(null);
  const base = kind === 'region' ? `/api/vocabulary/regions/${entry.id}` : `/api/vocabulary/units/${entry.id}`;
  const retired = entry.retiredAt !== null;

  async function setRetired(value: boolean) {
    const result = await postJson(`${base}/retirement`, { retired: value });
    if (!result.ok) onProblem(result.failure.message);
    else
      await onChanged(
        value
          ? `Retired “${entry.name}”: it takes no new uploads; its ${entry.recordCount} test records stay and say so.`
          : `“${entry.name}” takes uploads again.`,
      );
  }

  return (
    <li className="px-4 py-3" data-testid="vocabulary-entry" data-name={entry.name}>
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div className="min-w-0">
          <p className="font-medium text-ink-900">
            {entry.name}
            {mergedIntoName ? (
              <span className="tag ml-2 bg-ink-100 text-ink-700">merged into {mergedIntoName}</span>
            ) : (
              retired && <span className="tag ml-2 bg-caution-100 text-caution-900">retired: no new uploads</span>
            )}
          </p>
          {entry.description && <p className="text-sm text-ink-600">{entry.description}</p>}
          {entry.synonyms.length > 0 && (
            <p className="text-xs text-ink-500" data-testid="synonyms">
              Uploads may also say: {entry.synonyms.join(', ')}
            </p>
          )}
          <p className="text-xs text-ink-500">
            {entry.recordCount.toLocaleString('en-GB')} test {entry.recordCount === 1 ? 'record' : 'records'}
          </p>
        </div>
        {!mergedIntoName && (
          <div className="flex flex-wrap gap-1.5">
            <button
              type="button"
              className="btn-quiet px-2 py-0.5 text-xs"
              onClick={() => setOpen(open === 'edit' ? null : 'edit')}
            >
              Rename or describe
            </button>
            {mergeTargets && !retired && (
              <button
                type="button"
                className="btn-quiet px-2 py-0.5 text-xs"
                onClick={() => setOpen(open === 'merge' ? null : 'merge')}
                data-testid="merge-open"
              >
                Merge into…
              </button>
            )}
            {retired ? (
              <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={() => void setRetired(false)}>
                Put back in use
              </button>
            ) : (
              <ConfirmButton
                label="Retire"
                confirmLabel={`Retire ${entry.name}`}
                onConfirm={() => setRetired(true)}
                testId="retire"
              />
            )}
          </div>
        )}
      </div>
      {open === 'edit' && (
        <EntryEditor
          url={base}
          kind={kind}
          name={entry.name}
          description={entry.description}
          onCancel={() => setOpen(null)}
          onSaved={async (message) => {
            setOpen(null);
            await onChanged(message);
          }}
        />
      )}
      {open === 'merge' && mergeTargets && (
        <MergeUnitForm
          unit={entry}
          candidates={mergeTargets}
          onCancel={() => setOpen(null)}
          onMerged={async (message) => {
            setOpen(null);
            await onChanged(message);
          }}
        />
      )}
    </li>
  );
}
