import { useState } from 'react';
import type { Json } from '../../lib/contracts/json';
import type { FirmDirectory } from '../../lib/contracts/people';
import { FIRM_ROLE_LABELS } from '../../lib/permissions/roles';
import FormMessage from '../account/FormMessage';
import { formatDate } from '../firm/format-date';
import OwnershipControl from './OwnershipControl';
import Pager from './Pager';
import SearchBox from './SearchBox';
import { useLoaded } from './use-loaded';

const PAGE = 20;

/** Every firm with its members; the platform admin passes ownership here. */
export default function FirmsAdmin() {
  const [q, setQ] = useState('');
  const [offset, setOffset] = useState(0);
  const [message, setMessage] = useState<string | null>(null);
  const { state, reload } = useLoaded<Json<FirmDirectory>>(
    `/api/admin/firms?limit=${PAGE}&offset=${offset}${q ? `&q=${encodeURIComponent(q)}` : ''}`,
  );

  return (
    <section className="panel" aria-labelledby="firms-heading" data-testid="firms-admin">
      <h2 id="firms-heading" className="sr-only">
        Firms
      </h2>
      <SearchBox
        id="firm-search"
        label="Find a firm"
        placeholder="part of its name"
        onSearch={(text) => {
          setOffset(0);
          setQ(text);
        }}
      />
      <div className="px-4" aria-live="polite">
        {message && <FormMessage kind="success">{message}</FormMessage>}
      </div>
      {state.kind === 'loading' && <p className="px-4 py-3 text-sm text-ink-500">Loading firms…</p>}
      {state.kind === 'failed' && (
        <div className="px-4 py-3">
          <FormMessage kind="error">{state.message}</FormMessage>
        </div>
      )}
      {state.kind === 'loaded' && (
        <>
          <ul className="divide-y divide-ink-100">
            {state.data.firms.map((firm) => (
              <li
                key={firm.id}
                className="flex flex-wrap items-start justify-between gap-3 px-4 py-3"
                data-testid="firm-entry"
                data-name={firm.name}
              >
                <div className="min-w-0">
                  <p className="font-medium text-ink-900">{firm.name}</p>
                  <p className="text-xs text-ink-500">
                    Started {formatDate(firm.createdAt)} · {firm.members.length} members
                  </p>
                  <ul className="mt-1 text-sm text-ink-700">
                    {firm.members.map((m) => (
                      <li key={m.memberId} data-testid="firm-member">
                        {m.name}{' '}
                        <span className="text-ink-500">
                          · {FIRM_ROLE_LABELS[m.role]} · {m.email}
                        </span>
                      </li>
                    ))}
                  </ul>
                </div>
                <OwnershipControl
                  firm={firm}
                  onPassed={async (text) => {
                    setMessage(text);
                    await reload();
                  }}
                />
              </li>
            ))}
            {state.data.firms.length === 0 && <li className="px-4 py-4 text-center text-ink-500">No firm matches “{q}”.</li>}
          </ul>
          <Pager offset={offset} limit={PAGE} total={state.data.total} onPage={setOffset} />
        </>
      )}
    </section>
  );
}
