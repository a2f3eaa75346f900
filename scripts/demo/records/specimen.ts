import { type SampleQualityClass, sampleQualityClass } from '../../../src/lib/import/sample-quality';
import { type CompressionCurve, voidRatioOnLoading } from './curve';
import { drawIndexProperties, type IndexProperties } from './index-properties';
import { clamp, type Random, round, significant } from './random';
import { type DemoUnitSlug, UNIT_SPECS } from './scenario';
import { GAMMA_W_KN_PER_M3 } from './site-plan';

/**
 * One invented oedometer specimen: index properties, then e0 ≈ wn·Gs/100 (saturated), Cc from e0
 * and LL with log-normal scatter, σ'p = OCR·σ'v0, Cr and Cα as fractions of Cc, cv NC falling with
 * LL and cv OC a log-normal multiple of it, mv and k from the same e–log σ' curve, and Δe/e0 with
 * its class as the importer works it out. A poor sample loses Cc, σ'p and sharpness of the curve,
 * and sits in class 3 or 4 (where OCR ≤ 4 defines a class).
 */
export interface Specimen extends IndexProperties {
  bulkUnitWeight: number;
  initialVoidRatio: number;
  compressionIndex: number;
  recompressionIndex: number;
  preconsolidationStress: number;
  verticalEffectiveStress: number;
  overconsolidationRatio: number;
  cvNc: number;
  cvOc: number;
  secondaryCompressionIndex: number;
  mv: number;
  permeability: number;
  deltaEOverE0: number;
  sampleQualityClass: SampleQualityClass | null;
  curve: CompressionCurve;
}

const SECONDS_PER_YEAR = 365.25 * 24 * 3600;
/** Design stress increment for mv and k, kPa. */
const DESIGN_INCREMENT_KPA = 100;

/**
 * Δe/e0 class limits by OCR (Lunne, Berre & Strandvik 1997): upper limits of classes 1, 2 and 3.
 * The paper covers OCR 1–4; above 4 the OCR 2–4 row is used for drawing values (the importer leaves
 * the class blank there).
 */
function qualityLimits(ocr: number): readonly [number, number, number] {
  return ocr < 2 ? [0.04, 0.07, 0.14] : [0.03, 0.05, 0.1];
}

// source: invented demo scenario (demo-scenario.md), typical values common practice
function drawCc(rng: Random, unit: DemoUnitSlug, e0: number, ll: number | null): number {
  const liquidLimit = ll ?? 0;
  switch (unit) {
    case 'saltreach-estuarine-clay':
      return (0.6 * 0.42 * (e0 - 0.25) + 0.4 * 0.0125 * (liquidLimit - 10)) * Math.exp(rng.normal(0, 0.11));
    case 'vennmoor-peat':
      return 0.5 * (e0 - 0.8) * Math.exp(rng.normal(0, 0.14));
    case 'vennmoor-organic-clay':
      return (0.6 * 0.45 * (e0 - 0.4) + 0.4 * 0.0115 * (liquidLimit - 10)) * Math.exp(rng.normal(0, 0.1));
    case 'orrin-glaciolacustrine-clay':
      return (0.5 * 0.45 * (e0 - 0.2) + 0.5 * 0.009 * (liquidLimit - 10)) * Math.exp(rng.normal(0, 0.12));
    case 'tamsel-alluvial-silt':
      return (0.5 * 0.35 * (e0 - 0.25) + 0.5 * 0.0075 * (liquidLimit - 5)) * Math.exp(rng.normal(0, 0.13));
  }
}

// source: invented demo scenario (demo-scenario.md), typical values common practice
function drawOcr(rng: Random, unit: DemoUnitSlug, depthMidM: number, sigmaV0Kpa: number): number {
  switch (unit) {
    case 'saltreach-estuarine-clay':
      // desiccated crust above 3 m, OCR 2–6 and higher towards the surface; 1.0–1.5 below
      if (depthMidM < 3) return clamp(2 + (3 - depthMidM) * 1.4 * Math.exp(rng.normal(0, 0.3)) + rng.uniform(0, 0.6), 2, 6);
      return clamp(rng.logNormal(1.22, 0.09), 1.0, 1.5);
    case 'vennmoor-peat':
      return clamp(rng.logNormal(1.35, 0.18), 1.0, 2.0);
    case 'vennmoor-organic-clay':
      return clamp(rng.logNormal(1.3, 0.15), 1.0, 1.8);
    case 'orrin-glaciolacustrine-clay': {
      // eroded overburden: a roughly constant pre-overburden pressure, so OCR falls with depth (2–8)
      const ocr = (sigmaV0Kpa + rng.logNormal(230, 0.25)) / sigmaV0Kpa;
      return ocr > 7.5 ? rng.uniform(6.8, 8) : Math.max(2, ocr);
    }
    case 'tamsel-alluvial-silt':
      return clamp((sigmaV0Kpa + rng.logNormal(18, 0.35)) / sigmaV0Kpa, 1.05, 2.5);
  }
}

