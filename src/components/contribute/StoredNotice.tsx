import type { StoredSubmission } from '../../lib/contracts/submissions';
import { plural } from './format';

interface StoredNoticeProps {
  stored: StoredSubmission;
  fileName: string;
  onAnother(): void;
}

/** What happened after a successful submit, and where to follow it. */
export default function StoredNotice({ stored, fileName, onAnother }: StoredNoticeProps) {
  return (
    <section className="panel border-sound-100 p-5" data-testid="stored-notice" role="status">
      <p className="tag bg-sound-100 text-sound-700">Submitted</p>
      <h2 className="mt-2">{fileName} is waiting for review</h2>
      <p className="mt-1 text-sm text-ink-700">
        Stored {plural(stored.rowCount, 'test record')}
        {stored.incrementCount > 0 ? ` with ${plural(stored.incrementCount, 'loading step')}` : ''}.
        {stored.flaggedRows > 0 ? ` ${plural(stored.flaggedRows, 'row')} carry import flags for the stewards to look at.` : ''}{' '}
        The data stewards have been told; you will get an e-mail when they decide.
      </p>
      <div className="mt-3 flex flex-wrap gap-3">
        <a className="btn-primary" href={`/contribute/submissions/${stored.id}`} data-testid="stored-link">
          Open the submission
        </a>
        <button type="button" className="btn-quiet" onClick={onAnother}>
          Upload another file
        </button>
      </div>
    </section>
  );
}
