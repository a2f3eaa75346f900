import type { CheckResult } from '../../lib/contracts/submissions';
import type { RowError } from '../../lib/import';
import FormMessage from '../account/FormMessage';
import { plural } from './format';
import ProblemTable from './ProblemTable';
import StepPanel from './StepPanel';

export interface CellEdit {
  row: number;
  field: string;
  text: string;
}

interface CheckStepProps {
  check: CheckResult | null;
  problems: readonly RowError[];
  /** true when the file, columns or corrections changed since the last check */
  stale: boolean;
  busy: boolean;
  failure: string | null;
  edits: CellEdit[];
  canCheck: boolean;
  onCheck(): void;
  onUndo(row: number, field: string): void;
  cellText(row: number, field: string): string;
  heading(field: string): string;
  onEdit(row: number, field: string, text: string): void;
}

/** Step 3: the server reads the file with these choices and checks every row; nothing is stored. */
export default function CheckStep(props: CheckStepProps) {
  const { check, problems, stale, busy, failure, edits } = props;
  const rowsWithProblems = new Set(problems.map((p) => p.row)).size;
  const isEdited = (row: number, field: string) => edits.some((e) => e.row === row && e.field === field);
  return (
    <StepPanel
      step={3}
      title="Check the rows"
      lead="Every row is checked against the bank's ranges and vocabulary and your firm's earlier tests. Nothing is stored yet."
      testId="check-step"
    >
      <div className="flex flex-wrap items-center gap-3">
        <button
          type="button"
          className="btn-primary"
          onClick={props.onCheck}
          disabled={busy || !props.canCheck}
          data-testid="check-button"
        >
          {busy ? 'Checking…' : check ? 'Check again' : 'Check the rows'}
        </button>
        {check && stale && !busy && (
          <span className="text-sm text-caution-700" data-testid="check-stale">
            Changed since the last check: check again before submitting.
          </span>
        )}
      </div>
      {failure && (
        <FormMessage kind="error" testId="check-error">
          {failure}
        </FormMessage>
      )}
      {check && (
        <p
          className={`rounded border px-3 py-2 text-sm ${problems.length ? 'border-fault-100 bg-fault-50 text-fault-700' : 'border-sound-100 bg-sound-50 text-sound-700'}`}
          data-testid="check-summary"
          role="status"
        >
          {plural(check.rowCount, 'row')} read: {check.validCount.toLocaleString('en-GB')} ready
          {problems.length > 0
            ? `, ${plural(rowsWithProblems, 'row')} to correct (${plural(problems.length, 'problem')}). Correct the cells below, or fix the file and choose it again.`
            : '. No problems found.'}
        </p>
      )}
      {problems.length > 0 && (
        <ProblemTable
          problems={problems}
          cellText={props.cellText}
          isEdited={isEdited}
          heading={props.heading}
          onEdit={props.onEdit}
        />
      )}
      {edits.length > 0 && (
        <div className="text-sm" data-testid="edit-list">
          <h3 className="text-sm">Your corrections</h3>
          <p className="text-xs text-ink-500">Sent with the file when you check and submit; the file itself is not changed.</p>
          <ul className="mt-1 space-y-0.5">
            {edits.map((edit) => (
              <li key={`${edit.row}-${edit.field}`} className="flex items-center gap-2">
                <span>
                  Row {edit.row}, {props.heading(edit.field)}: <span className="font-medium">{edit.text || '(blank)'}</span>
                </span>
                <button
                  type="button"
                  className="text-xs text-tide-700 underline"
                  onClick={() => props.onUndo(edit.row, edit.field)}
                >
                  Undo
                </button>
              </li>
            ))}
          </ul>
        </div>
      )}
    </StepPanel>
  );
}
