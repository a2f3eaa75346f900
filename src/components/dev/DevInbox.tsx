import { useCallback, useEffect, useState } from 'react';
import { linkify } from './linkify';

interface Message {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
}

type LoadState = { kind: 'loading' } | { kind: 'failed'; message: string } | { kind: 'loaded'; messages: Message[] };

export default function DevInbox() {
  const [state, setState] = useState<LoadState>({ kind: 'loading' });
  const [openId, setOpenId] = useState<string | null>(null);

  const load = useCallback(async () => {
    setState({ kind: 'loading' });
    try {
      const response = await fetch('/api/dev/inbox');
      const body = await response.json();
      if (!response.ok) throw new Error(body?.error?.message ?? `HTTP ${response.status}`);
      setState({ kind: 'loaded', messages: body.messages });
    } catch (error) {
      setState({ kind: 'failed', message: error instanceof Error ? error.message : 'Could not load the inbox.' });
    }
  }, []);

  useEffect(() => {
    void load();
  }, [load]);

  return (
    <section className="panel" data-testid="dev-inbox">
      <div className="flex items-center justify-between border-b border-ink-200 px-4 py-2">
        <span className="text-sm text-ink-600">
          {state.kind === 'loaded' ? `${state.messages.length} message(s)` : state.kind === 'loading' ? 'Loading…' : ''}
        </span>
        <button type="button" className="btn-quiet" onClick={() => void load()}>
          Refresh
        </button>
      </div>
      {state.kind === 'failed' && <p className="px-4 py-3 text-sm text-fault-700">{state.message}</p>}
      {state.kind === 'loaded' && state.messages.length === 0 && (
        <p className="px-4 py-6 text-sm text-ink-500">No mail yet. Messages appear here when the app sends one.</p>
      )}
      {state.kind === 'loaded' && (
        <ul className="divide-y divide-ink-100">
          {state.messages.map((message) => (
            <li key={message.id} data-testid="inbox-message">
              <button
                type="button"
                className="flex w-full items-baseline gap-3 px-4 py-2 text-left hover:bg-ink-50"
                onClick={() => setOpenId(openId === message.id ? null : message.id)}
                aria-expanded={openId === message.id}
              >
                <span className="w-40 shrink-0 text-xs tabular-nums text-ink-500">
                  {new Date(message.receivedAt).toLocaleString()}
                </span>
                <span className="w-56 shrink-0 truncate text-xs text-ink-600">{message.to.join(', ')}</span>
                <span className="font-medium text-ink-900">{message.subject}</span>
              </button>
              {openId === message.id && (
                <pre className="whitespace-pre-wrap break-words bg-ink-50 px-4 py-3 font-sans text-sm text-ink-800">
                  {linkify(message.text).map((part, index) =>
                    part.kind === 'link' ? (
                      // biome-ignore lint/suspicious/noArrayIndexKey: parts of one fixed text never reorder
                      <a key={index} href={part.value}>
                        {part.value}
                      </a>
                    ) : (
                      // biome-ignore lint/suspicious/noArrayIndexKey: parts of one fixed text never reorder
                      <span key={index}>{part.value}</span>
                    ),
                  )}
                </pre>
              )}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
