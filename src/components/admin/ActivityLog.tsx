import { useState } from 'react';
import type { AuditList } from '../../lib/contracts/audit';
import type { Json } from '../../lib/contracts/json';
import FormMessage from '../account/FormMessage';
import { formatDateTime } from '../contribute/format';
import ActivityFilters, { type LogFilters, NO_FILTERS } from './ActivityFilters';
import Pager from './Pager';
import { useLoaded } from './use-loaded';

const PAGE = 50;

function queryOf(filters: LogFilters, offset: number): string {
  const params = new URLSearchParams({ limit: String(PAGE), offset: String(offset) });
  for (const [key, value] of Object.entries(filters)) if (value) params.set(key, value);
  return params.toString();
}

/** The activity log in plain words, newest first, with filters, the raw entry behind each line, and pages. */
export default function ActivityLog() {
  const [filters, setFilters] = useState<LogFilters>(NO_FILTERS);
  const [offset, setOffset] = useState(0);
  const { state } = useLoaded<Json<AuditList>>(`/api/audit?${queryOf(filters, offset)}`);
  const [people, setPeople] = useState<Json<AuditList>['people']>([]);
  if (state.kind === 'loaded' && people.length === 0 && state.data.people.length > 0) setPeople(state.data.people);

  return (
    <section className="panel" data-testid="activity-log">
      <ActivityFilters
        people={people}
        initial={filters}
        onApply={(next) => {
          setOffset(0);
          setFilters(next);
        }}
      />
      {state.kind === 'loading' && <p className="px-4 py-3 text-sm text-ink-500">Loading the log…</p>}
      {state.kind === 'failed' && (
        <div className="px-4 py-3">
          <FormMessage kind="error">{state.message}</FormMessage>
        </div>
      )}
      {state.kind === 'loaded' && (
        <>
          <ol className="divide-y divide-ink-100">
            {state.data.entries.map((entry) => (
              <li key={entry.id} className="grid gap-x-4 px-4 py-2 sm:grid-cols-[11rem_1fr]" data-testid="log-entry">
                <time dateTime={entry.occurredAt} className="whitespace-nowrap text-sm text-ink-500">
                  {formatDateTime(entry.occurredAt)}
                </time>
                <div className="min-w-0">
                  <p className="text-sm text-ink-900" data-testid="log-text">
                    {entry.outcome !== 'ok' && <span className="tag mr-1.5 bg-fault-50 text-fault-700">{entry.outcome}</span>}
                    {entry.text}
                  </p>
                  <details className="mt-0.5">
                    <summary className="cursor-pointer text-2xs text-ink-500">Raw entry</summary>
                    <pre className="mt-1 overflow-x-auto whitespace-pre-wrap break-all rounded bg-ink-50 p-2 font-mono text-2xs text-ink-700">
                      {JSON.stringify(
                        {
                          action: entry.action,
                          outcome: entry.outcome,
                          object: entry.objectType ? `${entry.objectType} ${entry.objectId ?? ''}` : null,
                          firm: entry.firmName,
                          summary: entry.summary,
                        },
                        null,
                        2,
                      )}
                    </pre>
                  </details>
                </div>
              </li>
            ))}
            {state.data.entries.length === 0 && (
              <li className="px-4 py-4 text-center text-ink-500">Nothing matches these filters.</li>
            )}
          </ol>
          <Pager offset={offset} limit={PAGE} total={state.data.total} onPage={setOffset} />
        </>
      )}
    </section>
  );
}
