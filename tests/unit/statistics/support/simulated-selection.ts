import { columnsFromRecords, type StatisticsRecord } from '../../../../src/lib/statistics';

/** mulberry32: a small seeded generator, so every simulated case is reproducible. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Standard normal deviates by the Box–Muller transform. */
export function normalFrom(random: () => number): () => number {
  return () => Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random());
}

export interface SimulationOptions {
  seed: number;
  count: number;
  /** Share of the rows per firm, e.g. [0.55, 0.3, 0.15]. */
  firmShares?: readonly number[];
}

/**
 * An invented soft clay: LL ~ N(70, 12) %, wn = LL·1.1 ± 8, e0 = 0.027·wn ± 0.15, Cc = 0.009(LL − 10)
 * ± 0.08, Cr = 0.1·Cc ± 0.01, Cα = 0.04·Cc ± 0.004, cv NC log-normal (median 1 m²/year, ln sd 0.8)
 * falling with LL, σ'p = 20 + 6·depth ± 8 kPa, quality classes mixed, CH and OH symbols.
 */
export function simulatedRecords({ seed, count, firmShares = [0.55, 0.3, 0.15] }: SimulationOptions): StatisticsRecord[] {
  const random = seededRandom(seed);
  const normal = normalFrom(random);
  const records: StatisticsRecord[] = [];
  for (let i = 0; i < count; i++) {
    let pick = random();
    let firm = 0;
    while (firm < firmShares.length - 1 && pick >= (firmShares[firm] as number)) {
      pick -= firmShares[firm] as number;
      firm++;
    }
    const depthM = 1 + random() * 24;
    const ll = 70 + 12 * normal();
    const wn = 1.1 * ll + 8 * normal();
    const cc = 0.009 * (ll - 10) + 0.08 * normal();
    const sigmaP = 20 + 6 * depthM + 8 * normal();
    const sigmaV = 8 * depthM;
    records.push({
      firmId: `firm-${firm}`,
      recordKey: Math.floor(random() * 2 ** 32),
      depthM,
      sampleQualityClass: 1 + Math.floor(random() * 4),
      uscsSymbol: random() < 0.8 ? 'CH' : 'OH',
      liquidLimitPct: ll,
      waterContentPct: wn,
      plasticityIndexPct: 0.6 * ll - 5 + 4 * normal(),
      specificGravity: 2.68 + 0.03 * normal(),
      initialVoidRatio: 0.027 * wn + 0.15 * normal(),
      compressionIndex: cc,
      recompressionIndex: 0.1 * cc + 0.01 * normal(),
      secondaryCompressionIndex: 0.04 * cc + 0.004 * normal(),
      cvNcM2PerYear: Math.exp(-0.02 * (ll - 70) + 0.8 * normal()),
      cvOcM2PerYear: Math.exp(Math.log(6) + 0.7 * normal()),
      preconsolidationStressKpa: sigmaP,
      verticalEffectiveStressKpa: sigmaV,
      overconsolidationRatio: sigmaP / sigmaV,
      permeabilityMPerS: Math.exp(Math.log(1e-9) + 1.0 * normal()),
    });
  }
  return records;
}

export function simulatedColumns(options: SimulationOptions) {
  return columnsFromRecords(simulatedRecords(options));
}
