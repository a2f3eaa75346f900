/**
 * Splits the profile into drainage groups: runs of adjacent compressible layers bounded by the
 * profile's top and bottom boundaries or by free-draining layers (which act as pervious
 * boundaries). Each group consolidates on its own.
 */
import type { EngineInput } from './engine-input';
import type { Boundary } from './terzaghi';

export interface DrainageGroup {
  /** Compressible layers of the group, top to bottom. */
  layerIndices: number[];
  top: Boundary;
  bottom: Boundary;
}

/** Drainage groups of the profile, top to bottom, with their boundary conditions (UFC 3-220-10 §5-5.3). */
export function drainageGroups(input: EngineInput): DrainageGroup[] {
  const groups: DrainageGroup[] = [];
  let current: number[] = [];
  let top: Boundary = input.drainage.top;
  input.layers.forEach((layer, i) => {
    if (layer.compressible) {
      current.push(i);
      return;
    }
    if (current.length > 0) groups.push({ layerIndices: current, top, bottom: 'pervious' });
    current = [];
    top = 'pervious';
  });
  if (current.length > 0) groups.push({ layerIndices: current, top, bottom: input.drainage.bottom });
  return groups;
}

/**
 * Characteristic time τ = Hdr'²/cv' of the equivalent single layer, years, so that Tv = t/τ.
 * Each layer is transformed to the reference cv' by H'n = Hn·√(cv'/cvn) and H' = ΣH'n (UFC
 * 3-220-10 Eqs. 5-16, 5-17); Hdr' = H' (one-way) or H'/2 (two-way), so τ = (Σ Hn/√cvn)²/(1 or 4),
 * independent of cv'. Thicknesses in m, cv in m²/yr.
 */
export function equivalentLayerTauYears(
  thicknessesM: ArrayLike<number>,
  cvM2PerYear: ArrayLike<number>,
  bothDrained: boolean,
): number {
  let sum = 0;
  for (let i = 0; i < thicknessesM.length; i++) sum += (thicknessesM[i] as number) / Math.sqrt(cvM2PerYear[i] as number);
  return (sum * sum) / (bothDrained ? 4 : 1);
}
