import type { RowError, SharedViewEntry } from '../../lib/import';

/** Shapes the contribution endpoints answer with (see the README's API section). */
export interface CheckColumns {
  headers: string[];
  mapping: (string | null)[];
  units: Record<string, string>;
  missingRequired: string[];
}

export interface CheckResult {
  rowCount: number;
  validCount: number;
  errors: RowError[];
  notices: string[];
  columns: CheckColumns | null;
  geologyCodes: string[];
  flags: { row: number; field: string; reason: string }[];
  preview: { row: number; shared: SharedViewEntry[] }[];
}

export interface StoredSubmission {
  id: string;
  status: string;
  rowCount: number;
  incrementCount: number;
  flaggedRows: number;
}

export interface SubmissionSummary {
  id: string;
  status: string;
  sourceKind: string;
  fileName: string | null;
  rowCount: number;
  submittedAt: string | null;
  decidedAt: string | null;
  stewardComment: string | null;
  firm: string;
}

export interface HistoryEvent {
  occurredAt: string;
  actor: string | null;
  fromStatus: string | null;
  toStatus: string;
  comment: string | null;
}

export interface ImportFlag {
  field: string;
  reason: string;
}

/** A record as its own firm sees it: shared values and private details, in the bank's SI units. */
export interface OwnRecord {
  id: string;
  status: string;
  rowNumber: number | null;
  reviewComment: string | null;
  importFlags: ImportFlag[] | null;
  [value: string]: unknown;
}

export interface OwnSubmission {
  submission: Omit<SubmissionSummary, 'firm'>;
  records: OwnRecord[];
  history: HistoryEvent[];
}

export interface Vocabulary {
  regions: { id: string; name: string; slug: string }[];
  units: { id: string; name: string; slug: string }[];
}
