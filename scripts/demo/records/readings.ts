import { withDialSlip } from '../../../src/lib/lab/synthetic/planted-problem';
import type { SyntheticCurve } from '../../../src/lib/lab/synthetic/synthetic-curve';
import { syntheticIncrementalTest } from '../../../src/lib/lab/synthetic/synthetic-test';
import type { IncrementalTestInput } from '../../../src/lib/lab/test-input';
import type { DemoRecord } from './types';

/** The planted problem in one reading set, for the steward to catch. */
export type PlantedReadingProblem = 'dial-slip';

export interface DemoReadingSet {
  /** index of the record in the list given (the record the readings belong to) */
  recordIndex: number;
  test: IncrementalTestInput;
  plantedProblem: PlantedReadingProblem | null;
  /** shown with the readings */
  note: string;
}

export interface DemoReadingOptions {
  /** reading sets with no planted problem (default 8) */
  count?: number;
  seed?: number;
}

const SPECIMEN_HEIGHT_MM = 19;
const SPECIMEN_DIAMETER_MM = 75;

/**
 * INVENTED time–deformation readings for some of the invented demo records: for each chosen record, an
 * incremental test generated from its own summary values (e0, Cc, Cr, σ′p, σ′v0, Δe/e0 as the e–log σ′
 * curve; cv OC range below σ′p, cv NC range above, their geometric mean across it; Cα from its Cα) by
 * Terzaghi's solution with 0.001 mm of noise, loads doubling from 12.5 kPa to 8·σ′p with a step at σ′v0,
 * and two unloading steps. Records chosen: incremental tests with increments, no planted outlier and a
 * sample-quality class of 1 or 2, one geological unit after another. One more set carries a planted problem: the gauge slips back during a virgin
 * increment by more than that increment's compression, so σ′p and that increment's cv cannot be derived.
 * Pure and seeded: the same records and seed give the same readings.
 */
export function demoReadingSets(records: readonly DemoRecord[], options: DemoReadingOptions = {}): DemoReadingSet[] {
  const count = options.count ?? 8;
  const seed = options.seed ?? 20261203;
  const eligible = records
    .map((record, recordIndex) => ({ record, recordIndex }))
    .filter(({ record: r }) => r.testMethod === 'incremental' && r.increments !== null && r.plantedOutlier === null)
    .filter(({ record: r }) => r.sampleQualityClass === 1 || r.sampleQualityClass === 2);
  const chosen = takeAcrossUnits(eligible, count + 1);
  return chosen.map(({ record, recordIndex }, i) => {
    const test = readingsFor(record, seed + i);
    if (i < count) return { recordIndex, test, plantedProblem: null, note: 'Invented demo readings (Saltreach scenario).' };
    return {
      recordIndex,
      test: slipped(test, record),
      plantedProblem: 'dial-slip',
      note: 'Invented demo readings (Saltreach scenario), with a planted problem for the steward.',
    };
  });
}

/** Up to `count` entries, taking one of each geological unit in turn (in list order within a unit). */
function takeAcrossUnits<T extends { record: DemoRecord }>(list: readonly T[], count: number): T[] {
  const byUnit = new Map<string, T[]>();
  for (const item of list)
    byUnit.set(item.record.geologicalUnit ?? '', [...(byUnit.get(item.record.geologicalUnit ?? '') ?? []), item]);
  const queues = [...byUnit.values()];
  const out: T[] = [];
  for (let round = 0; out.length < count && queues.some((q) => q.length > round); round++) {
    for (const q of queues) if (out.length < count && q[round]) out.push(q[round] as T);
  }
  return out;
}

function readingsFor(r: DemoRecord, seed: number): IncrementalTestInput {
  const curve = curveOf(r);
  // common practice (Lunne, Berre & Strandvik 1997): a load step at σ′v0, where Δe/e0 is read
  const stresses: number[] = [];
  for (let s = 12.5; ; s *= 2) {
    if (curve.sigmaV0Kpa < s && (stresses.length === 0 || curve.sigmaV0Kpa > (stresses[stresses.length - 1] as number))) {
      stresses.push(curve.sigmaV0Kpa);
    }
    stresses.push(s);
    if (s >= 8 * curve.sigmaPKpa) break;
  }
  const top = stresses[stresses.length - 1] as number;
  stresses.push(top / 4, top / 16);
  const cvNc = r.cvNc ?? 1;
  const cvOc = r.cvOc ?? cvNc;
  const cv = stresses.map((s, i) => {
    const before = i === 0 ? 0 : (stresses[i - 1] as number);
    if (s < before || s <= curve.sigmaPKpa) return cvOc;
    return before >= curve.sigmaPKpa ? cvNc : Math.sqrt(cvNc * cvOc);
  });
  return syntheticIncrementalTest({
    curve,
    stressesKpa: stresses,
    cvM2PerYear: cv,
    cAlphaOverCc: (r.secondaryCompressionIndex ?? 0) / curve.cc,
    immediateShare: 0.02,
    initialHeightMm: SPECIMEN_HEIGHT_MM,
    diameterMm: SPECIMEN_DIAMETER_MM,
    specificGravity: r.specificGravity ?? 2.65,
    noiseMm: 0.001,
    seed,
  });
}

function curveOf(r: DemoRecord): SyntheticCurve {
  const sigmaV0 = r.verticalEffectiveStress ?? 50;
  return {
    e0: r.initialVoidRatio ?? 1,
    cc: r.compressionIndex ?? 0.3,
    cr: r.recompressionIndex ?? 0.03,
    sigmaPKpa: Math.max(r.preconsolidationStress ?? sigmaV0, sigmaV0),
    sigmaV0Kpa: sigmaV0,
    deltaEOverE0: r.deltaEOverE0 ?? 0.03,
    bendLogCycles: 0.04,
  };
}

/** The gauge slips back at 60 min of the second virgin increment by 1.5 times that increment's compression. */
function slipped(test: IncrementalTestInput, r: DemoRecord): IncrementalTestInput {
  const sigmaP = curveOf(r).sigmaPKpa;
  const list = test.increments;
  const previous = (i: number) => list[i - 1]?.stressKpa ?? 0;
  const virgin = list.flatMap((inc, i) => (i > 0 && inc.stressKpa > previous(i) && previous(i) >= sigmaP ? [i] : []));
  const at = virgin[1] ?? virgin[0] ?? 1;
  const compression = (list[at]?.deformationMm ?? 0) - (list[at - 1]?.deformationMm ?? 0);
  return withDialSlip(test, list[at]?.incrementNo ?? 1, 1.5 * compression, 60);
}
