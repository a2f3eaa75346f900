import { useState } from 'react';

interface ConfirmButtonProps {
  /** What the first button says, e.g. "Remove". */
  label: string;
  /** Accessible name of the first button when the label alone is ambiguous in a table row. */
  ariaLabel?: string;
  /** What the confirming button says, e.g. "Remove Ana". */
  confirmLabel: string;
  onConfirm(): Promise<void>;
  testId?: string;
}

/** A destructive action that asks once more in place instead of in a browser dialog. */
export default function ConfirmButton({ label, ariaLabel, confirmLabel, onConfirm, testId }: ConfirmButtonProps) {
  const [asking, setAsking] = useState(false);
  const [busy, setBusy] = useState(false);

  if (!asking) {
    return (
      <button
        type="button"
        className="btn-quiet px-2 py-0.5 text-xs"
        aria-label={ariaLabel}
        onClick={() => setAsking(true)}
        data-testid={testId}
      >
        {label}
      </button>
    );
  }
  return (
    <span className="inline-flex flex-wrap gap-1.5">
      <button
        type="button"
        className="btn border-fault-500 bg-fault-500 px-2 py-0.5 text-xs text-white hover:bg-fault-700"
        disabled={busy}
        data-testid={testId ? `${testId}-confirm` : undefined}
        onClick={async () => {
          setBusy(true);
          try {
            await onConfirm();
          } finally {
            setBusy(false);
            setAsking(false);
          }
        }}
      >
        {confirmLabel}
      </button>
      <button type="button" className="btn-quiet px-2 py-0.5 text-xs" disabled={busy} onClick={() => setAsking(false)}>
        Keep
      </button>
    </span>
  );
}
