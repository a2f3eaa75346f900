import type { RowError } from '../../lib/import';
import { groupProblems, IDENTIFYING_FIELDS } from './problem-rows';

export const MAX_PROBLEM_ROWS = 200;

interface ProblemTableProps {
  problems: readonly RowError[];
  /** the cell's text now: the correction typed here, or what the file holds */
  cellText(row: number, field: string): string;
  isEdited(row: number, field: string): boolean;
  heading(field: string): string;
  onEdit(row: number, field: string, text: string): void;
}

/** The rows that need correcting, each problem in its cell with the reason, and the cell editable in place. */
export default function ProblemTable({ problems, cellText, isEdited, heading, onEdit }: ProblemTableProps) {
  const { rows, fields } = groupProblems(problems);
  const columns = [...IDENTIFYING_FIELDS, ...fields];
  const shown = rows.slice(0, MAX_PROBLEM_ROWS);
  return (
    <>
      <div className="relative overflow-x-auto rounded border border-ink-200">
        <table className="data-table" data-testid="problem-table">
          <thead>
            <tr>
              <th scope="col">Row</th>
              {columns.map((field) => (
                <th key={field} scope="col" className="whitespace-nowrap">
                  {heading(field)}
                </th>
              ))}
              <th scope="col">Problems with the whole row</th>
            </tr>
          </thead>
          <tbody>
            {shown.map((entry) => (
              <tr key={entry.row} data-testid="problem-row" data-row={entry.row}>
                <th scope="row" className="border-b border-ink-100 px-2 py-1 text-left align-top text-xs font-semibold">
                  {entry.row}
                </th>
                {columns.map((field) => {
                  const messages = entry.cells.get(field);
                  const text = cellText(entry.row, field);
                  if (!messages) {
                    return (
                      <td key={field} className="whitespace-nowrap text-ink-600">
                        {text || <span className="text-ink-300">—</span>}
                        {isEdited(entry.row, field) && <span className="ml-1 text-2xs text-tide-700">edited</span>}
                      </td>
                    );
                  }
                  const inputId = `cell-${entry.row}-${field}`;
                  return (
                    <td key={field} className="min-w-[9rem] bg-fault-50" data-testid="problem-cell" data-field={field}>
                      <label htmlFor={inputId} className="sr-only">
                        Row {entry.row}, {heading(field)}
                      </label>
                      <input
                        id={inputId}
                        className="w-full rounded border border-fault-500 bg-white px-1.5 py-0.5 text-sm"
                        value={text}
                        aria-invalid="true"
                        aria-describedby={`${inputId}-problem`}
                        onChange={(event) => onEdit(entry.row, field, event.target.value)}
                        data-testid="problem-input"
                      />
                      <p id={`${inputId}-problem`} className="mt-0.5 text-xs text-fault-700" data-testid="problem-message">
                        {messages.join(' ')}
                      </p>
                    </td>
                  );
                })}
                <td className="min-w-[12rem] text-xs text-fault-700">{entry.rowMessages.join(' ')}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {rows.length > shown.length && (
        <p className="text-xs text-ink-500">
          Showing the first {shown.length} of {rows.length} rows that need correcting. Correct these, or fix the file and choose
          it again.
        </p>
      )}
    </>
  );
}
