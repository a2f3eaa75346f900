/** How each statistics parameter is shown: its display quantity (units/display.ts) and a short label. */
import type { ParameterKey } from '../../lib/statistics';
import type { QuantityKind } from '../../lib/units/display';

export const PARAMETER_QUANTITY: Readonly<Record<ParameterKey, QuantityKind>> = {
  waterContentPct: 'percent',
  liquidLimitPct: 'percent',
  plasticLimitPct: 'percent',
  plasticityIndexPct: 'percent',
  specificGravity: 'ratio',
  bulkUnitWeightKnPerM3: 'unitWeight',
  initialVoidRatio: 'ratio',
  organicContentPct: 'percent',
  compressionIndex: 'ratio',
  recompressionIndex: 'ratio',
  preconsolidationStressKpa: 'stress',
  verticalEffectiveStressKpa: 'stress',
  overconsolidationRatio: 'ratio',
  cvNcM2PerYear: 'cv',
  cvOcM2PerYear: 'cv',
  secondaryCompressionIndex: 'ratio',
  secondaryCompressionIndexNc: 'ratio',
  secondaryCompressionIndexOc: 'ratio',
  mvM2PerMn: 'mv',
  permeabilityMPerS: 'permeability',
  deltaEOverE0: 'ratio',
};

/** The cards of the Typical values tab, in the order an engineer reads them: compressibility, time, index. */
export const CARD_PARAMETERS: readonly ParameterKey[] = [
  'cvNcM2PerYear',
  'cvOcM2PerYear',
  'compressionIndex',
  'recompressionIndex',
  'initialVoidRatio',
  'secondaryCompressionIndex',
  'preconsolidationStressKpa',
  'overconsolidationRatio',
  'waterContentPct',
  'liquidLimitPct',
  'plasticityIndexPct',
  'bulkUnitWeightKnPerM3',
];
