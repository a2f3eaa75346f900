import { useState } from 'react';

interface NewKeySecretProps {
  name: string;
  secret: string;
  onDone(): void;
}

/** The full secret of a key just created; Claybank cannot show it again. */
export default function NewKeySecret({ name, secret, onDone }: NewKeySecretProps) {
  const [copy, setCopy] = useState<'idle' | 'copied' | 'failed'>('idle');

  async function copySecret() {
    try {
      await navigator.clipboard.writeText(secret);
      setCopy('copied');
    } catch {
      setCopy('failed');
    }
  }

  return (
    <div role="status" className="rounded border border-caution-300 bg-caution-50 p-3 text-sm" data-testid="new-api-key">
      <p className="font-semibold text-caution-900">Copy the key “{name}” now: this is the only time it is shown.</p>
      <p className="mt-0.5 text-xs text-caution-700">
        Claybank keeps only a fingerprint of it. Store it in your script's secret settings; if it is lost, revoke it and create a
        new one.
      </p>
      <div className="mt-2 flex flex-wrap items-center gap-2">
        <label htmlFor="new-api-key-secret" className="sr-only">
          New API key
        </label>
        <input
          id="new-api-key-secret"
          readOnly
          value={secret}
          onFocus={(event) => event.target.select()}
          className="field-input mt-0 min-w-0 flex-1 font-mono text-xs"
          data-testid="new-api-key-secret"
        />
        <button type="button" className="btn-quiet" onClick={() => void copySecret()}>
          {copy === 'copied' ? 'Copied' : 'Copy key'}
        </button>
        <button type="button" className="btn-quiet" onClick={onDone}>
          I have stored it
        </button>
      </div>
      {copy === 'failed' && (
        <p role="alert" className="mt-1 text-xs text-fault-700">
          The browser did not allow copying. Select the key and copy it by hand.
        </p>
      )}
    </div>
  );
}
