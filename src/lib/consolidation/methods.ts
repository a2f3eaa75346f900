/**
 * Plain statements of each method the preview used and its published source.
 */
import type { DeterministicResult } from './deterministic';
import type { MonteCarloSummary } from './monte-carlo-summary';

/** Plain method statements with sources, in the order the calculation uses them. */
export function methodsUsed(det: DeterministicResult, ranges: MonteCarloSummary | null, waterUnitWeightLabel: string): string[] {
  const { input } = det;
  const layers = input.layers.filter((l) => l.compressible);
  const methods = [
    `Stress increase — ${det.stress.method}.`,
    `In-situ stress: layered unit weights with a hydrostatic water table, γw = ${waterUnitWeightLabel} (effective stress principle).`,
  ];
  if (layers.some((l) => l.compression?.kind === 'indices')) {
    methods.push(
      "Primary settlement: Cc/Cr form at sublayer mid-points — normally consolidated UFC 3-220-10 Eq. 5-12, overconsolidated Eq. 5-13, crossing σ'p Eq. 5-14.",
    );
  }
  if (layers.some((l) => l.compression?.kind === 'mv')) methods.push("Primary settlement: mv form, ε = mv·Δσ' (linear).");
  const s = det.sublayering;
  methods.push(
    s.mode === 'auto'
      ? `Sublayering: doubled until the total changed by less than ${input.sublayers.mode === 'auto' ? input.sublayers.tolerancePercent : 0} % (UFC 3-220-10 §5-5.2.2).`
      : `Sublayering: fixed, ${s.countsPerLayer.find((c) => c > 0) ?? 0} per layer.`,
  );
  if (layers.some((l) => l.secondary.kind !== 'none')) {
    methods.push(
      'Secondary compression: UFC 3-220-10 Eq. 5-18 with Cα/(1+e0) and the initial sublayer thickness, counted from the end of primary consolidation (taken at U = 95 %, common practice) to the design life.',
    );
  }
  if (layers.some((l) => l.secondary.kind === 'cAlphaOverCc')) {
    methods.push("Cα from Cα/Cc (Mesri & Godlewski 1977; Mesri & Castro 1987): Cα = ratio × Cc above σ'p, × Cr below it.");
  }
  const groups = det.time.vertical.groups;
  if (groups.some((g) => g.method === 'series')) {
    methods.push('Time rate: Terzaghi exact series, Tv = cv·t/Hdr² (Terzaghi 1943; UFC 3-220-10 Eq. 5-15).');
  }
  if (groups.some((g) => g.method === 'fd')) {
    methods.push(
      'Time rate: layered 1-D consolidation solved by finite volumes and Crank–Nicolson time stepping, k = cv·mv·γw per layer with flow continuous across layer boundaries.',
    );
  }
  if (input.constructionTimeYears) {
    methods.push(
      input.drains
        ? 'Ramp loading: Duhamel superposition of the instantaneous-load response over the construction period (Olson 1977).'
        : groups.some((g) => g.method === 'series')
          ? 'Ramp loading: Olson (1977) series for a linearly increasing load.'
          : 'Ramp loading: the layered solver with the load increasing linearly over the construction period (Olson 1977).',
    );
  }
  if (input.drains) {
    methods.push(
      `Vertical drains: radial consolidation by Barron (1948) equal strain with Hansbo's (1981) drain factor (smear and well resistance), ${input.drains.pattern} pattern${input.drains.bandDrain ? ', band drain dw = 2(a+b)/π (Hansbo 1979)' : ''}, combined with vertical drainage by Carrillo (1942).`,
    );
  }
  if (ranges) {
    methods.push(
      `Ranges: seeded Monte Carlo, ${ranges.realisations} realisations, seed ${ranges.seed}; xoshiro128** generator, Box–Muller normals, Gaussian copula for the Cc–e0 correlation; given P10/P50/P90 triples sampled through all three points (Johnson quantile-parameterized distribution, Hadlock & Bickel 2017); a realisation's Cr capped at its Cc; result P10/P50/P90 by linear interpolation of order statistics (Hyndman & Fan type 7).`,
      "Ranges over time: each layer's curve rescaled by its drainage group's equivalent-layer time (UFC 3-220-10 Eqs. 5-16, 5-17) — exact for one layer, approximate for layers with different cv.",
      'The likely (deterministic) estimate uses the median of every distribution.',
    );
  }
  return methods;
}
