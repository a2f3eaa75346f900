import { splitRow, type ValidRow } from '../../import';
import { type IncrementToStore, type RecordToStore, toPrivateValues } from './record-to-store';

/** A validated, anonymised row in the bank's columns. Unloading steps are those below an earlier stress. */
export function toRecordToStore(valid: ValidRow): RecordToStore {
  const { shared, private: own, flags } = splitRow(valid);
  let maxStress = 0;
  const increments: IncrementToStore[] = shared.increments.map((inc) => {
    const isUnloading = inc.appliedStressKpa < maxStress;
    maxStress = Math.max(maxStress, inc.appliedStressKpa);
    return {
      incrementNo: inc.incrementNo,
      appliedStressKpa: inc.appliedStressKpa,
      isUnloading,
      durationHours: null,
      endDeformationMm: null,
      endVoidRatio: inc.voidRatioEnd,
      specimenHeightMm: null,
    };
  });
  return {
    rowNumber: valid.row,
    shared: {
      region_id: shared.regionId,
      geological_unit_id: shared.geologicalUnitId,
      location_cell: shared.locationCell,
      depth_top_m: shared.depthTop,
      depth_bottom_m: shared.depthBottom,
      uscs_symbol: shared.uscsSymbol,
      sampling_method: shared.samplingMethod,
      water_content_pct: shared.waterContentPct,
      liquid_limit_pct: shared.liquidLimitPct,
      plastic_limit_pct: shared.plasticLimitPct,
      plasticity_index_pct: shared.plasticityIndexPct,
      specific_gravity: shared.specificGravity,
      bulk_unit_weight_kn_per_m3: shared.bulkUnitWeight,
      initial_void_ratio: shared.initialVoidRatio,
      organic_content_pct: shared.organicContentPct,
      test_method: shared.testMethod,
      test_standard: shared.testStandard,
      compression_index: shared.compressionIndex,
      recompression_index: shared.recompressionIndex,
      preconsolidation_stress_kpa: shared.preconsolidationStress,
      vertical_effective_stress_kpa: shared.verticalEffectiveStress,
      overconsolidation_ratio: shared.overconsolidationRatio,
      cv_nc_m2_per_year: shared.cvNc,
      cv_oc_m2_per_year: shared.cvOc,
      secondary_compression_index: shared.secondaryCompressionIndex,
      mv_m2_per_mn: shared.mv,
      permeability_m_per_s: shared.permeability,
      delta_e_over_e0: shared.deltaEOverE0,
      sample_quality_class: shared.sampleQualityClass,
    },
    private: toPrivateValues(own),
    increments,
    flags,
  };
}
