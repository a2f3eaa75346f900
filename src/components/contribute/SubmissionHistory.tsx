import type { Json } from '../../lib/contracts/json';
import type { HistoryEvent } from '../../lib/contracts/submissions';
import { formatDateTime } from './format';
import { statusLabel } from './status-labels';

/** What happened, in plain words: "Submitted", "Sent back after corrections", "Returned". */
function eventText(from: string | null, to: string): string {
  if (to === 'submitted') return from === 'returned' ? 'Sent back after corrections' : 'Submitted';
  return statusLabel(to);
}

/** Who moved the submission from which state to which, when, and what they wrote. */
export default function SubmissionHistory({ history }: { history: Json<HistoryEvent>[] }) {
  return (
    <section className="panel" aria-labelledby="history-heading" data-testid="submission-history">
      <h2 id="history-heading" className="border-b border-ink-200 px-4 py-2">
        History
      </h2>
      {history.length === 0 ? (
        <p className="px-4 py-3 text-sm text-ink-500">Nothing has happened to this submission yet.</p>
      ) : (
        <ol className="divide-y divide-ink-100">
          {history.map((event) => (
            <li key={`${event.occurredAt}-${event.toStatus}`} className="px-4 py-2 text-sm" data-testid="history-event">
              <span className="whitespace-nowrap text-ink-500">{formatDateTime(event.occurredAt)}</span>
              <span className="mx-2 font-medium">{event.actor ?? 'Claybank'}</span>
              <span className="text-ink-700">{eventText(event.fromStatus, event.toStatus)}</span>
              {event.comment && <p className="mt-0.5 text-ink-700">“{event.comment}”</p>}
            </li>
          ))}
        </ol>
      )}
    </section>
  );
}
