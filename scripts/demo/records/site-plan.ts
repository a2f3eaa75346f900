import { DEMO_UNITS } from '../vocabulary';
import { clamp, type Random, round } from './random';
import { type DemoRegionSlug, type DemoUnitSlug, FIRM_CODES } from './scenario';

/**
 * Where the invented samples come from: per firm and region one or two invented projects, boreholes
 * with a simple layered profile and a water table near 1 m, and two to five samples down each hole.
 */
export type SamplingMethod = 'piston' | 'thin-wall open-drive' | 'block';

export const SAMPLE_LENGTH_M: Record<SamplingMethod, number> = { piston: 0.6, 'thin-wall open-drive': 0.45, block: 0.3 };
const SAMPLE_PREFIX: Record<SamplingMethod, string> = { piston: 'P', 'thin-wall open-drive': 'U', block: 'B' };
export const GAMMA_W_KN_PER_M3 = 9.81;

export interface Layer {
  baseM: number;
  /** bulk unit weight, kN/m³ (the same above and below the water table) */
  unitWeight: number;
}

export interface Borehole {
  id: string;
  projectName: string;
  clientName: string;
  easting: number;
  northing: number;
  waterTableM: number;
  layers: Layer[];
}

export interface SamplePlan {
  unit: DemoUnitSlug;
  borehole: Borehole;
  sampleId: string;
  depthTopM: number;
  depthBottomM: number;
  samplingMethod: SamplingMethod;
}

/** An easting/northing box (m) per region inside the invented rectangle 412000–448000 E, 301000–329000 N. */
const REGION_BOXES: Record<DemoRegionSlug, { e: readonly [number, number]; n: readonly [number, number] }> = {
  'saltreach-estuary': { e: [432500, 447000], n: [301800, 314000] },
  'vennmoor-flats': { e: [423500, 435000], n: [313500, 322000] },
  'orrin-uplands': { e: [412800, 424000], n: [316000, 328200] },
  'tamsel-valley': { e: [417000, 431000], n: [301800, 312500] },
};

const PROJECTS: Record<DemoRegionSlug, readonly { name: string; client: string }[]> = {
  'saltreach-estuary': [
    { name: 'Harbour Wall Extension (invented)', client: 'Saltreach Port Authority (invented)' },
    { name: 'Container Berth 4 Reclamation (invented)', client: 'Saltreach Port Authority (invented)' },
    { name: 'Estuary Flood Embankment Raising (invented)', client: 'Saltreach Rivers Board (invented)' },
    { name: 'Quayside Logistics Yard (invented)', client: 'Greywick Developments (invented)' },
    { name: 'Saltreach Tidal Barrier Approach (invented)', client: 'Saltreach County Highways (invented)' },
    { name: 'Marsh Lane Wastewater Works (invented)', client: 'Saltreach Water (invented)' },
  ],
  'vennmoor-flats': [
    { name: 'Vennmoor Relief Road (invented)', client: 'Saltreach County Highways (invented)' },
    { name: 'Fen Pumping Station Renewal (invented)', client: 'Vennmoor Drainage Board (invented)' },
    { name: 'Vennmoor Rail Embankment Renewal (invented)', client: 'Northern Rail Trust (invented)' },
    { name: 'Fenside Solar Park (invented)', client: 'Brightfen Energy (invented)' },
    { name: 'Moor Drove Flood Bank (invented)', client: 'Vennmoor Drainage Board (invented)' },
    { name: 'Vennmoor Village Bypass (invented)', client: 'Saltreach County Highways (invented)' },
  ],
  'orrin-uplands': [
    { name: 'Orrin Reservoir Dam Raising (invented)', client: 'Orrin Water Company (invented)' },
    { name: 'Orrin Hill Business Park (invented)', client: 'Greywick Developments (invented)' },
    { name: 'Upland Wind Farm Access Track (invented)', client: 'Brightfen Energy (invented)' },
    { name: 'Orrin Bypass Cutting (invented)', client: 'Saltreach County Highways (invented)' },
    { name: 'Lakeside School Extension (invented)', client: 'Orrin District Council (invented)' },
    { name: 'Orrin Quarry Haul Road (invented)', client: 'Orrin Aggregates (invented)' },
  ],
  'tamsel-valley': [
    { name: 'Tamsel Bridge Replacement (invented)', client: 'Saltreach County Highways (invented)' },
    { name: 'Tamsel Flood Storage Area (invented)', client: 'Saltreach Rivers Board (invented)' },
    { name: 'Riverside Housing Phase 2 (invented)', client: 'Tamsel District Council (invented)' },
    { name: 'Valley Trunk Sewer (invented)', client: 'Saltreach Water (invented)' },
    { name: 'Tamsel Mill Regeneration (invented)', client: 'Greywick Developments (invented)' },
    { name: 'Tamsel Valley Cycle Bridge (invented)', client: 'Tamsel District Council (invented)' },
  ],
};

