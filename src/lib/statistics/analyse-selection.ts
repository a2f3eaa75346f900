/**
 * The one call for a selection: the columns of its rows in, everything a card, a chart and the
 * estimator need out — per-parameter summaries, correlation charts, comparisons with the published
 * correlations, the depth profile, the methods in words and the cautions. Plain serialisable output.
 */
import { STANDING_CAUTIONS } from '../consolidation/cautions';
import type { SelectionColumns } from './columns';
import { type StatisticsOptions, statisticsContext } from './context';
import { type CorrelationResult, correlatePair } from './correlation';
import { compareWithPublished, type PublishedComparison } from './correlation-bias';
import { CORRELATION_PAIR_IDS, type CorrelationPairId } from './correlation-pairs';
import { type DepthProfile, depthProfile, type StressLineInput } from './depth-profile';
import type { DisclosureRule } from './disclosure';
import { LOG_SCALE_REASON, type ParameterKey } from './parameters';
import { PUBLISHED_CORRELATIONS } from './published-correlations';
import { describeQuality } from './quality';
import { type ParameterSummary, summariseParameters } from './summary';

export interface AnalysisOptions extends StatisticsOptions {
  /** Parameters to summarise (default: every one the columns carry). */
  parameters?: readonly ParameterKey[];
  /** Correlation charts (default: all pairs). */
  correlations?: readonly CorrelationPairId[];
  /** Published correlations to compare with (ids; default all). */
  published?: readonly string[];
  /** Depth profile (default: the standard panels, no stress line); false for none. */
  profile?: { parameters?: readonly ParameterKey[]; stressLine?: StressLineInput } | false;
  /** Band level (default 0.9). */
  level?: number;
  /** Scatter points of the correlation charts (default true; the depth profile always has its points). */
  includePoints?: boolean;
}

export interface MethodNotes {
  percentiles: string;
  logScale: string;
  quality: string;
  disclosure: string;
  masking: string;
  regression: string;
}

export interface SelectionAnalysis {
  summaries: ParameterSummary[];
  correlations: CorrelationResult[];
  published: PublishedComparison[];
  profile: DepthProfile | null;
  rule: DisclosureRule;
  methods: MethodNotes;
  cautions: readonly string[];
}

export const STATISTICS_CAUTIONS: readonly string[] = [
  ...STANDING_CAUTIONS,
  'Figures pooled across firms are computed from values each masked by a third to two thirds of the parameter’s usual spread within a deposit (Cc 10–20 %, LL 5–10 %, cv a factor of 1.22–1.49), so no single test can be read back; their spread is corrected for the masking.',
  'Published correlations are screening estimates from other soils: read them against the bank’s scatter, never instead of tests.',
];

function methodNotes(options: AnalysisOptions, rule: DisclosureRule): MethodNotes {
  return {
    percentiles:
      'Percentiles by Hyndman & Fan (1996) type 7 (linear interpolation between ordered values); with quality weights, the same rule with each test placed by the cumulative weight below it.',
    logScale: LOG_SCALE_REASON,
    quality: describeQuality(options.quality),
    disclosure: `Figures pooled across firms are shown only when at least ${rule.minTests} tests from at least ${rule.minFirms} firms stand behind them and no firm contributed more than ${Math.round(rule.maxFirmShare * 100)} % of them; the pooled minimum and maximum are never shown.`,
    masking: STATISTICS_CAUTIONS[STANDING_CAUTIONS.length] as string,
    regression:
      'Ordinary least squares on the plotted axes (log10 for cv), unweighted, corrected for the masking noise; 90 % confidence and prediction bands from Student’s t with n − 2 degrees of freedom.',
  };
}

export function analyseSelection(columns: SelectionColumns, options: AnalysisOptions): SelectionAnalysis {
  const context = statisticsContext(columns, options);
  const includePoints = options.includePoints ?? true;
  const published = options.published
    ? PUBLISHED_CORRELATIONS.filter((c) => options.published?.includes(c.id))
    : PUBLISHED_CORRELATIONS;
  return {
    summaries: summariseParameters(context, options.parameters),
    correlations: (options.correlations ?? CORRELATION_PAIR_IDS).map((id) =>
      correlatePair(context, id, { level: options.level, includePoints }),
    ),
    published: published.map((c) => compareWithPublished(context, c)),
    profile: options.profile === false ? null : depthProfile(context, options.profile?.parameters, options.profile?.stressLine),
    rule: context.rule,
    methods: methodNotes(options, context.rule),
    cautions: STATISTICS_CAUTIONS,
  };
}
