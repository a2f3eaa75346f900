/**
 * Warnings about values outside usual ranges and about method limits. Codes (closed list):
 * CC_ABOVE_USUAL, E0_OUTSIDE_USUAL, CV_OUTSIDE_USUAL, OCR_BELOW_ONE,
 * C_ALPHA_RATIO_OUTSIDE_USUAL, FREE_DRAINING_PARAMETERS_IGNORED, SUBLAYERS_NOT_CONVERGED,
 * SMALL_STRESS_INCREASE, HIGH_STRESS_RATIO, TWO_TO_ONE_APPROXIMATE, ELASTIC_STRESS_IN_LAYERED_GROUND,
 * DESIGN_LIFE_BEFORE_END_OF_PRIMARY, DESIGN_LIFE_DEFAULTED, CONSTRUCTION_LONGER_THAN_DESIGN_LIFE,
 * DRAIN_SPACING_RATIO_LOW, DISTRIBUTION_TRUNCATED, MV_STRESS_RANGE.
 * Usual ranges: Cc ≤ 3, e0 0.2–15, cv 0.01–1000 m²/yr (as the issue sets them); Cα/Cc 0.025–0.085
 * (Mesri & Godlewski 1977). Impossible inputs (Cr not below Cc, …) are refused in input-checks.ts.
 */
import type { DeterministicResult } from './deterministic';
import type { MonteCarloSummary } from './monte-carlo-summary';
import type { PreviewWarning } from './preview-result';
import type { UnitFactors } from './units';

const fmt = (x: number) => Number(x.toPrecision(3)).toString();

