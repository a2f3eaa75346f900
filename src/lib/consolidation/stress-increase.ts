import type { EngineLoad } from './engine-input';
import { circleStressKpa } from './stress-circle';
import { rectangleStressKpa } from './stress-rectangle';
import { embankmentStressKpa, stripStressKpa } from './stress-strip';
import { twoToOneStressKpa } from './stress-two-to-one';

export interface StressIncrease {
  /** Surface pressure q, kPa. */
  pressureKpa: number;
  /** Plain description of the method and its source. */
  method: string;
  /** Δσz (kPa) at depth z (m) below the settlement point. */
  atDepthKpa: (depthM: number) => number;
}

/**
 * Vertical stress increase below the settlement point for one surface load, with the name of the
 * method used. Elastic solutions assume a homogeneous, isotropic half-space (Boussinesq 1885), so
 * in a layered profile they are approximate. Depths in m, stresses in kPa.
 */
export function stressIncreaseFor(load: EngineLoad): StressIncrease {
  const q = load.pressureKpa;
  switch (load.kind) {
    case 'wideFill':
      return { pressureKpa: q, method: 'Wide fill: Δσ = q at every depth (one-dimensional loading)', atDepthKpa: () => q };
    case 'embankment':
      return {
        pressureKpa: q,
        method: 'Embankment: Boussinesq line load integrated over the trapezoidal section (Osterberg 1957), infinitely long',
        atDepthKpa: (z) => embankmentStressKpa(q, load.crestWidthM, load.sideSlopeWidthM, load.pointOffsetM, z),
      };
    case 'rectangle':
      return {
        pressureKpa: q,
        method: 'Rectangle: Boussinesq corner solutions superposed (Newmark 1935; Fadum 1948)',
        atDepthKpa: (z) => rectangleStressKpa(q, load.widthM, load.lengthM, load.pointXM, load.pointYM, z),
      };
    case 'strip':
      return {
        pressureKpa: q,
        method: 'Strip: Boussinesq strip solution (q/π)[α + sin α cos(α + 2δ)]',
        atDepthKpa: (z) => stripStressKpa(q, load.widthM, load.pointOffsetM, z),
      };
    case 'circle':
      return {
        pressureKpa: q,
        method:
          load.pointOffsetM === 0
            ? 'Circle: Boussinesq closed form below the centre'
            : 'Circle: Boussinesq point load integrated numerically over the loaded area',
        atDepthKpa: (z) => circleStressKpa(q, load.diameterM / 2, load.pointOffsetM, z),
      };
    case 'twoToOne':
      return {
        pressureKpa: q,
        method: `2:1 load spread (${load.shape}), average stress below the loaded area — approximate`,
        atDepthKpa: (z) => twoToOneStressKpa(q, load.shape, load.widthM, load.lengthM, z),
      };
  }
}
