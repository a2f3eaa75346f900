import type { RememberedMapping, RowError, SharedViewEntry } from '../import';
import type { ImportFlag, PrivateRecord, SharedRecord } from './records';

export { type RecordCorrection, recordCorrectionSchema } from '../schemas/record-correction';
export { type UploadOptions, uploadOptionsSchema } from '../schemas/upload-options';

export const SUBMISSION_STATUSES = ['draft', 'submitted', 'in_review', 'accepted', 'returned', 'rejected', 'withdrawn'] as const;
export type SubmissionStatus = (typeof SUBMISSION_STATUSES)[number];
export const SUBMISSION_SOURCE_KINDS = ['csv', 'ags4', 'api', 'seed'] as const;
export type SubmissionSourceKind = (typeof SUBMISSION_SOURCE_KINDS)[number];

/** One line of a submission list (the firm's own, the stewards' view, the review queue). */
export interface SubmissionSummary {
  id: string;
  status: SubmissionStatus;
  sourceKind: SubmissionSourceKind;
  fileName: string | null;
  rowCount: number;
  submittedAt: Date | null;
  decidedAt: Date | null;
  stewardComment: string | null;
  /** the contributing firm's name */
  firm: string;
}

/** `GET /api/submissions` */
export interface SubmissionList {
  submissions: SubmissionSummary[];
}

/** Who moved a submission from which status to which, and what they wrote. */
export interface HistoryEvent {
  occurredAt: Date;
  actor: string | null;
  fromStatus: SubmissionStatus | null;
  toStatus: SubmissionStatus;
  comment: string | null;
}

/** A record as its own firm sees it: shared values and private details, in the bank's SI units. */
export interface OwnRecord extends SharedRecord, PrivateRecord {
  rowNumber: number | null;
  reviewComment: string | null;
  importFlags: ImportFlag[];
}

/** `GET /api/submissions/:id` */
export interface OwnSubmission {
  submission: SubmissionSummary;
  records: OwnRecord[];
  history: HistoryEvent[];
}

/** The answer of a status change by the contributor (`resubmit`, `withdraw`). */
export interface SubmissionStatusChange {
  submission: { id: string; status: SubmissionStatus };
}

/** `POST /api/submissions` and `POST /api/partner/submissions` (201). */
export interface StoredSubmission {
  id: string;
  status: 'submitted';
  rowCount: number;
  incrementCount: number;
  flaggedRows: number;
}

/** The 201 answer of an upload. */
export interface SubmittedUpload {
  submission: StoredSubmission;
}

export interface CheckColumns {
  headers: string[];
  mapping: (string | null)[];
  units: Record<string, string>;
  missingRequired: string[];
}

/** `POST /api/submissions/check`: what an upload would store, and every row problem. */
export interface CheckResult {
  rowCount: number;
  validCount: number;
  errors: RowError[];
  notices: string[];
  columns: CheckColumns | null;
  geologyCodes: string[];
  flags: (ImportFlag & { row: number })[];
  preview: { row: number; shared: SharedViewEntry[] }[];
}

/** `PATCH /api/submissions/:id/records/:recordId`: the record's editable values after the correction. */
export interface CorrectedRecord {
  record: { id: string; rowNumber: number | null; values: Record<string, string | number | null> };
}

/** `GET /api/firm/field-mapping` */
export interface FieldMappingAnswer {
  mapping: RememberedMapping;
}