/** σ'v0 (kPa) at depth z (m) from the borehole's layers and water table, γw = 9.81 kN/m³. */
export function verticalEffectiveStressKpa(borehole: Borehole, depthM: number): number {
  let total = 0;
  let top = 0;
  for (const layer of borehole.layers) {
    const bottom = Math.min(layer.baseM, depthM);
    if (bottom > top) total += layer.unitWeight * (bottom - top);
    top = layer.baseM;
    if (top >= depthM) break;
  }
  return total - GAMMA_W_KN_PER_M3 * Math.max(0, depthM - borehole.waterTableM);
}

interface Project {
  name: string;
  client: string;
  easting: number;
  northing: number;
}

/** Hands out invented projects (two per firm and region, none shared between firms) and borehole ids. */
export class SitePlanner {
  private readonly lastBoreholeNo = new Map<string, number>();
  private readonly projectsTaken = new Map<DemoRegionSlug, number>();
  private readonly firmProjects = new Map<string, Project[]>();

  constructor(private readonly rng: Random) {}

  borehole(firm: string, region: DemoRegionSlug, layers: Layer[], waterTableM: number): Borehole {
    const project = this.rng.pick(this.projectsOf(firm, region));
    const no = (this.lastBoreholeNo.get(firm) ?? 0) + this.rng.int(1, 3);
    this.lastBoreholeNo.set(firm, no);
    return {
      id: `${FIRM_CODES[firm] ?? 'XX'}-BH-${String(no).padStart(3, '0')}`,
      projectName: project.name,
      clientName: project.client,
      easting: Math.round(clamp(project.easting + this.rng.uniform(-700, 700), 412000, 448000)),
      northing: Math.round(clamp(project.northing + this.rng.uniform(-700, 700), 301000, 329000)),
      waterTableM,
      layers,
    };
  }

  private projectsOf(firm: string, region: DemoRegionSlug): Project[] {
    const key = `${firm}/${region}`;
    const known = this.firmProjects.get(key);
    if (known) return known;
    const pool = PROJECTS[region];
    const box = REGION_BOXES[region];
    const projects: Project[] = [];
    for (let i = 0; i < 2; i++) {
      const taken = this.projectsTaken.get(region) ?? 0;
      const project = pool[taken % pool.length];
      if (!project) break;
      this.projectsTaken.set(region, taken + 1);
      projects.push({
        ...project,
        easting: this.rng.uniform(box.e[0] + 800, box.e[1] - 800),
        northing: this.rng.uniform(box.n[0] + 800, box.n[1] - 800),
      });
    }
    this.firmProjects.set(key, projects);
    return projects;
  }
}

function samplingMethodFor(unit: DemoUnitSlug, rng: Random): SamplingMethod {
  if (unit === 'orrin-glaciolacustrine-clay') return rng.chance(0.25) ? 'block' : 'thin-wall open-drive';
  if (unit === 'tamsel-alluvial-silt') return rng.chance(0.3) ? 'piston' : 'thin-wall open-drive';
  return rng.chance(0.6) ? 'piston' : 'thin-wall open-drive';
}

