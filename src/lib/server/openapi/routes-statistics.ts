import { bankSelectionSchema } from '../../schemas/bank-selection';
import {
  compareBodySchema,
  compareOptionsSchema,
  correlationOptionsSchema,
  overviewOptionsSchema,
  profileOptionsSchema,
} from '../../schemas/statistics-request';
import type { DocumentedRoute } from './documented-route';

const statisticsRoles =
  'any member of a firm (estimators included), data stewards and platform admins; figures pooled across firms only where the disclosure rule holds';

/** The bank selection (facets repeat their key, ranges are min..max in SI units) with a view's options. */
const withSelection = (options: typeof overviewOptionsSchema | typeof correlationOptionsSchema | typeof profileOptionsSchema) =>
  bankSelectionSchema.extend(options.shape);

/** Pooled statistics of a bank selection. */
export const STATISTICS_ROUTES: DocumentedRoute[] = [
  {
    method: 'get',
    path: '/api/statistics',
    tag: 'Statistics',
    caller: 'session',
    who: statisticsRoles,
    summary:
      'Every parameter’s figures for a bank selection (n, firms, mean, SD, CoV, P5–P95; log-normal for cv and k), the firm’s own figures, why pooled figures are withheld, P10/P50/P90 ranges for an estimate, and six correlations.',
    query: withSelection(overviewOptionsSchema),
    success: { status: 200, description: '{ bankVersion, rule, summaries, estimatorRanges, correlations, methods, cautions }' },
  },
  {
    method: 'get',
    path: '/api/statistics/correlation',
    tag: 'Statistics',
    caller: 'session',
    who: statisticsRoles,
    summary:
      'One correlation of the selection: points (other firms’ only where the rule holds), the least-squares line with 90 % confidence and prediction bands, and the published correlations with the bank’s bias against each.',
    query: withSelection(correlationOptionsSchema),
    success: { status: 200, description: 'The correlation.' },
  },
  {
    method: 'get',
    path: '/api/statistics/profile',
    tag: 'Statistics',
    caller: 'session',
    who: statisticsRoles,
    summary: 'wn, LL, e0, Cc, σ′p and OCR against depth, and the in-situ vertical effective stress line.',
    query: withSelection(profileOptionsSchema),
    success: { status: 200, description: 'The depth profile.' },
  },
  {
    method: 'post',
    path: '/api/statistics/compare',
    tag: 'Statistics',
    caller: 'session',
    who: statisticsRoles,
    summary: 'Where each of a few site results (SI units) sits in the selection’s distribution: percentile and outlier flag.',
    query: withSelection(compareOptionsSchema),
    body: [{ schema: compareBodySchema }],
    success: { status: 200, description: 'One comparison per value.' },
  },
];
