/**
 * Published empirical correlations, as data: equation, inputs and units (the bank's: LL, wn, PI in %),
 * stated validity, source and caution. Screening estimates only — they are shown beside the bank's own
 * scatter, never instead of tests. Constants and attributions vary between secondary sources; each
 * entry says whether its form was read in a source or is from memory.
 *
 * Left out on purpose: the NAVFAC DM-7.01 (1986) chart of cv against LL (published only as a figure
 * of bands, no equation), and Rendon-Herrero (1983), whose exponent could not be confirmed.
 */
import { C_ALPHA_OVER_CC, type CAlphaOverCcGroup } from '../consolidation/secondary';
import type { CorrelationPairId } from './correlation-pairs';
import type { ParameterKey } from './parameters';
import type { SoilGroup } from './soil-groups';

export interface PublishedCorrelation {
  id: string;
  /** Author(s), year and where it was published. */
  source: string;
  /** The equation as published, in the bank's symbols. */
  equation: string;
  output: ParameterKey;
  /** Inputs in the order `evaluate` takes them. */
  inputs: readonly ParameterKey[];
  evaluate: (inputs: readonly number[]) => number;
  validity: {
    description: string;
    /** Soil groups it was stated for; a test of unknown group is then outside. Null: not stated. */
    soilGroups: readonly SoilGroup[] | null;
    /** Stated input ranges (inclusive). */
    ranges: Partial<Record<ParameterKey, readonly [number, number]>>;
  };
  /** Stated scatter as factors on the prediction (e.g. ±30 % → 0.7–1.3), or null. */
  statedRange: { low: number; high: number } | null;
  confirmation: 'read' | 'from memory';
  caution: string;
  /** The chart it is drawn on, with fixed values for inputs other than the chart's x; null: not drawn. */
  chart: { pair: CorrelationPairId; fixed: Partial<Record<ParameterKey, number>> } | null;
}

const CLAYS: readonly SoilGroup[] = ['inorganic', 'organic'];
const REMOULDED = 'Derived for remoulded clay; natural, structured clays usually compress more just beyond σ′p.';
const GS_DRAWN = 2.7;

function linear(
  id: string,
  source: string,
  equation: string,
  output: ParameterKey,
  input: ParameterKey,
  slope: number,
  offset: number,
  extra: Partial<PublishedCorrelation> & Pick<PublishedCorrelation, 'validity' | 'caution' | 'confirmation' | 'chart'>,
): PublishedCorrelation {
  return {
    id,
    source,
    equation,
    output,
    inputs: [input],
    evaluate: ([x]) => slope * ((x as number) - offset),
    statedRange: null,
    ...extra,
  };
}

const noGroups = (description: string) => ({ description, soilGroups: null, ranges: {} });
const clays = (description: string) => ({ description, soilGroups: CLAYS, ranges: {} });

function cAlphaOverCc(group: CAlphaOverCcGroup, soil: SoilGroup, label: string): PublishedCorrelation {
  const { central, halfRange } = C_ALPHA_OVER_CC[group];
  return {
    id: `mesri-godlewski-1977-${soil}`,
    source: 'Mesri & Godlewski (1977); UFC 3-220-10 Table 5-6',
    equation: `Cα = ${central}·Cc`,
    output: 'secondaryCompressionIndex',
    inputs: ['compressionIndex'],
    evaluate: ([cc]) => central * (cc as number),
    validity: { description: label, soilGroups: [soil], ranges: {} },
    statedRange: { low: (central - halfRange) / central, high: (central + halfRange) / central },
    confirmation: 'read',
    caution: `Cα/Cc = ${central} ± ${halfRange} (the ± from Terzaghi, Peck & Mesri 1996, from memory); use Cc at the stress of interest, from end-of-primary curves.`,
    chart: { pair: 'calpha-cc', fixed: {} },
  };
}

