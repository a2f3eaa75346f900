import { type SyntheticEvent, useEffect, useState } from 'react';
import type { Json } from '../../lib/contracts/json';
import type { BankSettings } from '../../lib/contracts/settings';
import { disclosureRuleSchema } from '../../lib/schemas/app-settings';
import FormMessage from '../account/FormMessage';
import { requestJson } from '../account/post-json';
import { formatDateTime } from '../contribute/format';
import { useLoaded } from './use-loaded';

const FIELDS = [
  { key: 'minTests', label: 'Fewest tests', hint: 'Pooled figures need at least this many tests.' },
  { key: 'minFirms', label: 'Fewest firms', hint: 'Those tests must come from at least this many firms.' },
  {
    key: 'maxFirmSharePct',
    label: 'Largest share of one firm (%)',
    hint: 'No firm may contribute more than this share of them.',
  },
] as const;

type Draft = Record<(typeof FIELDS)[number]['key'], string>;

/** The disclosure rule: when figures pooled across firms may be shown. */
export default function DisclosureSettings() {
  const { state, reload } = useLoaded<Json<BankSettings>>('/api/admin/settings');
  const [draft, setDraft] = useState<Draft | null>(null);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<{ kind: 'error' | 'success'; text: string } | null>(null);

  useEffect(() => {
    if (state.kind !== 'loaded') return;
    const v = state.data.disclosureRule.value;
    setDraft({ minTests: String(v.minTests), minFirms: String(v.minFirms), maxFirmSharePct: String(v.maxFirmSharePct) });
  }, [state]);

  if (state.kind === 'loading' || !draft) return <p className="text-sm text-ink-500">Loading the settings…</p>;
  if (state.kind === 'failed') return <FormMessage kind="error">{state.message}</FormMessage>;
  const rule = state.data.disclosureRule;

  async function save(event: SyntheticEvent) {
    event.preventDefault();
    if (!draft) return;
    const values = Object.fromEntries(Object.entries(draft).map(([k, v]) => [k, v.trim() === '' ? Number.NaN : Number(v)]));
    const parsed = disclosureRuleSchema.safeParse(values);
    if (!parsed.success) {
      setErrors(Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0]), i.message])));
      return;
    }
    setErrors({});
    const result = await requestJson('PUT', '/api/admin/settings/disclosure-rule', parsed.data);
    if (!result.ok) {
      setMessage({ kind: 'error', text: result.failure.message });
      return;
    }
    setMessage({
      kind: 'success',
      text: `Saved: pooled figures now need ${parsed.data.minTests} tests from ${parsed.data.minFirms} firms, no firm above ${parsed.data.maxFirmSharePct} %.`,
    });
    await reload();
  }

  return (
    <section className="panel max-w-2xl p-5" aria-labelledby="disclosure-heading" data-testid="disclosure-settings">
      <h2 id="disclosure-heading">Disclosure thresholds</h2>
      <p className="mt-1 text-sm text-ink-600">
        A figure pooled across firms (a mean, a percentile, a regression) is shown only when enough tests from enough firms stand
        behind it, so no firm's results can be read back from the pool. A firm always sees its own tests.
      </p>
      <p className="mt-1 text-xs text-ink-500" data-testid="disclosure-state">
        {rule.isDefault
          ? `The built-in rule applies (${rule.defaultValue.minTests} tests, ${rule.defaultValue.minFirms} firms, ${rule.defaultValue.maxFirmSharePct} %).`
          : `Last changed ${formatDateTime(rule.updatedAt)}. Built-in rule: ${rule.defaultValue.minTests} tests, ${rule.defaultValue.minFirms} firms, ${rule.defaultValue.maxFirmSharePct} %.`}
      </p>
      <form onSubmit={save} noValidate className="mt-4 grid gap-4 sm:grid-cols-3">
        {FIELDS.map((field) => (
          <div key={field.key}>
            <label htmlFor={`rule-${field.key}`} className="field-label">
              {field.label}
            </label>
            <input
              id={`rule-${field.key}`}
              inputMode="decimal"
              className={`field-input ${errors[field.key] ? 'border-fault-500' : ''}`}
              value={draft[field.key]}
              aria-invalid={errors[field.key] ? true : undefined}
              aria-describedby={`rule-${field.key}-hint`}
              onChange={(e) => setDraft({ ...draft, [field.key]: e.target.value })}
            />
            <p id={`rule-${field.key}-hint`} className="mt-1 text-xs text-ink-500">
              {errors[field.key] ?? field.hint}
            </p>
          </div>
        ))}
        <div className="sm:col-span-3">
          <button type="submit" className="btn-primary" data-testid="disclosure-save">
            Save the thresholds
          </button>
        </div>
      </form>
      <div className="mt-3" aria-live="polite">
        {message && <FormMessage kind={message.kind}>{message.text}</FormMessage>}
      </div>
    </section>
  );
}
