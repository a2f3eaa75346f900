import { cannot, type Derived, determined, shown } from './outcome';
import type { SpecimenInput } from './test-input';

/** Density of water used for the solids volume, g/cm³ (common practice for laboratory work at room temperature). */
const WATER_DENSITY_G_PER_CM3 = 1;

export interface SpecimenState {
  e0: number;
  /** how e0 was found: from the dry mass (ASTM D2435 height of solids), as given, or from w·Gs assuming saturation */
  basis: 'dry-mass' | 'given' | 'water-content';
  initialHeightMm: number | null;
  /** height of solids Hs = H0/(1 + e0), mm; null without the initial height */
  solidsHeightMm: number | null;
  /** remarks on the inputs (e.g. a given e0 that disagrees with the dry mass) */
  notes: string[];
}

const positive = (v: number | null | undefined): v is number => typeof v === 'number' && Number.isFinite(v) && v > 0;

/**
 * The specimen's initial void ratio and height of solids. With the dry mass, diameter, height and Gs,
 * Hs = Md/(Gs·ρw·A) and e0 = H0/Hs − 1 (ASTM D2435/D2435M, calculation of the height of solids). Else
 * a given e0; else e0 = w·Gs for a saturated specimen (Se = wGs with S = 1, phase relations).
 */
export function specimenState(specimen: SpecimenInput): Derived<SpecimenState> {
  const h0 = positive(specimen.initialHeightMm) ? specimen.initialHeightMm : null;
  const notes: string[] = [];
  const { dryMassG, diameterMm, specificGravity: gs, initialVoidRatio: given, waterContentPct: w } = specimen;
  let e0: number | null = null;
  let basis: SpecimenState['basis'] = 'given';
  if (h0 !== null && positive(dryMassG) && positive(diameterMm) && positive(gs)) {
    const areaCm2 = (Math.PI * (diameterMm / 10) ** 2) / 4;
    const solidsHeightCm = dryMassG / (gs * WATER_DENSITY_G_PER_CM3 * areaCm2);
    e0 = h0 / 10 / solidsHeightCm - 1;
    basis = 'dry-mass';
    if (positive(given) && Math.abs(given - e0) > 0.05) {
      notes.push(`The given e0 ${shown(given)} differs from ${shown(e0)} worked out from the dry mass; the dry mass is used.`);
    }
  } else if (positive(given)) {
    e0 = given;
  } else if (positive(w) && positive(gs)) {
    e0 = (w / 100) * gs;
    basis = 'water-content';
    notes.push('e0 is worked out from w·Gs, assuming the specimen was saturated.');
  }
  if (e0 === null) {
    return cannot('e0', 'missing-input', 'give e0, or the dry mass with height, diameter and Gs, or the water content with Gs.');
  }
  if (!(e0 > 0 && e0 < 20)) {
    return cannot('e0', 'out-of-range', `e0 works out at ${shown(e0)}, outside 0 to 20; check the dry mass, dimensions and Gs.`);
  }
  return determined({ e0, basis, initialHeightMm: h0, solidsHeightMm: h0 === null ? null : h0 / (1 + e0), notes });
}
