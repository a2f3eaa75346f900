/** Values compared with the deposit's published records; cv on a log scale. */
export const COMPARED = [
  { key: 'compressionIndex', column: 'compression_index', log: false },
  { key: 'recompressionIndex', column: 'recompression_index', log: false },
  { key: 'initialVoidRatio', column: 'initial_void_ratio', log: false },
  { key: 'waterContentPct', column: 'water_content_pct', log: false },
  { key: 'liquidLimitPct', column: 'liquid_limit_pct', log: false },
  { key: 'overconsolidationRatio', column: 'overconsolidation_ratio', log: false },
  { key: 'preconsolidationStressKpa', column: 'preconsolidation_stress_kpa', log: false },
  { key: 'cvNcM2PerYear', column: 'cv_nc_m2_per_year', log: true },
  { key: 'secondaryCompressionIndex', column: 'secondary_compression_index', log: false },
] as const;
