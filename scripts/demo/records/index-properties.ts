import { clamp, type Random, round } from './random';
import type { DemoUnitSlug } from './scenario';

/**
 * Invented index properties per unit, drawn around the typical ranges of the scenario with the
 * usual links: PI near the Casagrande A-line (PI = 0.73·(LL − 20)) for inorganic clays, wn tied to
 * LL (a desiccated crust drier), Gs of peat from its organic content.
 */
export interface IndexProperties {
  uscsSymbol: string;
  waterContentPct: number;
  liquidLimitPct: number | null;
  plasticLimitPct: number | null;
  plasticityIndexPct: number | null;
  specificGravity: number;
  organicContentPct: number;
}

const aLine = (ll: number) => 0.73 * (ll - 20);

function limits(ll: number, pi: number): { ll: number; pl: number; pi: number } {
  const llRounded = Math.round(ll);
  const piRounded = Math.min(Math.round(pi), llRounded);
  return { ll: llRounded, pl: llRounded - piRounded, pi: piRounded };
}

function silty(ll: number, pi: number): string {
  if (pi < 4 || pi < aLine(ll)) return 'ML';
  return pi <= 7 ? 'CL-ML' : 'CL';
}

// source: invented demo scenario (demo-scenario.md), typical values common practice
export function drawIndexProperties(rng: Random, unit: DemoUnitSlug, depthMidM: number): IndexProperties {
  switch (unit) {
    case 'saltreach-estuarine-clay': {
      const llDrawn = clamp(rng.normal(72, 12), 44, 100);
      const { ll, pl, pi } = limits(llDrawn, clamp(aLine(llDrawn) + rng.normal(3, 3.5), 20, 62));
      const wnOverLl = depthMidM < 3 ? rng.normal(0.85, 0.06) : rng.normal(1.1, 0.07);
      return {
        uscsSymbol: ll < 50 ? 'CL' : 'CH',
        waterContentPct: round(clamp(ll * wnOverLl, 38, 125), 1),
        liquidLimitPct: ll,
        plasticLimitPct: pl,
        plasticityIndexPct: pi,
        specificGravity: round(clamp(rng.normal(2.67, 0.025), 2.6, 2.75), 2),
        organicContentPct: round(clamp(rng.normal(3.5, 1), 1, 7), 1),
      };
    }
    case 'vennmoor-peat': {
      const wn = clamp(rng.logNormal(520, 0.22), 320, 760);
      const organic = clamp(60 + ((wn - 320) / 440) * 30 + rng.normal(0, 5), 50, 97);
      // Gs of a mix of organic matter (≈ 1.5) and mineral solids (≈ 2.65), weighted by mass.
      const gs = 1 / (organic / 100 / 1.5 + (1 - organic / 100) / 2.65) + rng.normal(0, 0.02);
      return {
        uscsSymbol: 'Pt',
        waterContentPct: Math.round(wn),
        liquidLimitPct: null,
        plasticLimitPct: null,
        plasticityIndexPct: null,
        specificGravity: round(clamp(gs, 1.5, 2.0), 2),
        organicContentPct: round(organic, 1),
      };
    }
    case 'vennmoor-organic-clay': {
      const llDrawn = clamp(rng.normal(105, 17), 72, 148);
      const { ll, pl, pi } = limits(llDrawn, clamp(0.62 * (llDrawn - 15) + rng.normal(0, 4), 36, 90));
      const organic = clamp(8 + (ll - 70) * 0.15 + rng.normal(0, 2.5), 6, 28);
      return {
        uscsSymbol: 'OH',
        waterContentPct: round(clamp(ll * rng.normal(1.12, 0.08), 82, 198), 1),
        liquidLimitPct: ll,
        plasticLimitPct: pl,
        plasticityIndexPct: pi,
        specificGravity: round(clamp(rng.normal(2.46 - (organic - 15) * 0.008, 0.03), 2.3, 2.6), 2),
        organicContentPct: round(organic, 1),
      };
    }
    case 'orrin-glaciolacustrine-clay': {
      const llDrawn = clamp(rng.normal(42, 5.5), 30, 56);
      const { ll, pl, pi } = limits(llDrawn, clamp(aLine(llDrawn) + rng.normal(1.5, 2.5), 11, 31));
      const liquidityIndex = clamp(rng.normal(0.22, 0.1), -0.05, 0.55);
      return {
        uscsSymbol: ll < 50 ? 'CL' : 'CH',
        waterContentPct: round(clamp(pl + liquidityIndex * pi, 19, 39), 1),
        liquidLimitPct: ll,
        plasticLimitPct: pl,
        plasticityIndexPct: pi,
        specificGravity: round(clamp(rng.normal(2.72, 0.025), 2.65, 2.78), 2),
        organicContentPct: round(clamp(rng.normal(1.2, 0.4), 0.3, 2.5), 1),
      };
    }
    case 'tamsel-alluvial-silt': {
      const llDrawn = clamp(rng.normal(32, 4), 25, 40);
      const { ll, pl, pi } = limits(llDrawn, clamp(aLine(llDrawn) * rng.normal(0.8, 0.18), 4, 14));
      return {
        uscsSymbol: silty(ll, pi),
        waterContentPct: round(clamp(ll * rng.normal(0.98, 0.09), 21, 41), 1),
        liquidLimitPct: ll,
        plasticLimitPct: pl,
        plasticityIndexPct: pi,
        specificGravity: round(clamp(rng.normal(2.68, 0.02), 2.63, 2.74), 2),
        organicContentPct: round(clamp(rng.normal(2, 0.7), 0.5, 4.5), 1),
      };
    }
  }
}
