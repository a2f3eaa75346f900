/**
 * Unit scaling of parameter specs: every distribution the request can give scales linearly, so a
 * unit change multiplies each of its numbers by the same factor.
 */
import type { DepthParameterInput, ParameterInput } from '../schemas/estimate-preview';
import type { DepthParameterSpec, ParameterSpec } from './engine-input';

/** Scales every number of a parameter spec by `factor` (all distributions here scale linearly). */
export function scaleSpec(spec: ParameterInput, factor: number): ParameterSpec {
  if (typeof spec === 'number') return spec * factor;
  switch (spec.type) {
    case 'normal':
    case 'lognormal':
      return { type: spec.type, mean: spec.mean * factor, sd: spec.sd * factor };
    case 'triangular':
      return { type: 'triangular', min: spec.min * factor, mode: spec.mode * factor, max: spec.max * factor };
    case 'p10p50p90':
      return { type: 'p10p50p90', p10: spec.p10 * factor, p50: spec.p50 * factor, p90: spec.p90 * factor };
  }
}

/** Scales a σ'p or OCR spec, including a linear profile's end values. */
export function scaleDepthSpec(spec: DepthParameterInput, factor: number): DepthParameterSpec {
  if (typeof spec === 'object' && spec.type === 'linear') {
    return { type: 'linear', top: spec.top * factor, bottom: spec.bottom * factor };
  }
  return scaleSpec(spec, factor);
}
