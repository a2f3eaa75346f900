import { type SyntheticEvent, useState } from 'react';
import { type DecisionResult, reviewDecisionSchema } from '../../lib/contracts/review';
import FormMessage from '../account/FormMessage';
import { fieldErrorsFromServer, fieldErrorsFromZod } from '../account/field-errors';
import { postJson } from '../account/post-json';
import { plural } from '../contribute/format';

type Action = 'accept' | 'return' | 'reject';

interface DecisionFormProps {
  submissionId: string;
  pendingCount: number;
  recordComments: { recordId: string; comment: string }[];
  onDecided(result: DecisionResult['submission']): Promise<void>;
}

const CHOICES: { action: Action; label: string; hint: string }[] = [
  { action: 'accept', label: 'Accept', hint: 'Publishes every waiting record in a new bank version.' },
  {
    action: 'return',
    label: 'Return for corrections',
    hint: 'The firm corrects the records you commented on and sends the submission back.',
  },
  { action: 'reject', label: 'Reject', hint: 'Closes the submission; none of its records enter the bank.' },
];

/** Accept, return with comments (on the submission and on records) or reject. */
export default function DecisionForm({ submissionId, pendingCount, recordComments, onDecided }: DecisionFormProps) {
  const [action, setAction] = useState<Action>(recordComments.length > 0 ? 'return' : 'accept');
  const [comment, setComment] = useState('');
  const [errors, setErrors] = useState<Record<string, string | undefined>>({});
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  const blocked =
    action === 'accept' && recordComments.length > 0
      ? 'Accepting publishes every record as it is, so record comments are not sent. Return the submission, or clear the comments.'
      : null;

  async function decide(event: SyntheticEvent) {
    event.preventDefault();
    setProblem(null);
    setErrors({});
    const parsed = reviewDecisionSchema.safeParse({
      action,
      ...(comment.trim() ? { comment: comment.trim() } : {}),
      ...(action === 'return' && recordComments.length ? { recordComments } : {}),
    });
    if (!parsed.success) {
      setErrors(fieldErrorsFromZod(parsed.error.issues));
      return;
    }
    setBusy(true);
    const result = await postJson<DecisionResult>(`/api/review/${encodeURIComponent(submissionId)}/decision`, parsed.data);
    setBusy(false);
    if (!result.ok) {
      setErrors(fieldErrorsFromServer(result.failure.issues));
      setProblem(result.failure.message);
      return;
    }
    await onDecided(result.data.submission);
  }

  const submitLabel = {
    accept: `Accept and publish ${plural(pendingCount, 'record')}`,
    return: `Return to the firm${recordComments.length ? ` with ${plural(recordComments.length, 'record comment')}` : ''}`,
    reject: 'Reject the submission',
  }[action];

  return (
    <form
      className="panel space-y-3 p-4"
      onSubmit={decide}
      noValidate
      aria-labelledby="decision-heading"
      data-testid="decision-form"
    >
      <h2 id="decision-heading">Decision</h2>
      {problem && <FormMessage kind="error">{problem}</FormMessage>}
      <fieldset className="grid gap-2 sm:grid-cols-3">
        <legend className="sr-only">What to do with the submission</legend>
        {CHOICES.map((choice) => (
          <label
            key={choice.action}
            className={`cursor-pointer rounded border px-3 py-2 text-sm ${action === choice.action ? 'border-clay-500 bg-clay-50' : 'border-ink-200'}`}
          >
            <span className="flex items-center gap-2 font-medium">
              <input
                type="radio"
                name="decision"
                value={choice.action}
                checked={action === choice.action}
                onChange={() => setAction(choice.action)}
              />
              {choice.label}
            </span>
            <span className="mt-0.5 block text-xs text-ink-600">{choice.hint}</span>
          </label>
        ))}
      </fieldset>
      <div>
        <label htmlFor="decision-comment" className="field-label">
          Comment on the whole submission{action === 'reject' ? ' (required)' : action === 'accept' ? ' (optional)' : ''}
        </label>
        <textarea
          id="decision-comment"
          className={`field-input ${errors.comment ? 'border-fault-500' : ''}`}
          rows={3}
          maxLength={2000}
          value={comment}
          onChange={(event) => setComment(event.target.value)}
          aria-invalid={errors.comment ? true : undefined}
          data-testid="decision-comment"
        />
        {errors.comment && <p className="mt-1 text-xs text-fault-700">{errors.comment}</p>}
        <p className="mt-1 text-xs text-ink-500">
          {recordComments.length
            ? `${plural(recordComments.length, 'record comment')} written in the table.`
            : 'Comment on single records with “Comment” in the table.'}{' '}
          The firm gets one e-mail with every comment.
        </p>
      </div>
      {blocked && <p className="text-sm text-caution-700">{blocked}</p>}
      <button type="submit" className="btn-primary" disabled={busy || blocked !== null} data-testid="decide-button">
        {busy ? 'Sending…' : submitLabel}
      </button>
    </form>
  );
}
