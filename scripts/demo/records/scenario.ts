import type { DEMO_REGIONS, DEMO_UNITS } from '../vocabulary';

/**
 * The invented Saltreach scenario as numbers: per geological unit the typical ranges the generator
 * scatters around, and per firm where it works. Nothing here describes a real place or firm.
 */
export type DemoUnitSlug = (typeof DEMO_UNITS)[number]['slug'];
export type DemoRegionSlug = (typeof DEMO_REGIONS)[number]['slug'];

export interface UnitSpec {
  e0Range: readonly [number, number];
  ccRange: readonly [number, number];
  crOverCc: readonly [number, number];
  calphaOverCc: readonly [number, number];
  /** cv NC (m²/yr) is log-normal: median at LL = llRef, log10 scatter, change of log10 cv per % of LL */
  cvNcMedian: number;
  cvNcLog10Sd: number;
  cvLog10PerLlPct: number;
  llRef: number;
  /** median of cv OC / cv NC */
  cvOcRatio: number;
}

// source: invented demo scenario (demo-scenario.md), typical values common practice
export const UNIT_SPECS: Record<DemoUnitSlug, UnitSpec> = {
  'saltreach-estuarine-clay': {
    e0Range: [1.1, 3.2],
    ccRange: [0.3, 1.5],
    crOverCc: [0.08, 0.15],
    calphaOverCc: [0.035, 0.05],
    cvNcMedian: 1.0,
    cvNcLog10Sd: 0.2,
    cvLog10PerLlPct: -0.012,
    llRef: 72,
    cvOcRatio: 6,
  },
  'vennmoor-peat': {
    e0Range: [5, 12],
    ccRange: [2, 7],
    crOverCc: [0.08, 0.12],
    calphaOverCc: [0.05, 0.07],
    cvNcMedian: 4,
    cvNcLog10Sd: 0.25,
    cvLog10PerLlPct: 0,
    llRef: 0,
    cvOcRatio: 7,
  },
  'vennmoor-organic-clay': {
    e0Range: [1.9, 4.8],
    ccRange: [0.6, 2.3],
    crOverCc: [0.08, 0.15],
    calphaOverCc: [0.045, 0.06],
    cvNcMedian: 0.65,
    cvNcLog10Sd: 0.2,
    cvLog10PerLlPct: -0.007,
    llRef: 105,
    cvOcRatio: 7,
  },
  'orrin-glaciolacustrine-clay': {
    e0Range: [0.5, 1.1],
    ccRange: [0.1, 0.5],
    crOverCc: [0.1, 0.2],
    calphaOverCc: [0.03, 0.045],
    cvNcMedian: 3.2,
    cvNcLog10Sd: 0.2,
    cvLog10PerLlPct: -0.02,
    llRef: 42,
    cvOcRatio: 6,
  },
  'tamsel-alluvial-silt': {
    e0Range: [0.6, 1.25],
    ccRange: [0.07, 0.4],
    crOverCc: [0.12, 0.2],
    calphaOverCc: [0.03, 0.04],
    cvNcMedian: 17,
    cvNcLog10Sd: 0.2,
    cvLog10PerLlPct: -0.03,
    llRef: 32,
    cvOcRatio: 5,
  },
};

/** Share of each firm's records per unit: the invented firms work in different parts of Saltreach. */
export const FIRM_UNIT_MIX: Record<string, Record<DemoUnitSlug, number>> = {
  quillfen: {
    'saltreach-estuarine-clay': 0.42,
    'vennmoor-peat': 0.12,
    'vennmoor-organic-clay': 0.14,
    'orrin-glaciolacustrine-clay': 0.14,
    'tamsel-alluvial-silt': 0.18,
  },
  'ellery-voss': {
    'saltreach-estuarine-clay': 0.28,
    'vennmoor-peat': 0.14,
    'vennmoor-organic-clay': 0.16,
    'orrin-glaciolacustrine-clay': 0.24,
    'tamsel-alluvial-silt': 0.18,
  },
  northmarch: {
    'saltreach-estuarine-clay': 0.25,
    'vennmoor-peat': 0.1,
    'vennmoor-organic-clay': 0.1,
    'orrin-glaciolacustrine-clay': 0.35,
    'tamsel-alluvial-silt': 0.2,
  },
};

export const FIRM_CODES: Record<string, string> = { quillfen: 'QF', 'ellery-voss': 'EV', northmarch: 'NM' };

/** The standard each firm's laboratory follows for incremental tests; CRS tests follow ASTM D4186. */
export const FIRM_INCREMENTAL_STANDARDS: Record<string, readonly string[]> = {
  quillfen: ['ASTM D2435'],
  'ellery-voss': ['ISO 17892-5'],
  northmarch: ['ASTM D2435', 'ISO 17892-5'],
};

export const DESCRIPTIONS: Record<DemoUnitSlug, readonly string[]> = {
  'saltreach-estuarine-clay': [
    'Soft grey silty CLAY with shell fragments.',
    'Very soft dark grey CLAY, slight organic odour.',
    'Soft grey CLAY with thin silt partings.',
  ],
  'vennmoor-peat': ['Dark brown fibrous PEAT.', 'Black amorphous PEAT with wood fragments.', 'Brown pseudo-fibrous PEAT.'],
  'vennmoor-organic-clay': ['Soft dark grey organic CLAY with plant remains.', 'Soft greenish-grey organic silty CLAY.'],
  'orrin-glaciolacustrine-clay': [
    'Stiff laminated brown CLAY (varved).',
    'Stiff grey-brown silty CLAY with rare gravel.',
    'Very stiff fissured brown CLAY.',
  ],
  'tamsel-alluvial-silt': [
    'Soft to firm grey clayey SILT with sand lenses.',
    'Firm brown sandy SILT.',
    'Soft grey SILT, laminated.',
  ],
};
export const CRUST_DESCRIPTION = 'Firm mottled brown-grey CLAY (desiccated crust).';
