import { useState } from 'react';
import type { Json } from '../../lib/contracts/json';
import type { PeopleList } from '../../lib/contracts/people';
import { FIRM_ROLE_LABELS, PLATFORM_ROLE_LABELS } from '../../lib/permissions/roles';
import FormMessage from '../account/FormMessage';
import { formatDate } from '../firm/format-date';
import { PANEL_TABLE_CLASS } from '../firm/panel-table';
import Pager from './Pager';
import SearchBox from './SearchBox';
import SuspendControl from './SuspendControl';
import { useLoaded } from './use-loaded';

const PAGE = 25;

/** Every account: search by name or address, firms and roles, suspension. */
export default function PeopleAdmin({ currentUserId }: { currentUserId: string }) {
  const [q, setQ] = useState('');
  const [offset, setOffset] = useState(0);
  const [message, setMessage] = useState<string | null>(null);
  const { state, reload } = useLoaded<Json<PeopleList>>(
    `/api/admin/people?limit=${PAGE}&offset=${offset}${q ? `&q=${encodeURIComponent(q)}` : ''}`,
  );

  return (
    <section className="panel" aria-labelledby="people-heading" data-testid="people-admin">
      <h2 id="people-heading" className="sr-only">
        People
      </h2>
      <SearchBox
        id="people-search"
        label="Find a person"
        placeholder="name or e-mail address"
        onSearch={(text) => {
          setOffset(0);
          setQ(text);
        }}
      />
      <div className="px-4" aria-live="polite">
        {message && <FormMessage kind="success">{message}</FormMessage>}
      </div>
      {state.kind === 'loading' && <p className="px-4 py-3 text-sm text-ink-500">Loading people…</p>}
      {state.kind === 'failed' && (
        <div className="px-4 py-3">
          <FormMessage kind="error">{state.message}</FormMessage>
        </div>
      )}
      {state.kind === 'loaded' && (
        <>
          <div className="overflow-x-auto py-2">
            <table className={PANEL_TABLE_CLASS}>
              <thead>
                <tr>
                  <th scope="col">Person</th>
                  <th scope="col">Platform role</th>
                  <th scope="col">Firms</th>
                  <th scope="col">Joined</th>
                  <th scope="col">State</th>
                  <th scope="col">Actions</th>
                </tr>
              </thead>
              <tbody>
                {state.data.people.map((person) => (
                  <tr key={person.id} data-testid="person-row" data-email={person.email}>
                    <td>
                      <span className="font-medium">{person.name}</span>
                      <br />
                      <span className="text-xs text-ink-500">{person.email}</span>
                    </td>
                    <td>{PLATFORM_ROLE_LABELS[person.platformRole]}</td>
                    <td className="text-xs">
                      {person.firms.length === 0
                        ? '—'
                        : person.firms.map((f) => `${f.firmName} (${FIRM_ROLE_LABELS[f.role]})`).join('; ')}
                    </td>
                    <td className="whitespace-nowrap">{formatDate(person.createdAt)}</td>
                    <td>
                      {person.suspended ? (
                        <span className="tag bg-fault-50 text-fault-700" title={person.suspendedReason ?? undefined}>
                          Suspended
                        </span>
                      ) : person.emailVerified ? (
                        'Active'
                      ) : (
                        'Address not confirmed'
                      )}
                    </td>
                    <td>
                      <SuspendControl
                        person={person}
                        isSelf={person.id === currentUserId}
                        onChanged={async (text) => {
                          setMessage(text);
                          await reload();
                        }}
                      />
                    </td>
                  </tr>
                ))}
                {state.data.people.length === 0 && (
                  <tr>
                    <td colSpan={6} className="py-4 text-center text-ink-500">
                      Nobody matches “{q}”.
                    </td>
                  </tr>
                )}
              </tbody>
            </table>
          </div>
          <Pager offset={offset} limit={PAGE} total={state.data.total} onPage={setOffset} />
        </>
      )}
    </section>
  );
}
