import { useCallback, useState } from 'react';
import type { CheckResult, StoredSubmission, SubmittedUpload } from '../../lib/contracts/submissions';
import type { RowError } from '../../lib/import';
import type { UploadOptions } from '../../lib/schemas/upload-options';
import { announceSubmissionsChanged } from './events';
import { problemsFromIssues } from './problem-rows';
import { sendUpload } from './send-upload';

function failureText(message: string, issues: { path: string; message: string }[]): string {
  const lines = issues.filter((i) => !i.path.startsWith('rows.')).slice(0, 5);
  return lines.length ? `${message} ${lines.map((i) => i.message).join(' ')}` : message;
}

/**
 * Checking and submitting the chosen file with its options: the last check (and the options it was made
 * with, to tell when it is out of date), the row problems to show, and the stored submission.
 */
export function useUploadRun() {
  const [check, setCheck] = useState<{ result: CheckResult; key: string } | null>(null);
  const [problems, setProblems] = useState<RowError[]>([]);
  const [busy, setBusy] = useState<null | 'checking' | 'submitting'>(null);
  const [checkFailure, setCheckFailure] = useState<string | null>(null);
  const [submitFailure, setSubmitFailure] = useState<string | null>(null);
  const [stored, setStored] = useState<StoredSubmission | null>(null);

  const reset = useCallback(() => {
    setCheck(null);
    setProblems([]);
    setCheckFailure(null);
    setSubmitFailure(null);
  }, []);

  async function runCheck(file: File, options: Partial<UploadOptions>) {
    setBusy('checking');
    setCheckFailure(null);
    setSubmitFailure(null);
    const result = await sendUpload<CheckResult>('/api/submissions/check', file, options);
    setBusy(null);
    if (result.ok) {
      setCheck({ result: result.data, key: JSON.stringify(options) });
      setProblems(result.data.errors);
    } else {
      setCheck(null);
      setCheckFailure(failureText(result.failure.message, result.failure.issues));
    }
  }

  async function submit(file: File, options: Partial<UploadOptions>) {
    setBusy('submitting');
    setSubmitFailure(null);
    const result = await sendUpload<SubmittedUpload>('/api/submissions', file, options);
    setBusy(null);
    if (result.ok) {
      setStored(result.data.submission);
      announceSubmissionsChanged();
      return;
    }
    const rowProblems = problemsFromIssues(result.failure.issues);
    if (rowProblems.length > 0) {
      setCheck(null);
      setProblems(rowProblems);
      setCheckFailure(result.failure.message);
    } else setSubmitFailure(failureText(result.failure.message, result.failure.issues));
  }

  return { check, problems, busy, checkFailure, submitFailure, stored, reset, runCheck, submit };
}
