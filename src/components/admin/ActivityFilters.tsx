import { type SyntheticEvent, useState } from 'react';
import { AUDIT_KINDS } from '../../lib/contracts/audit';

export interface LogFilters {
  person: string;
  kind: string;
  from: string;
  to: string;
}

export const NO_FILTERS: LogFilters = { person: '', kind: '', from: '', to: '' };

interface ActivityFiltersProps {
  people: { userId: string; name: string }[];
  initial: LogFilters;
  onApply(filters: LogFilters): void;
}

/** Person, kind of activity and a range of days. */
export default function ActivityFilters({ people, initial, onApply }: ActivityFiltersProps) {
  const [draft, setDraft] = useState(initial);
  const set = (key: keyof LogFilters) => (event: { target: { value: string } }) =>
    setDraft({ ...draft, [key]: event.target.value });
  function apply(event: SyntheticEvent) {
    event.preventDefault();
    onApply(draft);
  }
  return (
    <form onSubmit={apply} className="flex flex-wrap items-end gap-3 border-b border-ink-100 px-4 py-3" data-testid="log-filters">
      <div>
        <label htmlFor="log-person" className="field-label">
          Person
        </label>
        <select id="log-person" className="field-input" value={draft.person} onChange={set('person')}>
          <option value="">Everyone</option>
          {people.map((p) => (
            <option key={p.userId} value={p.userId}>
              {p.name}
            </option>
          ))}
        </select>
      </div>
      <div>
        <label htmlFor="log-kind" className="field-label">
          Kind
        </label>
        <select id="log-kind" className="field-input" value={draft.kind} onChange={set('kind')}>
          <option value="">Everything</option>
          {Object.entries(AUDIT_KINDS).map(([key, kind]) => (
            <option key={key} value={key}>
              {kind.label}
            </option>
          ))}
        </select>
      </div>
      <div>
        <label htmlFor="log-from" className="field-label">
          From (day)
        </label>
        <input id="log-from" type="date" className="field-input" value={draft.from} onChange={set('from')} />
      </div>
      <div>
        <label htmlFor="log-to" className="field-label">
          To (day)
        </label>
        <input id="log-to" type="date" className="field-input" value={draft.to} onChange={set('to')} />
      </div>
      <button type="submit" className="btn-primary">
        Show
      </button>
      <button
        type="button"
        className="btn-quiet"
        onClick={() => {
          setDraft(NO_FILTERS);
          onApply(NO_FILTERS);
        }}
      >
        Clear
      </button>
    </form>
  );
}
