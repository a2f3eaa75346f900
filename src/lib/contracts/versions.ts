/** One published version of the bank. */
export interface BankVersionEntry {
  /** the version number */
  id: number;
  publishedAt: Date;
  /** the person who published it; null when that account is gone */
  publishedBy: string | null;
  /** records published or changed in this version */
  recordCount: number;
  note: string | null;
  /** published records in the bank now that first appeared in this version */
  recordsNowInVersion: number;
}

/** `GET /api/admin/bank-versions` */
export interface BankVersionList {
  versions: BankVersionEntry[];
  total: number;
}