/** `count` samples of `unit` between depths lo and hi (m), one per equal slot, tops on 0.05 m. */
function samplesInBorehole(
  rng: Random,
  borehole: Borehole,
  unit: DemoUnitSlug,
  count: number,
  [lo, hi]: readonly [number, number],
  counter: { sampleNo: number },
): SamplePlan[] {
  const methods = Array.from({ length: count }, () => samplingMethodFor(unit, rng));
  const slot = (hi - lo) / count;
  return methods.map((method, i) => {
    const room = Math.max(0, slot - SAMPLE_LENGTH_M[method] - 0.1);
    const top = round(Math.round((lo + i * slot + rng.uniform(0, room)) * 20) / 20, 2);
    counter.sampleNo += rng.int(1, 3);
    return {
      unit,
      borehole,
      sampleId: `${SAMPLE_PREFIX[method]}-${counter.sampleNo}`,
      depthTopM: top,
      depthBottomM: round(top + SAMPLE_LENGTH_M[method], 2),
      samplingMethod: method,
    };
  });
}

/** A firm's samples in one region, as boreholes of two to five samples down the profile. */
export function planRegion(
  rng: Random,
  planner: SitePlanner,
  firm: string,
  region: DemoRegionSlug,
  counts: Record<DemoUnitSlug, number>,
): SamplePlan[] {
  const plans: SamplePlan[] = [];
  const unitWeight = (typical: number) => round(typical + rng.normal(0, 0.25), 1);
  const waterTable = (lo: number, hi: number) => round(rng.uniform(lo, hi), 1);
  if (region === 'vennmoor-flats') {
    let peat = counts['vennmoor-peat'];
    let organic = counts['vennmoor-organic-clay'];
    while (peat + organic > 0) {
      const peatBase = round(rng.uniform(1.5, 6), 1);
      const layers = [
        { baseM: peatBase, unitWeight: unitWeight(10.8) },
        { baseM: Number.POSITIVE_INFINITY, unitWeight: unitWeight(13.8) },
      ];
      const bh = planner.borehole(firm, region, layers, waterTable(0.3, 1.0));
      const peatRoom = Math.max(1, Math.floor((peatBase - 0.5) / 0.9));
      let nPeat = Math.min(peat, rng.int(0, Math.min(2, peatRoom)));
      let nOrganic = Math.min(organic, rng.int(nPeat === 0 ? 1 : 0, 3));
      if (nPeat + nOrganic === 0) {
        if (peat > 0) nPeat = 1;
        else nOrganic = 1;
      }
      peat -= nPeat;
      organic -= nOrganic;
      const counter = { sampleNo: 0 };
      if (nPeat > 0) plans.push(...samplesInBorehole(rng, bh, 'vennmoor-peat', nPeat, [0.4, peatBase - 0.05], counter));
      const organicRange = [peatBase + 0.2, peatBase + rng.uniform(5, 9)] as const;
      if (nOrganic > 0) plans.push(...samplesInBorehole(rng, bh, 'vennmoor-organic-clay', nOrganic, organicRange, counter));
    }
    return plans;
  }
  const unit = DEMO_UNITS.find((u) => u.region === region)?.slug;
  if (!unit) return plans;
  let remaining = counts[unit];
  while (remaining > 0) {
    const n = Math.min(remaining, rng.int(2, 5));
    remaining -= n;
    const counter = { sampleNo: 0 };
    if (region === 'saltreach-estuary') {
      const clayBase = rng.uniform(9, 24);
      const layers = [
        { baseM: 3, unitWeight: unitWeight(17.0) },
        { baseM: Number.POSITIVE_INFINITY, unitWeight: unitWeight(15.6) },
      ];
      const bh = planner.borehole(firm, region, layers, waterTable(0.6, 1.5));
      plans.push(...samplesInBorehole(rng, bh, unit, n, [0.8, Math.min(clayBase - 0.8, 20)], counter));
    } else if (region === 'orrin-uplands') {
      const cover = round(rng.uniform(0.6, 2), 1);
      const layers = [
        { baseM: cover, unitWeight: unitWeight(19.0) },
        { baseM: Number.POSITIVE_INFINITY, unitWeight: unitWeight(19.8) },
      ];
      const bh = planner.borehole(firm, region, layers, waterTable(0.8, 2.0));
      plans.push(...samplesInBorehole(rng, bh, unit, n, [cover + 0.3, 19], counter));
    } else {
      const bh = planner.borehole(
        firm,
        region,
        [{ baseM: Number.POSITIVE_INFINITY, unitWeight: unitWeight(18.8) }],
        waterTable(0.6, 1.5),
      );
      plans.push(...samplesInBorehole(rng, bh, unit, n, [0.8, 12], counter));
    }
  }
  return plans;
}
