/**
 * Deterministic vertical consolidation of each compressible layer: the Terzaghi series for a
 * drainage group of one layer under a uniform stress increase, otherwise the layered
 * Crank–Nicolson solver. Each layer's curve is also kept as a dense table for the Monte Carlo run.
 */
import { type DegreeTable, lookupDegree, TABLE_POINTS, tableFromFunction, tableFromValues, tableTimes } from './degree-table';
import { type DrainageGroup, drainageGroups, equivalentLayerTauYears } from './drainage-groups';
import type { EngineInput } from './engine-input';
import type { LayerValues } from './layer-values';
import type { SublayerSettlement } from './profile-settlement';
import { olsonRampDegree } from './ramp-loading';
import { degreeOfConsolidation, drainagePathM } from './terzaghi';
import { type FdZone, solveLayeredConsolidation } from './time-rate-fd';

export interface GroupModel extends DrainageGroup {
  method: 'series' | 'fd';
  /** Equivalent single-layer characteristic time at the median cv values, years. */
  tauYears: number;
  tableStartYears: number;
  tableEndYears: number;
}

export interface VerticalModel {
  groups: GroupModel[];
  /** Group index of each layer (−1 for a free-draining layer). */
  groupOfLayer: Int32Array;
  /** Per layer: vertical degree under the full load applied at once (null if free-draining). */
  stepTables: (DegreeTable | null)[];
  /** Exact (series) or tabulated (solver) vertical degree, instantaneous load, 0…1. */
  stepDegree: (layerIndex: number, timeYears: number) => number;
  /** Vertical degree under ramp loading (Olson 1977 or the solver with a time-varying load). */
  rampDegree: (layerIndex: number, timeYears: number) => number;
  /** Secant mv of each layer over its stress increase, 1/kPa. */
  layerMvPerKpa: Float64Array;
}

/** Target number of finite-volume cells per drainage group. */
const CELLS_PER_GROUP = 400;

/** Secant mv of a layer: primary settlement / ∫Δσ dz; falls back to the tangent NC/OC value. */
function secantMv(subs: readonly SublayerSettlement[], v: LayerValues): number {
  let s = 0;
  let area = 0;
  let tangent = 0;
  for (const sub of subs) {
    s += sub.primaryM;
    area += sub.deltaSigmaKpa * sub.thicknessM;
    const index = sub.state === 'overconsolidated' ? v.cr : v.cc;
    tangent += Number.isNaN(v.mvPerKpa) ? (Math.LOG10E * index) / ((1 + v.e0) * sub.sigmaV0Kpa) : v.mvPerKpa;
  }
  return s > 0 && area > 0 ? s / area : tangent / Math.max(subs.length, 1);
}

/**
 * Builds each compressible layer's vertical degree curve (years → 0…1) for the median values,
 * with the mv of each layer taken as its secant value over the load.
 */
