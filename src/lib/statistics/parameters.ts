/**
 * The parameters the statistics cover, named as the API names a record's columns, each with its
 * trade symbol, SI unit, the scale its statistics are taken on, and its masking band (masking.ts).
 */

export type ParameterScale = 'linear' | 'log';

/** Keys equal the record fields of the API (and the aliases of SHARED_RECORD_COLUMNS). */
export const PARAMETER_KEYS = [
  'waterContentPct',
  'liquidLimitPct',
  'plasticLimitPct',
  'plasticityIndexPct',
  'specificGravity',
  'bulkUnitWeightKnPerM3',
  'initialVoidRatio',
  'organicContentPct',
  'compressionIndex',
  'recompressionIndex',
  'preconsolidationStressKpa',
  'verticalEffectiveStressKpa',
  'overconsolidationRatio',
  'cvNcM2PerYear',
  'cvOcM2PerYear',
  'secondaryCompressionIndex',
  'secondaryCompressionIndexNc',
  'secondaryCompressionIndexOc',
  'mvM2PerMn',
  'permeabilityMPerS',
  'deltaEOverE0',
] as const;
export type ParameterKey = (typeof PARAMETER_KEYS)[number];

export interface ParameterDefinition {
  key: ParameterKey;
  /** The trade's symbol. */
  symbol: string;
  /** Plain-English name. */
  name: string;
  /** SI unit as shown ('' for a ratio). */
  unit: string;
  scale: ParameterScale;
  /**
   * Masking band: for linear parameters each value is multiplied by 1 ± m, for log parameters by
   * exp(±m), with m uniform on [min, max] (masking.ts).
   */
  maskBand: { min: number; max: number };
  /** Typical within-deposit spread (CoV, or ln sd for cv and k) that sets the band. */
  typicalSpread: number;
  /** Salt of the masking hash; fixed for ever, so a test's mask never changes. */
  maskSalt: number;
}

/**
 * Typical within-deposit spread: coefficient of variation for linear parameters, sd of natural
 * logarithms for cv and k. Rounded from the ranges of Phoon & Kulhawy (1999), "Characterization of
 * geotechnical variability", Can. Geotech. J. 36:612–624 (from memory). It sets the masking band to
 * between a third and two thirds of that spread: enough that no test can be read back closer than a
 * third of the deposit's usual spread, small enough (noise variance ≈ a quarter of the spread's) that
 * the corrected figures stay close to the true ones.
 */
function band(typicalSpread: number): { min: number; max: number } {
  return { min: typicalSpread / 3, max: (2 * typicalSpread) / 3 };
}

function define(
  key: ParameterKey,
  symbol: string,
  name: string,
  unit: string,
  scale: ParameterScale,
  maskSalt: number,
  typicalSpread: number,
): ParameterDefinition {
  return { key, symbol, name, unit, scale, maskBand: band(typicalSpread), typicalSpread, maskSalt };
}

export const PARAMETERS: Readonly<Record<ParameterKey, ParameterDefinition>> = {
  waterContentPct: define('waterContentPct', 'wn', 'natural water content', '%', 'linear', 0x1001, 0.15),
  liquidLimitPct: define('liquidLimitPct', 'LL', 'liquid limit', '%', 'linear', 0x1002, 0.15),
  plasticLimitPct: define('plasticLimitPct', 'PL', 'plastic limit', '%', 'linear', 0x1003, 0.15),
  plasticityIndexPct: define('plasticityIndexPct', 'PI', 'plasticity index', '%', 'linear', 0x1004, 0.25),
  specificGravity: define('specificGravity', 'Gs', 'specific gravity of solids', '', 'linear', 0x1005, 0.015),
  bulkUnitWeightKnPerM3: define('bulkUnitWeightKnPerM3', 'γ', 'bulk unit weight', 'kN/m³', 'linear', 0x1006, 0.05),
  initialVoidRatio: define('initialVoidRatio', 'e0', 'initial void ratio', '', 'linear', 0x1007, 0.2),
  organicContentPct: define('organicContentPct', 'Corg', 'organic content', '%', 'linear', 0x1008, 0.3),
  compressionIndex: define('compressionIndex', 'Cc', 'compression index', '', 'linear', 0x1009, 0.3),
  recompressionIndex: define('recompressionIndex', 'Cr', 'recompression index', '', 'linear', 0x100a, 0.3),
  preconsolidationStressKpa: define('preconsolidationStressKpa', "σ'p", 'preconsolidation stress', 'kPa', 'linear', 0x100b, 0.3),
  verticalEffectiveStressKpa: define(
    'verticalEffectiveStressKpa',
    "σ'v0",
    'in-situ vertical effective stress',
    'kPa',
    'linear',
    0x100c,
    0.15,
  ),
  overconsolidationRatio: define('overconsolidationRatio', 'OCR', 'overconsolidation ratio', '', 'linear', 0x100d, 0.3),
  cvNcM2PerYear: define(
    'cvNcM2PerYear',
    'cv NC',
    'coefficient of consolidation, normally consolidated',
    'm²/year',
    'log',
    0x100e,
    0.6,
  ),
  cvOcM2PerYear: define(
    'cvOcM2PerYear',
    'cv OC',
    'coefficient of consolidation, overconsolidated',
    'm²/year',
    'log',
    0x100f,
    0.6,
  ),
  secondaryCompressionIndex: define('secondaryCompressionIndex', 'Cα', 'secondary compression index', '', 'linear', 0x1010, 0.3),
  secondaryCompressionIndexNc: define(
    'secondaryCompressionIndexNc',
    'Cα NC',
    'secondary compression index, normally consolidated',
    '',
    'linear',
    0x1011,
    0.3,
  ),
  secondaryCompressionIndexOc: define(
    'secondaryCompressionIndexOc',
    'Cα OC',
    'secondary compression index, overconsolidated',
    '',
    'linear',
    0x1012,
    0.3,
  ),
  mvM2PerMn: define('mvM2PerMn', 'mv', 'coefficient of volume compressibility', 'm²/MN', 'linear', 0x1013, 0.3),
  permeabilityMPerS: define('permeabilityMPerS', 'k', 'hydraulic conductivity', 'm/s', 'log', 0x1014, 0.6),
  deltaEOverE0: define('deltaEOverE0', 'Δe/e0', 'sample disturbance measure', '', 'linear', 0x1015, 0.3),
};

/**
 * Why cv and k are summarised on logarithms, in words a card can show. Sources: hydraulic
 * conductivity is log-normally distributed, Freeze (1975), Water Resources Research 11(5):725–741;
 * cv = k/(mv·γw) inherits that spread; Lumb (1966), Can. Geotech. J. 3(2):74–97 on the variability of
 * natural soils (both from memory).
 */
export const LOG_SCALE_REASON =
  'cv and k vary over one or more orders of magnitude between tests of one deposit and their scatter is ' +
  'close to log-normal, so their averages and percentiles are taken on logarithms: the typical value is ' +
  'the geometric mean, and the spread is a factor rather than a difference.';

export function isParameterKey(value: unknown): value is ParameterKey {
  return typeof value === 'string' && (PARAMETER_KEYS as readonly string[]).includes(value);
}
