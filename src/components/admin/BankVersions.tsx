import { useState } from 'react';
import type { Json } from '../../lib/contracts/json';
import type { BankVersionList } from '../../lib/contracts/versions';
import FormMessage from '../account/FormMessage';
import { formatDateTime } from '../contribute/format';
import { PANEL_TABLE_CLASS } from '../firm/panel-table';
import Pager from './Pager';
import { useLoaded } from './use-loaded';

const PAGE = 50;

/** The bank's published versions, newest first. */
export default function BankVersions() {
  const [offset, setOffset] = useState(0);
  const { state } = useLoaded<Json<BankVersionList>>(`/api/admin/bank-versions?limit=${PAGE}&offset=${offset}`);
  if (state.kind === 'loading') return <p className="text-sm text-ink-500">Loading versions…</p>;
  if (state.kind === 'failed') return <FormMessage kind="error">{state.message}</FormMessage>;
  return (
    <section className="panel" data-testid="bank-versions">
      <div className="overflow-x-auto py-2">
        <table className={PANEL_TABLE_CLASS}>
          <thead>
            <tr>
              <th scope="col">Version</th>
              <th scope="col">Published</th>
              <th scope="col">By</th>
              <th scope="col" className="text-right">
                Records published or changed
              </th>
              <th scope="col" className="text-right">
                First published here, still in the bank
              </th>
              <th scope="col">Note</th>
            </tr>
          </thead>
          <tbody>
            {state.data.versions.map((v) => (
              <tr key={v.id} data-testid="bank-version-row">
                <td className="font-medium">{v.id}</td>
                <td className="whitespace-nowrap">{formatDateTime(v.publishedAt)}</td>
                <td>{v.publishedBy ?? '—'}</td>
                <td className="text-right">{v.recordCount.toLocaleString('en-GB')}</td>
                <td className="text-right">{v.recordsNowInVersion.toLocaleString('en-GB')}</td>
                <td className="text-sm text-ink-700">{v.note ?? '—'}</td>
              </tr>
            ))}
            {state.data.versions.length === 0 && (
              <tr>
                <td colSpan={6} className="py-4 text-center text-ink-500">
                  Nothing published yet.
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
      <Pager offset={offset} limit={PAGE} total={state.data.total} onPage={setOffset} />
    </section>
  );
}
