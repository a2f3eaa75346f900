/**
 * The statistics of one selection as a worker-thread task: the columns arrive moved (not copied), the
 * value-range filter and the core run here, off the server's event loop, and the answer leaves as JSON
 * text. This module is the entry of the worker bundle (`statistics-worker.mjs`, see
 * src/integrations/worker-entries.mjs); in development and tests it is loaded through tsx.
 */
import type {
  CompareAnswer,
  CorrelationAnswer,
  ProfileAnswer,
  StatisticsBasis,
  StatisticsOverview,
} from '../../contracts/statistics';
import {
  analyseSelection,
  type CorrelationPairId,
  compareSiteValues,
  compareWithPublished,
  correlatePair,
  DEFAULT_CORRELATION_PAIRS,
  DEFAULT_PROFILE_PARAMETERS,
  type DisclosureRule,
  depthProfile,
  estimatorRange,
  filterByValueRanges,
  type ParameterKey,
  PUBLISHED_CORRELATIONS,
  type QualityOptions,
  type SelectionColumns,
  StatisticsInputError,
  statisticsContext,
  summariseParameter,
  uniformLayer,
  type ValueRanges,
} from '../../statistics';

export type StatisticsTaskKind =
  | { kind: 'overview' }
  | { kind: 'correlation'; pair: CorrelationPairId }
  | { kind: 'profile'; waterTableM: number }
  | { kind: 'compare'; values: Partial<Record<ParameterKey, number[]>> };

export type StatisticsTask = StatisticsTaskKind & {
  columns: SelectionColumns;
  viewerFirmId: string | null;
  rule: DisclosureRule;
  quality: QualityOptions;
  valueRanges: ValueRanges;
  basis: Omit<StatisticsBasis, 'tests'>;
};

export type StatisticsTaskOutcome = { ok: true; json: string } | { ok: false; message: string };

function answer(task: StatisticsTask): object {
  const columns =
    Object.keys(task.valueRanges).length > 0
      ? filterByValueRanges(task.columns, task.valueRanges, task.viewerFirmId)
      : task.columns;
  const options = { viewerFirmId: task.viewerFirmId, rule: task.rule, quality: task.quality };
  const basis: StatisticsBasis = { ...task.basis, tests: columns.length };
  const overviewOnly = task.kind === 'overview';
  const overview = analyseSelection(columns, {
    ...options,
    parameters: overviewOnly ? undefined : [],
    correlations: overviewOnly ? DEFAULT_CORRELATION_PAIRS : [],
    // Correlations drawn on a chart are compared on the chart's answer (they cost most of the overview's time).
    published: overviewOnly ? PUBLISHED_CORRELATIONS.filter((c) => c.chart === null).map((c) => c.id) : [],
    includePoints: false,
    profile: false,
  });
  const explained = { basis, methods: overview.methods, cautions: overview.cautions };
  const context = statisticsContext(columns, options);
  switch (task.kind) {
    case 'overview': {
      const estimatorRanges = Object.fromEntries(overview.summaries.map((s) => [s.parameter, estimatorRange(s)]));
      return {
        ...explained,
        summaries: overview.summaries,
        estimatorRanges,
        correlations: overview.correlations,
        published: overview.published,
      } satisfies StatisticsOverview;
    }
    case 'correlation': {
      const published = PUBLISHED_CORRELATIONS.filter((c) => c.chart?.pair === task.pair).map((c) =>
        compareWithPublished(context, c),
      );
      return { ...explained, correlation: correlatePair(context, task.pair), published } satisfies CorrelationAnswer;
    }
    case 'profile': {
      const unitWeight = summariseParameter(context, 'bulkUnitWeightKnPerM3');
      const figures = unitWeight.pooled.released ? unitWeight.pooled : unitWeight.own;
      const from = unitWeight.pooled.released ? 'pooled' : 'own';
      const stressLine = figures ? ({ unitWeightKnPerM3: figures.p50, from, waterTableM: task.waterTableM } as const) : null;
      const profile = depthProfile(
        context,
        DEFAULT_PROFILE_PARAMETERS,
        stressLine ? { layers: uniformLayer(stressLine.unitWeightKnPerM3), waterTableDepthM: stressLine.waterTableM } : undefined,
      );
      return { ...explained, profile, stressLine } satisfies ProfileAnswer;
    }
    case 'compare': {
      const comparisons = Object.entries(task.values).map(([key, values]) =>
        compareSiteValues(context, key as ParameterKey, values ?? []),
      );
      return { ...explained, comparisons } satisfies CompareAnswer;
    }
  }
}

/** Runs one task; an input the core refuses comes back as a message rather than a thrown error. */
export default function statisticsTask(task: StatisticsTask): StatisticsTaskOutcome {
  try {
    return { ok: true, json: JSON.stringify(answer(task)) };
  } catch (error) {
    if (error instanceof StatisticsInputError) return { ok: false, message: error.message };
    throw error;
  }
}