export function buildVerticalModel(
  input: EngineInput,
  sublayers: readonly SublayerSettlement[],
  values: readonly (LayerValues | null)[],
): VerticalModel {
  const layerCount = input.layers.length;
  const groupOfLayer = new Int32Array(layerCount).fill(-1);
  const stepTables: (DegreeTable | null)[] = new Array(layerCount).fill(null);
  const rampTables: (DegreeTable | null)[] = new Array(layerCount).fill(null);
  const layerMvPerKpa = new Float64Array(layerCount);
  const subsOf = (i: number) => sublayers.filter((s) => s.layerIndex === i);
  input.layers.forEach((_, i) => {
    const v = values[i];
    if (v) layerMvPerKpa[i] = secantMv(subsOf(i), v);
  });
  const cvOf = (i: number) => (values[i] as LayerValues).cvM2PerYear;
  const tc = input.constructionTimeYears ?? 0;
  const seriesHdr = new Float64Array(layerCount);

  const groups: GroupModel[] = drainageGroups(input).map((group, g) => {
    const both = group.top === 'pervious' && group.bottom === 'pervious';
    const thicknesses = group.layerIndices.map((i) => input.layers[i]?.thicknessM ?? 0);
    const tauYears = equivalentLayerTauYears(thicknesses, group.layerIndices.map(cvOf), both);
    const tableStartYears = 1e-6 * tauYears;
    const tableEndYears = 100 * tauYears + 2 * tc;
    const method = group.layerIndices.length === 1 && input.load.kind === 'wideFill' ? 'series' : 'fd';
    for (const i of group.layerIndices) groupOfLayer[i] = g;
    if (method === 'series') {
      const i = group.layerIndices[0] as number;
      const hdr = drainagePathM(input.layers[i]?.thicknessM ?? 0, group.top, group.bottom);
      seriesHdr[i] = hdr;
      stepTables[i] = tableFromFunction(
        (t) => degreeOfConsolidation((cvOf(i) * t) / (hdr * hdr)),
        tableStartYears,
        tableEndYears,
      );
    } else {
      const times = tableTimes(tableStartYears, tableEndYears);
      const zoneSubs = group.layerIndices.flatMap(subsOf);
      const groupThickness = thicknesses.reduce((a, b) => a + b, 0);
      const zones: FdZone[] = zoneSubs.map((s) => ({
        thicknessM: s.thicknessM,
        cvM2PerYear: cvOf(s.layerIndex),
        mvPerKpa: layerMvPerKpa[s.layerIndex] as number,
        initialExcessKpa: s.deltaSigmaKpa,
        cells: Math.max(2, Math.round((CELLS_PER_GROUP * s.thicknessM) / groupThickness)),
      }));
      const solve = (loading: { kind: 'step' } | { kind: 'ramp'; durationYears: number }) =>
        solveLayeredConsolidation({ zones, top: group.top, bottom: group.bottom, loading, timesYears: times });
      const step = solve({ kind: 'step' });
      const ramp = tc > 0 && !input.drains ? solve({ kind: 'ramp', durationYears: tc }) : null;
      for (const i of group.layerIndices) {
        stepTables[i] = layerTable(step.zoneDegree, zoneSubs, i, tableStartYears, tableEndYears);
        if (ramp) rampTables[i] = layerTable(ramp.zoneDegree, zoneSubs, i, tableStartYears, tableEndYears);
      }
    }
    return { ...group, method, tauYears, tableStartYears, tableEndYears };
  });

  const stepDegree = (i: number, t: number): number => {
    const g = groups[groupOfLayer[i] as number];
    if (!g || !(t > 0)) return 0;
    if (g.method === 'series') return degreeOfConsolidation((cvOf(i) * t) / (seriesHdr[i] as number) ** 2);
    return lookupDegree(stepTables[i] as DegreeTable, Math.log(t));
  };
  const rampDegree = (i: number, t: number): number => {
    const g = groups[groupOfLayer[i] as number];
    if (!g || !(t > 0)) return 0;
    if (tc <= 0) return stepDegree(i, t);
    if (g.method === 'series') {
      const scale = cvOf(i) / (seriesHdr[i] as number) ** 2;
      return olsonRampDegree(scale * t, scale * tc);
    }
    const table = rampTables[i];
    if (!table) throw new Error('Ramp table missing: ramp curves with drains are built by superposition.');
    return lookupDegree(table, Math.log(t));
  };
  return { groups, groupOfLayer, stepTables, stepDegree, rampDegree, layerMvPerKpa };
}

/**
 * Degree of one layer from the solver's per-sublayer degrees, weighted by Δσ·h: with mv constant
 * in the layer this is (∫Δσ − u dz)/∫Δσ dz, so that Σ (layer settlement × degree) equals the
 * solver's own settlement Σ mv·∫(Δσ − u)dz and never decreases. (Weighting by each sublayer's
 * non-linear strain instead can turn negative early on, where water from a highly loaded zone
 * passes through a lightly loaded one.)
 */
function layerTable(
  zoneDegree: Float64Array,
  zoneSubs: readonly SublayerSettlement[],
  layerIndex: number,
  startYears: number,
  endYears: number,
): DegreeTable {
  const zoneCount = zoneSubs.length;
  const values = new Float64Array(TABLE_POINTS);
  let weightSum = 0;
  const weights = zoneSubs.map((s) => {
    const w = s.layerIndex === layerIndex ? s.deltaSigmaKpa * s.thicknessM : 0;
    weightSum += w;
    return w;
  });
  const useThickness = weightSum === 0;
  if (useThickness) {
    zoneSubs.forEach((s, z) => {
      weights[z] = s.layerIndex === layerIndex ? s.thicknessM : 0;
      weightSum += weights[z] as number;
    });
  }
  for (let t = 0; t < TABLE_POINTS; t++) {
    let sum = 0;
    for (let z = 0; z < zoneCount; z++) sum += (weights[z] as number) * (zoneDegree[t * zoneCount + z] as number);
    values[t] = sum / weightSum;
  }
  return tableFromValues(startYears, endYears, values);
}