export const PUBLISHED_CORRELATIONS: readonly PublishedCorrelation[] = [
  linear(
    'skempton-1944',
    'Skempton (1944), Q. J. Geol. Soc. London 100:119–135',
    'Cc = 0.007·(LL − 10)',
    'compressionIndex',
    'liquidLimitPct',
    0.007,
    10,
    {
      validity: clays('remoulded clays'),
      confirmation: 'from memory',
      caution: `${REMOULDED} Some texts give 0.007·(LL − 7).`,
      chart: { pair: 'cc-ll', fixed: {} },
    },
  ),
  linear(
    'terzaghi-peck-1967',
    'Terzaghi & Peck (1967), Soil Mechanics in Engineering Practice, 2nd ed.',
    'Cc = 0.009·(LL − 10)',
    'compressionIndex',
    'liquidLimitPct',
    0.009,
    10,
    {
      validity: clays('normally consolidated clays of low to medium sensitivity'),
      statedRange: { low: 0.7, high: 1.3 },
      confirmation: 'from memory',
      caution: 'Stated to ±30 %; not for sensitive or organic-rich clays.',
      chart: { pair: 'cc-ll', fixed: {} },
    },
  ),
  linear(
    'azzouz-1976-ll',
    'Azzouz, Krizek & Corotis (1976), Soils and Foundations 16(2):19–29',
    'Cc = 0.006·(LL − 9)',
    'compressionIndex',
    'liquidLimitPct',
    0.006,
    9,
    {
      validity: { description: 'natural clays with LL below 100 %', soilGroups: CLAYS, ranges: { liquidLimitPct: [0, 100] } },
      confirmation: 'from memory',
      caution: 'Fitted to many natural clays; the e0 form of the same paper predicts better.',
      chart: { pair: 'cc-ll', fixed: {} },
    },
  ),
  linear(
    'azzouz-1976-e0',
    'Azzouz, Krizek & Corotis (1976), Soils and Foundations 16(2):19–29',
    'Cc = 0.40·(e0 − 0.25)',
    'compressionIndex',
    'initialVoidRatio',
    0.4,
    0.25,
    {
      validity: clays('natural clays'),
      confirmation: 'from memory',
      caution:
        'Found the most accurate of the published Cc forms by Azzouz et al. and in later reviews; still a screening estimate.',
      chart: { pair: 'cc-e0', fixed: {} },
    },
  ),
  linear(
    'azzouz-1976-wn',
    'Azzouz, Krizek & Corotis (1976), Soils and Foundations 16(2):19–29',
    'Cc = 0.01·(wn − 5)',
    'compressionIndex',
    'waterContentPct',
    0.01,
    5,
    {
      validity: clays('natural clays'),
      confirmation: 'from memory',
      caution: 'Water content stands in for void ratio; organic soils fall off the line.',
      chart: { pair: 'cc-wn', fixed: {} },
    },
  ),
  {
    id: 'azzouz-1976-multi',
    source: 'Azzouz, Krizek & Corotis (1976), Soils and Foundations 16(2):19–29',
    equation: 'Cc = 0.37·(e0 + 0.003·LL + 0.0004·wn − 0.34)',
    output: 'compressionIndex',
    inputs: ['initialVoidRatio', 'liquidLimitPct', 'waterContentPct'],
    evaluate: ([e0, ll, wn]) => 0.37 * ((e0 as number) + 0.003 * (ll as number) + 0.0004 * (wn as number) - 0.34),
    validity: clays('natural clays'),
    statedRange: null,
    confirmation: 'from memory',
    caution: 'Three inputs, so it is compared with the bank but not drawn on a two-variable chart.',
    chart: null,
  },
  linear('nishida-1956', 'Nishida (1956)', 'Cc = 1.15·(e0 − 0.35)', 'compressionIndex', 'initialVoidRatio', 1.15, 0.35, {
    validity: clays('all clays'),
    confirmation: 'from memory',
    caution: 'Some texts give 1.15·(e0 − 0.27).',
    chart: { pair: 'cc-e0', fixed: {} },
  }),
  linear('hough-1957', 'Hough (1957)', 'Cc = 0.30·(e0 − 0.27)', 'compressionIndex', 'initialVoidRatio', 0.3, 0.27, {
    validity: { description: 'inorganic silt, silty clay and clay', soilGroups: ['inorganic'], ranges: {} },
    confirmation: 'from memory',
    caution: 'Inorganic soils of low compressibility; underestimates soft high-plasticity clays.',
    chart: { pair: 'cc-e0', fixed: {} },
  }),
  linear('cozzolino-1961', 'Cozzolino (1961)', 'Cc = 0.0046·(LL − 9)', 'compressionIndex', 'liquidLimitPct', 0.0046, 9, {
    validity: noGroups('Brazilian clays'),
    confirmation: 'from memory',
    caution: 'Fitted to one region’s clays; regional correlations rarely carry over.',
    chart: { pair: 'cc-ll', fixed: {} },
  }),
  linear('koppula-1981', 'Koppula (1981)', 'Cc = 0.01·wn', 'compressionIndex', 'waterContentPct', 0.01, 0, {
    validity: noGroups('not stated'),
    confirmation: 'from memory',
    caution: 'No stated validity; treat as an order-of-magnitude check.',
    chart: { pair: 'cc-wn', fixed: {} },
  }),
  linear('mayne-1980', 'Mayne (1980)', 'Cc = (LL − 13)/109', 'compressionIndex', 'liquidLimitPct', 1 / 109, 13, {
    validity: noGroups('not stated'),
    confirmation: 'from memory',
    caution: 'No stated validity; treat as an order-of-magnitude check.',
    chart: { pair: 'cc-ll', fixed: {} },
  }),
  {
    id: 'wroth-wood-1978',
    source: 'Wroth & Wood (1978), Can. Geotech. J. 15:137–145',
    equation: 'Cc = ½·Gs·PI/100',
    output: 'compressionIndex',
    inputs: ['plasticityIndexPct', 'specificGravity'],
    evaluate: ([pi, gs]) => (0.5 * (gs as number) * (pi as number)) / 100,
    validity: clays('remoulded clays (critical-state derivation)'),
    statedRange: null,
    confirmation: 'from memory',
    caution: `${REMOULDED} Drawn with Gs = ${GS_DRAWN} (Cc ≈ PI/74).`,
    chart: { pair: 'cc-pi', fixed: { specificGravity: GS_DRAWN } },
  },
  linear(
    'kulhawy-mayne-1990-cc',
    'Kulhawy & Mayne (1990), EPRI EL-6800',
    'Cc = PI/74',
    'compressionIndex',
    'plasticityIndexPct',
    1 / 74,
    0,
    {
      validity: clays('summary correlation for clays'),
      confirmation: 'from memory',
      caution: 'A summary of others’ data; the scatter about it is wide.',
      chart: { pair: 'cc-pi', fixed: {} },
    },
  ),
  linear(
    'kulhawy-mayne-1990-cr',
    'Kulhawy & Mayne (1990), EPRI EL-6800',
    'Cr = PI/370',
    'recompressionIndex',
    'plasticityIndexPct',
    1 / 370,
    0,
    {
      validity: clays('summary correlation for clays'),
      confirmation: 'from memory',
      caution: 'A summary of others’ data; compared with the bank, not drawn (no Cr–PI chart).',
      chart: null,
    },
  ),
  linear(
    'ufc-leonards-cr',
    'UFC 3-220-10 (2022) §5-5.2.1, after Leonards (1976)',
    'Cr = 0.075·Cc (5–10 % of Cc)',
    'recompressionIndex',
    'compressionIndex',
    0.075,
    0,
    {
      validity: noGroups('clays in general'),
      statedRange: { low: 0.05 / 0.075, high: 0.1 / 0.075 },
      confirmation: 'read',
      caution: 'A typical ratio, not a fit; many texts give Cr/Cc of 0.1–0.2.',
      chart: { pair: 'cr-cc', fixed: {} },
    },
  ),
  cAlphaOverCc('inorganic-clay-silt', 'inorganic', 'inorganic clays and silts'),
  cAlphaOverCc('organic-clay-silt', 'organic', 'organic clays and silts'),
  cAlphaOverCc('peat', 'peat', 'peat'),
  {
    id: 'mesri-1973-wn',
    source: 'Mesri (1973); UFC 3-220-10 Eq. 5-19',
    equation: 'Cα = 10⁻⁴·wn·(1 + e0)  (Cεα = 10⁻⁴·wn)',
    output: 'secondaryCompressionIndex',
    inputs: ['waterContentPct', 'initialVoidRatio'],
    evaluate: ([wn, e0]) => 1e-4 * (wn as number) * (1 + (e0 as number)),
    validity: noGroups('natural soils from clays to peat'),
    statedRange: null,
    confirmation: 'read',
    caution: 'Published as the strain rate Cεα = Cα/(1 + e0); converted here with each test’s e0.',
    chart: null,
  },
  {
    id: 'burland-1990',
    source: 'Burland (1990), Géotechnique 40(3):329–378; UFC 3-220-10 Eqs. 8-27 to 8-30',
    equation: 'C*c = 0.256·eL − 0.04, eL = Gs·LL/100',
    output: 'compressionIndex',
    inputs: ['liquidLimitPct', 'specificGravity'],
    evaluate: ([ll, gs]) => (0.256 * (gs as number) * (ll as number)) / 100 - 0.04,
    validity: clays('reconstituted (intrinsic) clays'),
    statedRange: null,
    confirmation: 'read',
    caution: `The intrinsic compression index of reconstituted clay (eL = Gs·LL from memory); natural clays usually lie above it. Drawn with Gs = ${GS_DRAWN}.`,
    chart: { pair: 'cc-ll', fixed: { specificGravity: GS_DRAWN } },
  },
];

export function publishedCorrelation(id: string): PublishedCorrelation | null {
  return PUBLISHED_CORRELATIONS.find((c) => c.id === id) ?? null;
}
