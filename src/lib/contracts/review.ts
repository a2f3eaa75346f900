import type { PoolComparison } from '../statistics/pool-comparison';
import type { ImportFlag, SharedRecord } from './records';
import type { HistoryEvent, SubmissionStatus, SubmissionSummary } from './submissions';

export { type ReviewDecision, reviewDecisionSchema } from '../schemas/review';
export type { PoolComparison } from '../statistics/pool-comparison';

/** A submission waiting for a steward, with its flagged rows and how long it has waited. */
export interface QueueEntry extends SubmissionSummary {
  flaggedRows: number;
  waitingDays: number;
}

/** `GET /api/review` */
export interface ReviewQueueList {
  totals: { submissions: number; records: number };
  submissions: QueueEntry[];
}

/** One load increment of the raw oedometer readings (for the e–log σ′ curve). */
export interface Increment {
  incrementNo: number;
  appliedStressKpa: number;
  endVoidRatio: number | null;
  isUnloading: boolean;
}

/** A record as the steward sees it: shared values only, compared with the pool. */
export interface ReviewRecord extends SharedRecord {
  rowNumber: number | null;
  reviewComment: string | null;
  importFlags: ImportFlag[];
  comparison: Record<string, PoolComparison | null>;
  outliers: string[];
  increments: Increment[];
}

/** `GET /api/review/:id` */
export interface ReviewDetail {
  submission: SubmissionSummary;
  records: ReviewRecord[];
  history: HistoryEvent[];
}

/** `POST /api/review/:id/decision` */
export interface DecisionResult {
  submission: {
    id: string;
    status: SubmissionStatus;
    bankVersion: number | null;
    published: number;
    returnedRecords: number;
  };
}