/** Warnings for the estimate, with the request field each concerns; messages use the request's units. */
export function collectWarnings(
  det: DeterministicResult,
  factors: UnitFactors,
  ranges: MonteCarloSummary | null,
  ignoredFreeDraining: readonly number[],
): PreviewWarning[] {
  const { input } = det;
  const out: PreviewWarning[] = [];
  const add = (code: string, field: string | null, message: string) => out.push({ code, field, message });
  const u = factors.labels;

  input.layers.forEach((layer, i) => {
    const v = det.values[i];
    const at = (name: string) => `layers.${i}.${name}`;
    const label = `Layer "${layer.name}"`;
    if (!v) return;
    if (v.cc > 3)
      add(
        'CC_ABOVE_USUAL',
        at('cc'),
        `${label}: Cc = ${fmt(v.cc)} is above the usual upper bound of about 3 (peats can exceed it). Check the value.`,
      );
    if (v.e0 < 0.2 || v.e0 > 15)
      add('E0_OUTSIDE_USUAL', at('e0'), `${label}: e0 = ${fmt(v.e0)} is outside the usual range 0.2–15.`);
    if (v.cvM2PerYear < 0.01 || v.cvM2PerYear > 1000) {
      add(
        'CV_OUTSIDE_USUAL',
        at('cv'),
        `${label}: cv = ${fmt(v.cvM2PerYear / factors.cv)} ${u.cv} is outside the usual range ${fmt(0.01 / factors.cv)}–${fmt(1000 / factors.cv)} ${u.cv}.`,
      );
    }
    const subs = det.sublayers.filter((s) => s.layerIndex === i);
    if (layer.preconsolidation.kind !== 'none' && subs.some((s) => s.sigmaPKpa < s.sigmaV0Kpa * (1 - 1e-9))) {
      add(
        'OCR_BELOW_ONE',
        at(layer.preconsolidation.kind === 'ocr' ? 'ocr' : 'sigmaP'),
        `${label}: σ'p is below σ'v0 (OCR < 1, under-consolidated). It is treated as normally consolidated from σ'v0; settlement still going on under the existing load is not included.`,
      );
    }
    if (layer.secondary.kind === 'cAlphaOverCc' && (v.secondary < 0.025 || v.secondary > 0.085)) {
      add(
        'C_ALPHA_RATIO_OUTSIDE_USUAL',
        at('cAlphaOverCc'),
        `${label}: Cα/Cc = ${fmt(v.secondary)} is outside the published range 0.025–0.085.`,
      );
    }
    if (layer.compression?.kind === 'mv') {
      add(
        'MV_STRESS_RANGE',
        at('mv'),
        `${label}: mv applies only to the stress range it was measured over; check it covers σ'v0 to σ'v0 + Δσ.`,
      );
    }
    const maxRatio = Math.max(0, ...subs.map((s) => s.deltaSigmaKpa / s.sigmaV0Kpa));
    if (maxRatio > 20) {
      add(
        'HIGH_STRESS_RATIO',
        `layers.${i}`,
        `${label}: Δσ/σ'v0 reaches ${fmt(maxRatio)} near the top of the layer, where the log-stress formulas are very sensitive to σ'v0. Check the water table and unit weights.`,
      );
    }
  });
  for (const i of ignoredFreeDraining) {
    add(
      'FREE_DRAINING_PARAMETERS_IGNORED',
      `layers.${i}`,
      `Layer "${input.layers[i]?.name}" is free-draining: its compressibility and consolidation parameters are ignored.`,
    );
  }
  const s = det.sublayering;
  if (!s.converged) {
    add(
      'SUBLAYERS_NOT_CONVERGED',
      'options.sublayers',
      `Sublayering stopped at ${Math.max(...s.countsPerLayer)} per layer with the total still changing by ${fmt(s.changePercent)} %. Raise maxPerLayer or the tolerance.`,
    );
  }
  const q = det.stress.pressureKpa;
  const maxDelta = Math.max(0, ...det.sublayers.map((x) => x.deltaSigmaKpa));
  if (maxDelta < 0.1 * q) {
    add(
      'SMALL_STRESS_INCREASE',
      'load',
      `The settlement point gets less than 10 % of the applied pressure at every depth; it is probably well outside the loaded area.`,
    );
  }
  if (input.load.kind === 'twoToOne') {
    add(
      'TWO_TO_ONE_APPROXIMATE',
      'load.type',
      'The 2:1 method gives an average stress below the loaded area, not the stress below a point, and underestimates near-surface stresses below the centre. Prefer the Boussinesq load types.',
    );
  } else if (input.load.kind !== 'wideFill') {
    add(
      'ELASTIC_STRESS_IN_LAYERED_GROUND',
      'load',
      'Stresses come from elastic half-space (Boussinesq) solutions, which ignore layering; stiff layers over soft ones spread load more widely.',
    );
  }
  det.time.vertical.groups.forEach((g, gi) => {
    const tp = det.endOfPrimaryYears[gi] as number;
    const hasSecondary = g.layerIndices.some((i) => (det.layerSecondaryPerCycleM[i] as number) > 0);
    if (hasSecondary && input.designLifeYears <= tp) {
      add(
        'DESIGN_LIFE_BEFORE_END_OF_PRIMARY',
        'options.designLifeYears',
        `The design life (${fmt(input.designLifeYears)} years) ends before primary consolidation (U = 95 % at ${fmt(tp)} years), so no secondary compression is counted.`,
      );
    }
  });
  if (input.designLifeDefaulted && det.layerSecondaryPerCycleM.some((x) => x > 0)) {
    add(
      'DESIGN_LIFE_DEFAULTED',
      'options.designLifeYears',
      `No design life was given: secondary compression is counted to ${input.designLifeYears} years.`,
    );
  }
  if (input.constructionTimeYears !== null && input.constructionTimeYears > input.designLifeYears) {
    add(
      'CONSTRUCTION_LONGER_THAN_DESIGN_LIFE',
      'constructionTimeYears',
      'The construction period is longer than the design life.',
    );
  }
  const geometry = det.time.drains?.geometry;
  if (geometry && geometry.spacingRatio < 4) {
    add(
      'DRAIN_SPACING_RATIO_LOW',
      'verticalDrains.spacing',
      `de/dw = ${fmt(geometry.spacingRatio)} is below 4; the drain factor's ln n − 0.75 form assumes n well above that.`,
    );
  }
  for (const p of ranges?.sampled ?? []) {
    if (p.truncatedMass > 0.01) {
      add(
        'DISTRIBUTION_TRUNCATED',
        null,
        `${p.layer}, ${p.parameter}: ${fmt(100 * p.truncatedMass)} % of the ${p.distribution} distribution lies below zero and was cut off. Consider a log-normal distribution.`,
      );
    }
  }
  return out;
}
