import { statusLabel, statusTone } from './status-labels';

/** A submission's or record's state as a small coloured tag. */
export default function StatusTag({ status, testId }: { status: string; testId?: string }) {
  return (
    <span className={`tag whitespace-nowrap ${statusTone(status)}`} data-testid={testId} data-status={status}>
      {statusLabel(status)}
    </span>
  );
}