function drawDeltaEOverE0(rng: Random, ocr: number, poor: boolean): number {
  const [veryGood, good, poorLimit] = qualityLimits(ocr);
  if (poor) return round(rng.uniform(good * 1.05, poorLimit * 1.5), 3);
  for (let attempt = 0; attempt < 20; attempt++) {
    const q = round(rng.logNormal(veryGood * 0.95, 0.3), 3);
    if (q < good && q >= 0.005) return q;
  }
  return round(veryGood * 0.9, 3);
}

export function drawSpecimen(rng: Random, unit: DemoUnitSlug, depthMidM: number, sigmaV0Kpa: number, poor: boolean): Specimen {
  const spec = UNIT_SPECS[unit];
  const index = drawIndexProperties(rng, unit, depthMidM);
  const peat = unit === 'vennmoor-peat';
  // saturated: e0 = wn·Gs (Se = wGs with S = 1), with a few per cent of scatter
  const e0Saturated = ((index.waterContentPct * index.specificGravity) / 100) * (1 + rng.normal(0, 0.04));
  const e0 = round(clamp(e0Saturated, spec.e0Range[0], spec.e0Range[1]), peat ? 2 : 3);
  const ccIntact = clamp(drawCc(rng, unit, e0, index.liquidLimitPct), spec.ccRange[0], spec.ccRange[1]);
  const cc = round(poor ? ccIntact * rng.uniform(0.65, 0.82) : ccIntact, peat ? 2 : 3);
  const cr = significant(cc * rng.uniform(spec.crOverCc[0], spec.crOverCc[1]), 3);
  const calpha = significant(cc * rng.uniform(spec.calphaOverCc[0], spec.calphaOverCc[1]), 3);
  const ocrIntact = drawOcr(rng, unit, depthMidM, sigmaV0Kpa);
  const sigmaP = significant(sigmaV0Kpa * ocrIntact * (poor ? rng.uniform(0.72, 0.88) : 1), 3);
  const ocr = round(sigmaP / sigmaV0Kpa, 2);
  const deltaEOverE0 = drawDeltaEOverE0(rng, ocr, poor);

  const llShift = index.liquidLimitPct === null ? 0 : index.liquidLimitPct - spec.llRef;
  const cvNc = significant(
    10 ** (Math.log10(spec.cvNcMedian) + spec.cvLog10PerLlPct * llShift + rng.normal(0, spec.cvNcLog10Sd)),
    3,
  );
  const ocRatio = Math.max(2, rng.logNormal(spec.cvOcRatio, 0.35)) * (poor ? rng.uniform(0.5, 0.8) : 1);
  const cvOc = significant(cvNc * ocRatio, 3);

  const curve: CompressionCurve = {
    e0,
    deltaEOverE0,
    sigmaV0Kpa,
    sigmaPKpa: sigmaP,
    cr,
    cc,
    transitionLogCycles: poor ? rng.uniform(0.25, 0.35) : rng.uniform(0.07, 0.13),
  };
  const eStart = voidRatioOnLoading(curve, sigmaV0Kpa);
  const eEnd = voidRatioOnLoading(curve, sigmaV0Kpa + DESIGN_INCREMENT_KPA);
  const mvPerKpa = (eStart - eEnd) / (1 + eStart) / DESIGN_INCREMENT_KPA;
  const designTop = sigmaV0Kpa + DESIGN_INCREMENT_KPA;
  const cvDesign = designTop > 1.5 * sigmaP ? cvNc : designTop > sigmaP ? Math.sqrt(cvNc * cvOc) : cvOc;
  // k = cv·mv·γw (Terzaghi's definition of cv), cv in m²/s and mv in 1/kPa
  const permeability = (cvDesign / SECONDS_PER_YEAR) * mvPerKpa * GAMMA_W_KN_PER_M3;
  const gammaBulk = ((index.specificGravity + e0) / (1 + e0)) * GAMMA_W_KN_PER_M3 + rng.normal(0, 0.15);

  return {
    ...index,
    bulkUnitWeight: round(gammaBulk, 1),
    initialVoidRatio: e0,
    compressionIndex: cc,
    recompressionIndex: cr,
    preconsolidationStress: sigmaP,
    verticalEffectiveStress: sigmaV0Kpa,
    overconsolidationRatio: ocr,
    cvNc,
    cvOc,
    secondaryCompressionIndex: calpha,
    mv: significant(mvPerKpa * 1000, 3),
    permeability: significant(permeability, 3),
    deltaEOverE0,
    sampleQualityClass: sampleQualityClass(deltaEOverE0, ocr),
    curve,
  };
}
