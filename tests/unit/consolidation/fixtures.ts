import type { EstimatePreviewBody } from '../../../src/lib/schemas/estimate-preview';

/** A two-layer soft profile under a finite embankment (SI), used by several tests. */
export function embankmentBody(overrides: Partial<EstimatePreviewBody> = {}): EstimatePreviewBody {
  return {
    unitSystem: 'SI',
    waterTableDepth: 1,
    layers: [
      {
        name: 'Soft clay',
        thickness: 6,
        unitWeightAboveWater: 16,
        unitWeightBelowWater: 16.5,
        cc: 0.9,
        cr: 0.09,
        e0: 2.1,
        ocr: 1.3,
        cv: 1.5,
        cAlphaOverCc: 'organic-clay-silt',
      },
      {
        name: 'Silty clay',
        thickness: 8,
        unitWeightAboveWater: 18,
        unitWeightBelowWater: 18.5,
        cc: 0.45,
        cr: 0.05,
        e0: 1.2,
        sigmaP: { type: 'linear', top: 90, bottom: 140 },
        cv: 4,
        cAlpha: 0.012,
      },
    ],
    load: { type: 'embankment', fillHeight: 3, fillUnitWeight: 20, crestWidth: 16, sideSlopeWidth: 6, pointOffset: 2 },
    drainage: { top: 'pervious', bottom: 'pervious' },
    options: { designLifeYears: 60, timePointsYears: [0.5, 2, 10] },
    ...overrides,
  };
}
