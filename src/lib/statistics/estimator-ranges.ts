/**
 * From a card to the estimate workspace: a parameter's P10/P50/P90 as the engine's three-point
 * parameter spec (src/lib/consolidation/engine-input.ts), from the pooled figures when the rule
 * released them, else from the viewer's own tests, else nothing.
 */
import type { ParameterSpec } from '../consolidation/engine-input';
import type { ParameterKey } from './parameters';
import type { ParameterSummary } from './summary';

export interface EstimatorRange {
  spec: Extract<ParameterSpec, { type: 'p10p50p90' }>;
  /** Where the three values came from. */
  basis: 'pooled' | 'own';
  n: number;
  firms: number;
}

/** Factors from the bank's units to the engine's where they differ: mv m²/MN → 1/kPa. */
const TO_ENGINE_UNITS: Partial<Record<ParameterKey, number>> = { mvM2PerMn: 0.001 };

/** Null when neither pooled nor own figures rest on 2 tests or more. Values in the engine's units. */
export function estimatorRange(summary: ParameterSummary): EstimatorRange | null {
  const figures = summary.pooled.released ? summary.pooled : summary.own;
  if (!figures || figures.n < 2) return null;
  const f = TO_ENGINE_UNITS[summary.parameter] ?? 1;
  return {
    spec: { type: 'p10p50p90', p10: figures.p10 * f, p50: figures.p50 * f, p90: figures.p90 * f },
    basis: summary.pooled.released ? 'pooled' : 'own',
    n: figures.n,
    firms: figures.firms,
  };
}
