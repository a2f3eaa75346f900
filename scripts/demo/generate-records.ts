/**
 * Seeded generator of the INVENTED Saltreach demo test records, so that a fresh bank has a few
 * hundred tests to show. Pure TypeScript: no database, no Node modules; the same seed always gives
 * the same records. The three invented firms contribute 55 / 30 / 15 % across the five invented
 * geological units, with the relations of reference/demo-scenario.md built in and a few planted
 * mistakes for the steward. No record describes a real place, project, client or test.
 */
import { DEMO_FIRMS } from './people';
import { demoIncrements } from './records/curve';
import { plantOutliers } from './records/outliers';
import { Random, round } from './records/random';
import {
  CRUST_DESCRIPTION,
  DESCRIPTIONS,
  type DemoUnitSlug,
  FIRM_INCREMENTAL_STANDARDS,
  FIRM_UNIT_MIX,
} from './records/scenario';
import { planRegion, type SamplePlan, type SamplingMethod, SitePlanner, verticalEffectiveStressKpa } from './records/site-plan';
import { drawSpecimen } from './records/specimen';
import type { DemoRecord } from './records/types';
import { DEMO_REGIONS, DEMO_UNITS } from './vocabulary';

export type { DemoUnitSlug } from './records/scenario';
export type { DemoIncrement, DemoRecord, DemoRecordFields, PlantedOutlierKind, SampleQualityClass } from './records/types';

export interface GenerateDemoRecordsOptions {
  seed?: number;
  count?: number;
}

export const DEFAULT_DEMO_SEED = 20261202;
export const DEFAULT_DEMO_RECORD_COUNT = 320;
const COORDINATE_SYSTEM = 'Saltreach Local Grid (invented)';
/** share of poor (class 3–4) samples by sampling method */
const POOR_SAMPLE_CHANCE: Record<SamplingMethod, number> = { piston: 0.03, 'thin-wall open-drive': 0.08, block: 0.01 };
const CRS_CHANCE = 0.15;
/** of the incremental tests, the share that carries its increments (about a third of all records) */
const INCREMENTS_CHANCE = 0.39;

/** Splits `total` in proportion to `shares`, giving the remainders to the largest fractions. */
function apportion<K extends string>(total: number, shares: Record<K, number>): Record<K, number> {
  const keys = Object.keys(shares) as K[];
  const sum = keys.reduce((s, k) => s + shares[k], 0);
  const exact = keys.map((k) => (total * shares[k]) / sum);
  const counts = exact.map(Math.floor);
  const byRemainder = exact
    .map((x, i) => ({ remainder: x - Math.floor(x), i }))
    .sort((a, b) => b.remainder - a.remainder || a.i - b.i);
  let left = total - counts.reduce((s, c) => s + c, 0);
  for (const { i } of byRemainder) {
    if (left-- <= 0) break;
    counts[i] = (counts[i] ?? 0) + 1;
  }
  return Object.fromEntries(keys.map((k, i) => [k, counts[i] ?? 0])) as Record<K, number>;
}

function buildRecord(rng: Random, firm: string, plan: SamplePlan): DemoRecord {
  const unit = DEMO_UNITS.find((u) => u.slug === plan.unit);
  const region = DEMO_REGIONS.find((r) => r.slug === unit?.region);
  const depthMid = (plan.depthTopM + plan.depthBottomM) / 2;
  const sigmaV0 = round(verticalEffectiveStressKpa(plan.borehole, depthMid), 1);
  const poor = rng.chance(POOR_SAMPLE_CHANCE[plan.samplingMethod]);
  const specimen = drawSpecimen(rng, plan.unit, depthMid, sigmaV0, poor);
  const crs = rng.chance(CRS_CHANCE);
  const increments =
    !crs && rng.chance(INCREMENTS_CHANCE) ? demoIncrements(rng, specimen.curve, plan.unit === 'vennmoor-peat') : null;
  const crust = plan.unit === 'saltreach-estuarine-clay' && depthMid < 3;
  const description = crust ? CRUST_DESCRIPTION : rng.pick(DESCRIPTIONS[plan.unit]);
  const { curve: _curve, sampleQualityClass, ...values } = specimen;
  return {
    firmSlug: firm,
    projectName: plan.borehole.projectName,
    clientName: plan.borehole.clientName,
    boreholeId: plan.borehole.id,
    sampleId: plan.sampleId,
    easting: plan.borehole.easting,
    northing: plan.borehole.northing,
    // the invented sites sit on an invented grid, so they have no latitude or longitude
    latitude: null,
    longitude: null,
    coordinateSystem: COORDINATE_SYSTEM,
    notes: `Invented demo record. ${description}${poor ? ' Sample partly disturbed on extrusion.' : ''}`,
    region: region?.name ?? null,
    geologicalUnit: unit?.name ?? null,
    locationCell: null,
    depthTop: plan.depthTopM,
    depthBottom: plan.depthBottomM,
    samplingMethod: plan.samplingMethod,
    testMethod: crs ? 'crs' : 'incremental',
    testStandard: crs ? 'ASTM D4186' : rng.pick(FIRM_INCREMENTAL_STANDARDS[firm] ?? ['ASTM D2435']),
    ...values,
    sampleQualityClass,
    increments,
    plantedOutlier: null,
  };
}

/**
 * About 320 invented oedometer test records (default seed 20261202): fields keyed as the import
 * fields of src/lib/import/fields.ts in SI units, unit and region by name, private details that are
 * plainly invented, increments for about a third, and four planted outliers (`plantedOutlier`).
 */
export function generateDemoRecords(options: GenerateDemoRecordsOptions = {}): DemoRecord[] {
  const rng = new Random(options.seed ?? DEFAULT_DEMO_SEED);
  const count = Math.max(0, Math.round(options.count ?? DEFAULT_DEMO_RECORD_COUNT));
  const firmCounts = apportion(count, Object.fromEntries(DEMO_FIRMS.map((f) => [f.slug, f.share])));
  const planner = new SitePlanner(rng);
  const records: DemoRecord[] = [];
  for (const firm of DEMO_FIRMS) {
    const mix = FIRM_UNIT_MIX[firm.slug];
    if (!mix) continue;
    const unitCounts: Record<DemoUnitSlug, number> = apportion(firmCounts[firm.slug] ?? 0, mix);
    for (const region of DEMO_REGIONS) {
      for (const plan of planRegion(rng, planner, firm.slug, region.slug, unitCounts)) {
        records.push(buildRecord(rng, firm.slug, plan));
      }
    }
  }
  plantOutliers(rng, records);
  return records;
}
