import { type CasagrandeChoice, type CasagrandeConstruction, casagrandePreconsolidation } from './casagrande-preconsolidation';
import { type CompressionCurve, compressionCurve } from './compression-curve';
import { type CompressionIndexChoice, compressionIndex } from './compression-index';
import { crsPoints } from './crs-points';
import { because, type Derived } from './outcome';
import type { SlopeFit } from './slope-fit';
import { specimenState } from './specimen-state';
import {
  type StrainEnergyChoice,
  type StrainEnergyConstruction,
  strainEnergyPreconsolidation,
} from './strain-energy-preconsolidation';
import type { IncrementInput, SpecimenInput } from './test-input';

/** One reading of a constant-rate-of-strain test (ASTM D4186/D4186M): drained top, pore pressure read at the sealed base. */
export interface CrsReading {
  elapsedMin: number;
  /** total axial stress, kPa */
  axialStressKpa: number;
  /** excess pore pressure at the base, kPa */
  basePorePressureKpa: number;
  /** settlement since the start, mm */
  deformationMm: number;
}

export interface CrsTestInput {
  specimen: SpecimenInput;
  readings: readonly CrsReading[];
}

export interface CrsPoint {
  elapsedMin: number;
  /** σ′v = σv − (2/3)·ub, kPa */
  effectiveStressKpa: number;
  voidRatio: number;
  strain: number;
  /** ub/σv */
  porePressureRatio: number;
  /** from this reading and the one before; null for the first, or where ub ≤ 0 or the stress does not rise */
  kMPerS: number | null;
  cvM2PerYear: number | null;
  /** ub/σv within RECOMMENDED_PORE_PRESSURE_RATIO */
  inRecommendedRange: boolean;
}

export interface CrsInterpretation {
  points: Derived<CrsPoint[]>;
  /** the readings grouped into points 1/BIN_LOG_CYCLES per log cycle of σ′v, for the e–log σ′ constructions */
  curve: Derived<CompressionCurve>;
  cc: Derived<SlopeFit>;
  sigmaPCasagrande: Derived<CasagrandeConstruction>;
  sigmaPStrainEnergy: Derived<StrainEnergyConstruction>;
}

export { crsPoints, RECOMMENDED_PORE_PRESSURE_RATIO } from './crs-points';

const BIN_LOG_CYCLES = 0.05;

/**
 * A CRS test by the linear theory of Wissa, Christian, Davis & Heiberg (1971), "Consolidation at constant
 * rate of strain", J. Soil Mech. Found. Div. 97(SM10) (ASTM D4186/D4186M): σ′v = σv − (2/3)·ub;
 * k = ε̇·H²·γw/(2·ub) with H the current height; mv = Δε/Δσ′v between readings; cv = k/(mv·γw).
 * The e–log σ′v curve, grouped into points, gives Cc and σ′p by the same constructions as an incremental test.
 */
export function interpretCrsTest(
  test: CrsTestInput,
  choices: { cc?: CompressionIndexChoice; casagrande?: CasagrandeChoice; strainEnergy?: StrainEnergyChoice } = {},
): CrsInterpretation {
  const points = crsPoints(test);
  if (!points.ok) {
    const failed = because('crs', points);
    return {
      points,
      curve: because('curve', failed),
      cc: because('cc', failed),
      sigmaPCasagrande: because('sigmaPCasagrande', failed),
      sigmaPStrainEnergy: because('sigmaPStrainEnergy', failed),
    };
  }
  const state = specimenState(test.specimen);
  const curve = compressionCurve({
    specimen: {
      initialVoidRatio: state.ok ? state.value.e0 : null,
      initialHeightMm: test.specimen.initialHeightMm,
      diameterMm: test.specimen.diameterMm,
    },
    increments: binned(points.value),
  });
  if (!curve.ok)
    return {
      points,
      curve,
      cc: because('cc', curve),
      sigmaPCasagrande: because('sigmaPCasagrande', curve),
      sigmaPStrainEnergy: because('sigmaPStrainEnergy', curve),
    };
  const virginRange = choices.casagrande?.virginRange ?? choices.cc?.range;
  return {
    points,
    curve,
    cc: compressionIndex(curve.value, choices.cc),
    sigmaPCasagrande: casagrandePreconsolidation(curve.value, { ...choices.casagrande, ...(virginRange ? { virginRange } : {}) }),
    sigmaPStrainEnergy: strainEnergyPreconsolidation(curve.value, choices.strainEnergy),
  };
}

/** Consecutive points grouped while log10 σ′v stays in one BIN_LOG_CYCLES bin; each group is one curve point (geometric-mean stress, mean e). */
function binned(points: readonly CrsPoint[]): IncrementInput[] {
  const groups: CrsPoint[][] = [];
  let key: number | null = null;
  for (const p of points) {
    if (!(p.effectiveStressKpa > 0)) continue;
    const k = Math.floor(Math.log10(p.effectiveStressKpa) / BIN_LOG_CYCLES);
    if (k !== key) groups.push([]);
    key = k;
    groups[groups.length - 1]?.push(p);
  }
  return groups.map((g, i) => ({
    incrementNo: i + 1,
    stressKpa: 10 ** (g.reduce((s, p) => s + Math.log10(p.effectiveStressKpa), 0) / g.length),
    voidRatio: g.reduce((s, p) => s + p.voidRatio, 0) / g.length,
  }));
}
