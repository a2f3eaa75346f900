import { KPA_PER_PSF, METRES_PER_FOOT } from '../../../src/lib/consolidation/units';
import { sampleQualityClass } from '../../../src/lib/import/sample-quality';
import { type Random, round } from './random';
import { drawSpecimen } from './specimen';
import type { DemoRecord, PlantedOutlierKind } from './types';

const PREFERRED_FIRM: Record<PlantedOutlierKind, string> = {
  'stress-in-psf': 'ellery-voss',
  'peat-labelled-as-silt': 'quillfen',
  'depth-in-feet': 'northmarch',
  'permeability-in-cm-per-s': 'quillfen',
};

/**
 * Plants a few gross, plausible-looking mistakes for the steward to catch statistically. Each stays
 * inside the importer's hard ranges; only the pool shows that it is wrong.
 *
 * - stress-in-psf: an estuarine clay σ'p typed in psf as if kPa (×20.9); OCR and the quality class
 *   follow it. The test's increments still show the true σ'p.
 * - peat-labelled-as-silt: a peat specimen's results filed under Tamsel Alluvial Silt (ML).
 * - depth-in-feet: a peat sample's depths typed in feet (×3.28), below the base of the peat.
 * - permeability-in-cm-per-s: k of a soft clay typed in cm/s as if m/s (×100).
 */
export function plantOutliers(rng: Random, records: DemoRecord[]): void {
  const plant = (kind: PlantedOutlierKind, eligible: (r: DemoRecord) => boolean, change: (r: DemoRecord) => void) => {
    const candidates = records.filter((r) => r.plantedOutlier === null && eligible(r));
    // spread the mistakes over the firms, and give the psf slip a test whose curve contradicts it
    const firm = PREFERRED_FIRM[kind];
    const byFirm = candidates.filter((r) => r.firmSlug === firm);
    const narrowed = byFirm.length > 0 ? byFirm : candidates;
    const withCurve = narrowed.filter((r) => r.increments !== null);
    const pool = kind === 'stress-in-psf' && withCurve.length > 0 ? withCurve : narrowed;
    if (pool.length === 0) return;
    const record = rng.pick(pool);
    change(record);
    record.plantedOutlier = kind;
  };

  plant(
    'stress-in-psf',
    (r) => r.geologicalUnit === 'Saltreach Estuarine Clay' && (r.depthTop ?? 0) >= 3 && (r.sampleQualityClass ?? 4) <= 2,
    (r) => {
      const sigmaP = Math.round((r.preconsolidationStress ?? 0) / KPA_PER_PSF);
      r.preconsolidationStress = sigmaP;
      r.overconsolidationRatio = round(sigmaP / (r.verticalEffectiveStress ?? 1), 2);
      r.sampleQualityClass = sampleQualityClass(r.deltaEOverE0, r.overconsolidationRatio);
    },
  );

  plant(
    'peat-labelled-as-silt',
    (r) => r.geologicalUnit === 'Tamsel Alluvial Silt',
    (r) => {
      const depthMid = ((r.depthTop ?? 0) + (r.depthBottom ?? 0)) / 2;
      const peat = drawSpecimen(rng, 'vennmoor-peat', depthMid, r.verticalEffectiveStress ?? 10, false);
      Object.assign(r, {
        waterContentPct: peat.waterContentPct,
        liquidLimitPct: null,
        plasticLimitPct: null,
        plasticityIndexPct: null,
        specificGravity: peat.specificGravity,
        bulkUnitWeight: peat.bulkUnitWeight,
        initialVoidRatio: peat.initialVoidRatio,
        organicContentPct: peat.organicContentPct,
        compressionIndex: peat.compressionIndex,
        recompressionIndex: peat.recompressionIndex,
        preconsolidationStress: peat.preconsolidationStress,
        overconsolidationRatio: peat.overconsolidationRatio,
        cvNc: peat.cvNc,
        cvOc: peat.cvOc,
        secondaryCompressionIndex: peat.secondaryCompressionIndex,
        mv: peat.mv,
        permeability: peat.permeability,
        deltaEOverE0: peat.deltaEOverE0,
        sampleQualityClass: peat.sampleQualityClass,
        uscsSymbol: 'ML',
        increments: null,
      });
    },
  );

  plant(
    'depth-in-feet',
    (r) => r.geologicalUnit === 'Vennmoor Peat' && (r.depthTop ?? 0) >= 2,
    (r) => {
      r.depthTop = round((r.depthTop ?? 0) / METRES_PER_FOOT, 1);
      r.depthBottom = round((r.depthBottom ?? 0) / METRES_PER_FOOT, 1);
    },
  );

  plant(
    'permeability-in-cm-per-s',
    (r) => r.geologicalUnit === 'Vennmoor Organic Clay' || r.geologicalUnit === 'Saltreach Estuarine Clay',
    (r) => {
      r.permeability = Number(((r.permeability ?? 0) * 100).toPrecision(3));
    },
  );
}
