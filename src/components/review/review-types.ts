import type { HistoryEvent, ImportFlag } from '../contribute/api-types';

/** Shapes the review endpoints answer with (see the README's API section). */
export interface QueueEntry {
  id: string;
  status: string;
  sourceKind: string;
  fileName: string | null;
  rowCount: number;
  submittedAt: string | null;
  firm: string;
  flaggedRows: number;
  waitingDays: number;
}

export interface ReviewQueueData {
  totals: { submissions: number; records: number };
  submissions: QueueEntry[];
}

/** Where one value sits among the published records of the same geological unit. */
export interface PoolComparison {
  /** 0–100, or null when the pool is empty */
  percentile: number | null;
  outlier: 'low' | 'high' | null;
  poolSize: number;
}

export interface Increment {
  incrementNo: number;
  appliedStressKpa: number;
  endVoidRatio: number | null;
  isUnloading: boolean;
}

/** A record as the steward sees it: shared values only, compared with the pool. */
export interface ReviewRecord {
  id: string;
  status: string;
  rowNumber: number | null;
  reviewComment: string | null;
  importFlags: ImportFlag[] | null;
  comparison: Record<string, PoolComparison | null>;
  outliers: string[];
  increments: Increment[];
  [value: string]: unknown;
}

export interface ReviewDetail {
  submission: {
    id: string;
    status: string;
    sourceKind: string;
    fileName: string | null;
    rowCount: number;
    submittedAt: string | null;
    stewardComment: string | null;
    firm: string;
  };
  records: ReviewRecord[];
  history: HistoryEvent[];
}

export interface DecisionResult {
  submission: { id: string; status: string; bankVersion: number | null; published: number; returnedRecords: number };
}
