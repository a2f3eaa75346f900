import { type CasagrandeChoice, type CasagrandeConstruction, casagrandePreconsolidation } from './casagrande-preconsolidation';
import { type CompressionCurve, compressionCurve } from './compression-curve';
import { type CompressionIndexChoice, compressionIndex } from './compression-index';
import { type IncrementChoice, type IncrementInterpretation, interpretIncrement } from './increment-interpretation';
import { because, type Derived, type Undetermined } from './outcome';
import { type RecompressionIndexChoice, recompressionIndex } from './recompression-index';
import { type SampleQuality, sampleQuality } from './sample-quality';
import type { SlopeFit } from './slope-fit';
import {
  type StrainEnergyChoice,
  type StrainEnergyConstruction,
  strainEnergyPreconsolidation,
} from './strain-energy-preconsolidation';
import type { IncrementalTestInput } from './test-input';

/**
 * What a person (a steward) chose instead of the automatic choices. Stored with the result, it recomputes
 * the same values; every field is optional and absent means "automatic".
 */
export interface InterpretationChoices {
  cc?: CompressionIndexChoice;
  cr?: RecompressionIndexChoice;
  casagrande?: CasagrandeChoice;
  strainEnergy?: StrainEnergyChoice;
  /** by increment number */
  increments?: Readonly<Record<number, IncrementChoice>>;
}

export interface InterpretationContext {
  /** in-situ vertical effective stress σ′v0 of the sample, kPa, for Δe/e0 */
  verticalEffectiveStressKpa?: number | null;
}

export interface IncrementalInterpretation {
  curve: Derived<CompressionCurve>;
  cc: Derived<SlopeFit>;
  cr: Derived<SlopeFit>;
  sigmaPCasagrande: Derived<CasagrandeConstruction>;
  sigmaPStrainEnergy: Derived<StrainEnergyConstruction>;
  /** one per increment, in the order applied; empty when the curve cannot be drawn */
  increments: IncrementInterpretation[];
  sampleQuality: Derived<SampleQuality>;
  /** the choices the values were computed with (echoed, so they can be stored beside them) */
  choices: InterpretationChoices;
}

/** Interprets an incremental-loading test (ASTM D2435/D2435M, ISO 17892-5) from its readings. Pure; never throws on bad readings. */
export function interpretIncrementalTest(
  test: IncrementalTestInput,
  choices: InterpretationChoices = {},
  context: InterpretationContext = {},
): IncrementalInterpretation {
  const curve = compressionCurve(test);
  if (!curve.ok) return failedCurve(curve, choices);
  const c = curve.value;
  const virginRange = choices.casagrande?.virginRange ?? choices.cc?.range;
  const casagrande = casagrandePreconsolidation(c, { ...choices.casagrande, ...(virginRange ? { virginRange } : {}) });
  const strainEnergy = strainEnergyPreconsolidation(c, choices.strainEnergy);
  const sigmaP = casagrande.ok ? casagrande.value.sigmaPKpa : strainEnergy.ok ? strainEnergy.value.sigmaPKpa : null;
  const byNumber = new Map(test.increments.map((inc) => [inc.incrementNo, inc]));
  return {
    curve,
    cc: compressionIndex(c, choices.cc),
    cr: recompressionIndex(c, choices.cr),
    sigmaPCasagrande: casagrande,
    sigmaPStrainEnergy: strainEnergy,
    increments: c.states.map((s, i) =>
      interpretIncrement(c, i, byNumber.get(s.incrementNo), test.drainage ?? 'double', choices.increments?.[s.incrementNo]),
    ),
    sampleQuality: sampleQuality(c, context.verticalEffectiveStressKpa, sigmaP),
    choices,
  };
}

function failedCurve(curve: Undetermined, choices: InterpretationChoices): IncrementalInterpretation {
  return {
    curve,
    cc: because('cc', curve),
    cr: because('cr', curve),
    sigmaPCasagrande: because('sigmaPCasagrande', curve),
    sigmaPStrainEnergy: because('sigmaPStrainEnergy', curve),
    increments: [],
    sampleQuality: because('deltaEOverE0', curve),
    choices,
  };
}
