import type { UnitSystem } from '../preferences/unit-system';

export { type SaveEstimateInput, saveEstimateSchema } from '../schemas/estimate';
export { type EstimatePreviewInput, estimatePreviewSchema } from '../schemas/estimate-preview';

/** A saved estimate of the active firm, without its input (firm-private). */
export interface EstimateSummary {
  id: string;
  name: string;
  unitSystem: UnitSystem;
  /** the bank version that was current when it was saved */
  bankVersion: number | null;
  createdAt: Date;
  updatedAt: Date;
}

/** `GET /api/estimates` */
export interface EstimateList {
  estimates: EstimateSummary[];
}

/** `POST /api/estimates` (201) */
export interface SavedEstimate {
  estimate: EstimateSummary;
}
