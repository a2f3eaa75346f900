import { type DragEvent, useState } from 'react';
import { DELIMITER_NAMES, DELIMITERS, type Delimiter, MAX_FILE_BYTES } from '../../lib/import';
import FormMessage from '../account/FormMessage';
import { plural } from './format';
import ProgressBar from './ProgressBar';
import type { FileRead, UploadFormat } from './read-file';
import StepPanel from './StepPanel';

interface FileStepProps {
  file: File | null;
  format: UploadFormat;
  /** the delimiter the person chose, if any; otherwise the one found in the header row is shown */
  chosenDelimiter: Delimiter | undefined;
  read: FileRead;
  onFile(file: File): void;
  onFormat(format: UploadFormat): void;
  onDelimiter(delimiter: Delimiter): void;
}

const DELIMITER_PROBLEMS = new Set(['DELIMITER_NOT_FOUND', 'DELIMITER_AMBIGUOUS', 'DELIMITER_MISMATCH']);

function sizeText(bytes: number): string {
  return bytes < 1024 * 1024 ? `${Math.max(1, Math.round(bytes / 1024))} KB` : `${(bytes / 1048576).toFixed(1)} MB`;
}

/** Step 1: the file, its kind, and (CSV) the delimiter, found or chosen but always shown. */
export default function FileStep({ file, format, chosenDelimiter, read, onFile, onFormat, onDelimiter }: FileStepProps) {
  const [dragging, setDragging] = useState(false);
  const foundDelimiter = read.kind === 'csv' ? read.table.delimiter : undefined;
  const shownDelimiter = chosenDelimiter ?? foundDelimiter;
  const delimiterProblem = read.kind === 'failed' && DELIMITER_PROBLEMS.has(read.code);

  function onDrop(event: DragEvent) {
    event.preventDefault();
    setDragging(false);
    const dropped = event.dataTransfer.files[0];
    if (dropped) onFile(dropped);
  }

  return (
    <StepPanel
      step={1}
      title="Choose the file"
      lead={`A CSV spreadsheet saved as UTF-8, or an AGS4 file; up to ${MAX_FILE_BYTES / 1048576} MB.`}
      testId="file-step"
    >
      {/* biome-ignore lint/a11y/noStaticElementInteractions: dropping is a shortcut; the file input inside is the accessible way */}
      <div
        className={`rounded border-2 border-dashed px-4 py-5 text-center ${dragging ? 'border-clay-500 bg-clay-50' : 'border-ink-200'}`}
        onDragOver={(event) => {
          event.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={onDrop}
      >
        <label htmlFor="upload-file" className="field-label">
          File to upload
        </label>
        <input
          id="upload-file"
          type="file"
          accept=".csv,.txt,.tsv,.ags,.ags4,text/csv"
          className="mx-auto mt-2 block text-sm text-ink-700 file:mr-3 file:rounded file:border file:border-ink-300 file:bg-white file:px-3 file:py-1 file:text-sm file:font-medium file:text-ink-700 hover:file:bg-ink-50"
          onChange={(event) => {
            const chosen = event.target.files?.[0];
            if (chosen) onFile(chosen);
          }}
          data-testid="upload-file"
        />
        <p className="mt-2 text-xs text-ink-500">or drop the file here</p>
      </div>

      {file && (
        <div className="flex flex-wrap items-end gap-x-6 gap-y-3 text-sm">
          <p data-testid="chosen-file">
            <span className="font-medium">{file.name}</span> <span className="text-ink-500">· {sizeText(file.size)}</span>
          </p>
          <fieldset className="flex items-center gap-3">
            <legend className="field-label mb-1">Kind of file</legend>
            {(['csv', 'ags4'] as const).map((kind) => (
              <label key={kind} className="inline-flex items-center gap-1.5">
                <input type="radio" name="upload-format" value={kind} checked={format === kind} onChange={() => onFormat(kind)} />
                {kind === 'csv' ? 'CSV spreadsheet' : 'AGS4 file'}
              </label>
            ))}
          </fieldset>
          {format === 'csv' && (
            <div>
              <label htmlFor="upload-delimiter" className="field-label">
                Columns separated by
              </label>
              <div className="flex items-center gap-2">
                <select
                  id="upload-delimiter"
                  className="field-input w-36"
                  value={shownDelimiter ?? ''}
                  onChange={(event) => onDelimiter(event.target.value as Delimiter)}
                  data-testid="delimiter-select"
                >
                  {!shownDelimiter && <option value="">Choose…</option>}
                  {DELIMITERS.map((d) => (
                    <option key={d} value={d}>
                      {DELIMITER_NAMES[d]}
                    </option>
                  ))}
                </select>
                <span className="mt-1 text-xs text-ink-500" data-testid="delimiter-source">
                  {chosenDelimiter
                    ? 'your choice'
                    : foundDelimiter
                      ? `found in the header row; change it if the columns below look wrong`
                      : ''}
                </span>
              </div>
            </div>
          )}
        </div>
      )}

      {read.kind === 'reading' && (
        <ProgressBar fraction={read.fraction} label={`Reading the file… ${plural(read.rowsRead, 'row')} so far`} />
      )}
      {read.kind === 'failed' && (
        <FormMessage kind="error" testId="read-error">
          {read.message}
          {delimiterProblem && ' Choose the delimiter above.'}
        </FormMessage>
      )}
      {read.kind === 'csv' && (
        <p className="text-sm text-ink-700" data-testid="read-summary">
          Read {plural(read.table.rows.length, 'data row')} in {plural(read.table.headers.length, 'column')}, split by{' '}
          {DELIMITER_NAMES[read.table.delimiter]}. Row numbers below are as a spreadsheet shows them (the header is row 1).
        </p>
      )}
      {read.kind === 'ags4' && (
        <p className="text-sm text-ink-700" data-testid="read-summary">
          Found {plural(read.rows.length, 'consolidation test')}. Row numbers below are lines of the file.
        </p>
      )}
    </StepPanel>
  );
}
