import type { DisclosureReason } from '../../lib/statistics';

interface WithheldNoteProps {
  tests: number;
  firms: number;
  reasons: readonly DisclosureReason[];
  /** What is withheld, e.g. "Figures pooled across firms" or "Other firms' points". */
  what: string;
}

/** Why pooled figures are not shown: the rule's reasons in plain words, and no numbers of other firms. */
export default function WithheldNote({ tests, firms, reasons, what }: WithheldNoteProps) {
  return (
    <div
      className="rounded border border-caution-300 bg-caution-50 p-2 text-xs text-caution-900"
      data-testid="withheld"
      role="note"
    >
      <p className="font-semibold">
        {what} are not shown ({tests === 1 ? '1 test' : `${tests} tests`} from {firms === 1 ? '1 firm' : `${firms} firms`} here).
      </p>
      <ul className="mt-1 list-disc pl-4">
        {reasons.map((reason) => (
          <li key={reason.code}>{reason.message}</li>
        ))}
      </ul>
      <p className="mt-1">Widen the selection (depth range, units) to reach the rule; your own firm's tests are shown alone.</p>
    </div>
  );
}
