/**
 * Answers of the statistics API (`/api/statistics…`): figures of a bank selection in SI units, named as
 * the statistics core names them. Pooled figures come with `released: true`, or `released: false` and
 * the reasons the disclosure rule withheld them; the viewer's own firm's figures sit beside them.
 */
import type {
  CorrelationResult,
  DepthProfile,
  DisclosureRule,
  EstimatorRange,
  MethodNotes,
  ParameterKey,
  ParameterSummary,
  PublishedComparison,
  SiteComparison,
} from '../statistics';

export type { CompareBody } from '../schemas/statistics-request';
export {
  compareBodySchema,
  correlationOptionsSchema,
  overviewOptionsSchema,
  profileOptionsSchema,
} from '../schemas/statistics-request';

/** What every answer was computed from. */
export interface StatisticsBasis {
  /** The selection's canonical query string (bank-selection.ts). */
  selection: string;
  /** The newest bank version when the figures were computed (null before the first publication). */
  bankVersion: number | null;
  rule: DisclosureRule;
  weighting: 'equal' | 'byClass';
  /** Tests in the selection (published, plus the viewer's own firm's still in review). */
  tests: number;
  /** True when the viewer acts for a firm (its tests are shown unmasked as "own"). */
  viewerHasFirm: boolean;
}

interface Explained {
  basis: StatisticsBasis;
  methods: MethodNotes;
  cautions: readonly string[];
}

/**
 * `GET /api/statistics`: every parameter's figures, the six usual correlations (no points), and the bias
 * against the published correlations that no chart draws (those on a chart come with its answer).
 */
export interface StatisticsOverview extends Explained {
  summaries: ParameterSummary[];
  /** P10/P50/P90 per parameter for an estimate, from pooled figures or else the viewer's own. */
  estimatorRanges: Partial<Record<ParameterKey, EstimatorRange | null>>;
  correlations: CorrelationResult[];
  published: PublishedComparison[];
}

/** `GET /api/statistics/correlation?pair=…`: one chart with its points, line, bands and published lines. */
export interface CorrelationAnswer extends Explained {
  correlation: CorrelationResult;
  /** The bank's bias and scatter against each published correlation drawn on this chart. */
  published: PublishedComparison[];
}

/** `GET /api/statistics/profile`: parameters against depth, and the in-situ σ'v0 line when unit weights are known. */
export interface ProfileAnswer extends Explained {
  profile: DepthProfile;
  /** How the σ'v0 line was drawn; null when the selection has no unit weights to draw it from. */
  stressLine: { unitWeightKnPerM3: number; from: 'pooled' | 'own'; waterTableM: number } | null;
}

/** `POST /api/statistics/compare`: each site value's percentile in the selection, and an outlier flag. */
export interface CompareAnswer extends Explained {
  comparisons: SiteComparison[];
}
