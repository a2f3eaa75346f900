import { useState } from 'react';
import type { Json } from '../../lib/contracts/json';
import type { CuratedVocabulary } from '../../lib/contracts/vocabulary';
import FormMessage from '../account/FormMessage';
import AddEntryForm from './AddEntryForm';
import { useLoaded } from './use-loaded';
import VocabularyRow from './VocabularyRow';

/** Regions and geological units for curators: add, rename with synonyms, describe, merge, retire. */
export default function VocabularyAdmin() {
  const { state, reload } = useLoaded<Json<CuratedVocabulary>>('/api/admin/vocabulary');
  const [message, setMessage] = useState<{ kind: 'error' | 'success'; text: string } | null>(null);

  const changed = async (text: string) => {
    setMessage({ kind: 'success', text });
    await reload();
  };
  const problem = (text: string) => setMessage({ kind: 'error', text });

  if (state.kind === 'loading') return <p className="text-sm text-ink-500">Loading the vocabulary…</p>;
  if (state.kind === 'failed') return <FormMessage kind="error">{state.message}</FormMessage>;
  const { regions, units } = state.data;
  const nameOf = new Map(units.map((u) => [u.id, u.name]));
  const inUse = units.filter((u) => u.retiredAt === null).map((u) => ({ id: u.id, name: u.name }));

  return (
    <div className="space-y-5" data-testid="vocabulary-admin">
      <div aria-live="polite">{message && <FormMessage kind={message.kind}>{message.text}</FormMessage>}</div>
      <section className="panel" aria-labelledby="units-heading">
        <div className="border-b border-ink-200 px-4 py-2">
          <h2 id="units-heading">Geological units</h2>
          <p className="text-xs text-ink-500">Deposits the bank groups test records by. Retired units keep their records.</p>
        </div>
        <AddEntryForm kind="geological unit" onAdded={changed} />
        <ul className="divide-y divide-ink-100">
          {units.map((unit) => (
            <VocabularyRow
              key={unit.id}
              entry={unit}
              kind="geological unit"
              mergeTargets={inUse.filter((u) => u.id !== unit.id)}
              mergedIntoName={unit.mergedIntoId ? (nameOf.get(unit.mergedIntoId) ?? 'another unit') : null}
              onChanged={changed}
              onProblem={problem}
            />
          ))}
        </ul>
      </section>
      <section className="panel" aria-labelledby="regions-heading">
        <div className="border-b border-ink-200 px-4 py-2">
          <h2 id="regions-heading">Regions</h2>
          <p className="text-xs text-ink-500">Where tests were taken, as the shared records name it.</p>
        </div>
        <AddEntryForm kind="region" onAdded={changed} />
        <ul className="divide-y divide-ink-100">
          {regions.map((region) => (
            <VocabularyRow key={region.id} entry={region} kind="region" onChanged={changed} onProblem={problem} />
          ))}
        </ul>
      </section>
    </div>
  );
}
