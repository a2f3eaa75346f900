import FormMessage from '../account/FormMessage';
import { plural } from './format';
import StepPanel from './StepPanel';

interface SubmitStepProps {
  ready: boolean;
  busy: boolean;
  rowCount: number;
  failure: string | null;
  onSubmit(): void;
}

/** Step 5: store the checked file as one submission for the stewards. */
export default function SubmitStep({ ready, busy, rowCount, failure, onSubmit }: SubmitStepProps) {
  return (
    <StepPanel
      step={5}
      title="Submit for review"
      lead="The file is stored whole or not at all, with your corrections, and goes to the data stewards. You get an e-mail when they decide."
      testId="submit-step"
    >
      {failure && (
        <FormMessage kind="error" testId="submit-error">
          {failure}
        </FormMessage>
      )}
      <div className="flex flex-wrap items-center gap-3">
        <button type="button" className="btn-primary" disabled={!ready || busy} onClick={onSubmit} data-testid="submit-button">
          {busy ? 'Submitting…' : ready ? `Submit ${plural(rowCount, 'test record')}` : 'Submit'}
        </button>
        {!ready && !busy && <span className="text-sm text-ink-500">Check the rows first; every row must be ready.</span>}
      </div>
    </StepPanel>
  );
}
