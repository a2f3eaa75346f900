import { type SyntheticEvent, useCallback, useEffect, useState } from 'react';
import type { ApiKeyList, CreatedApiKey, FirmApiKey } from '../../lib/contracts/firms';
import type { Json } from '../../lib/contracts/json';
import { createApiKeySchema } from '../../lib/schemas/firm';
import FormMessage from '../account/FormMessage';
import { getJson, postJson, requestJson } from '../account/post-json';
import TextField from '../account/TextField';
import { useSchemaForm } from '../account/use-schema-form';
import ConfirmButton from './ConfirmButton';
import { formatDate } from './format-date';
import KeyUsage from './KeyUsage';
import NewKeySecret from './NewKeySecret';
import { PANEL_TABLE_CLASS } from './panel-table';

type KeysState = { kind: 'loading' } | { kind: 'failed'; message: string } | { kind: 'loaded'; keys: Json<FirmApiKey>[] };

/** The firm's API keys for upload scripts: create (secret shown once), list, revoke. */
export default function ApiKeysPanel() {
  const [state, setState] = useState<KeysState>({ kind: 'loading' });
  const [secret, setSecret] = useState<{ name: string; value: string } | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const form = useSchemaForm(createApiKeySchema, { name: '' });

  const load = useCallback(async () => {
    const result = await getJson<Json<ApiKeyList>>('/api/firm/api-keys');
    setState(result.ok ? { kind: 'loaded', keys: result.data.keys } : { kind: 'failed', message: result.failure.message });
  }, []);

  useEffect(() => {
    void load();
  }, [load]);

  async function onSubmit(event: SyntheticEvent) {
    setSecret(null);
    const created = await form.submit(event, (input) => postJson<Json<CreatedApiKey>>('/api/firm/api-keys', input));
    if (!created) return;
    setSecret({ name: created.key.name ?? form.values.name, value: created.secret });
    form.setValue('name', '');
    await load();
  }

  async function revoke(id: string) {
    setProblem(null);
    const result = await requestJson('DELETE', `/api/firm/api-keys/${encodeURIComponent(id)}`);
    if (!result.ok) setProblem(result.failure.message);
    else await load();
  }

  return (
    <section className="panel" aria-labelledby="api-keys-heading" data-testid="api-keys-panel">
      <div className="border-b border-ink-200 px-4 py-2">
        <h2 id="api-keys-heading">API keys</h2>
        <p className="text-xs text-ink-500">
          For your firm's upload scripts. A key can create submissions for this firm and nothing else. Revoke a key as soon as a
          script no longer needs it. <a href="/api-guide">How partner uploads work</a>.
        </p>
      </div>
      <form className="flex flex-wrap items-start gap-3 px-4 py-3" onSubmit={onSubmit} noValidate data-testid="api-key-form">
        <TextField
          id="api-key-name"
          label="Key name"
          className="min-w-64 flex-1"
          placeholder="e.g. nightly lab export"
          value={form.values.name}
          onValueChange={(value) => form.setValue('name', value)}
          error={form.fieldErrors.name}
        />
        <button type="submit" className="btn-primary mt-5" disabled={form.busy}>
          {form.busy ? 'Creating…' : 'Create key'}
        </button>
      </form>
      <div className="space-y-2 px-4">
        {form.formError && <FormMessage kind="error">{form.formError}</FormMessage>}
        {problem && <FormMessage kind="error">{problem}</FormMessage>}
        {secret && <NewKeySecret name={secret.name} secret={secret.value} onDone={() => setSecret(null)} />}
      </div>
      {state.kind === 'loading' && <p className="px-4 py-3 text-sm text-ink-500">Loading keys…</p>}
      {state.kind === 'failed' && (
        <div className="px-4 py-3">
          <FormMessage kind="error">{state.message}</FormMessage>
        </div>
      )}
      {state.kind === 'loaded' && state.keys.length === 0 && <p className="px-4 py-3 text-sm text-ink-500">No keys yet.</p>}
      {state.kind === 'loaded' && state.keys.length > 0 && (
        <div className="overflow-x-auto py-2">
          <table className={PANEL_TABLE_CLASS}>
            <thead>
              <tr>
                <th scope="col">Name</th>
                <th scope="col">Starts with</th>
                <th scope="col">Created</th>
                <th scope="col">Last used</th>
                <th scope="col">State</th>
                <th scope="col">Actions</th>
              </tr>
            </thead>
            <tbody>
              {state.keys.map((key) => (
                <tr key={key.id} data-testid="api-key-row">
                  <td className="font-medium">{key.name}</td>
                  <td className="font-mono text-xs">{key.start ? `${key.start}…` : '—'}</td>
                  <td className="whitespace-nowrap">{formatDate(key.createdAt)}</td>
                  <td className="whitespace-nowrap">{key.lastUsedAt ? formatDate(key.lastUsedAt) : 'Never'}</td>
                  <td>{key.enabled ? 'In use' : 'Disabled'}</td>
                  <td>
                    <ConfirmButton
                      label="Revoke"
                      ariaLabel={`Revoke the key ${key.name}`}
                      confirmLabel="Revoke it"
                      onConfirm={() => revoke(key.id)}
                      testId="revoke-api-key"
                    />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      <KeyUsage keyStart={state.kind === 'loaded' ? (state.keys.find((k) => k.enabled)?.start ?? null) : null} />
    </section>
  );
}
