// The statistics API against the demo bank, as each role: who may read it, the disclosure rule (below it
// an explanation and no pooled numbers; the differencing of two selections), strict input, and that
// every demo deposit has figures to show.
// source: Hundepool et al. (2012), Statistical Disclosure Control, Wiley, §4.2 (threshold and dominance
// rules; differencing attacks), from memory.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PARAMETERS } from '../../src/lib/statistics/parameters';
import { ROLE_EMAILS, type Role } from './support/roles';
import { call, db, firmIdOf, inTenantTransaction, sessionCookie, userIdOf } from './support/world';

type Figures = {
  released: boolean;
  n?: number;
  firms?: number;
  mean?: number;
  p50?: number;
  reasons?: { code: string; message: string }[];
};
type Summary = { parameter: string; pooled: Figures; own: { n: number; p50: number } | null };
type Overview = { basis: { tests: number; bankVersion: number | null }; summaries: Summary[]; cautions: string[] };

const cookies = {} as Record<Role, string | null>;
const DEMO_UNITS = [
  'saltreach-estuarine-clay',
  'vennmoor-peat',
  'vennmoor-organic-clay',
  'orrin-glaciolacustrine-clay',
  'tamsel-alluvial-silt',
];

const summaryOf = (body: unknown, parameter: string) =>
  (body as Overview).summaries.find((s) => s.parameter === parameter) as Summary;

beforeAll(async () => {
  for (const role of ['aEngineer', 'aEstimator', 'aContributor', 'steward', 'platformAdmin', 'bAdmin'] as const) {
    cookies[role] = await sessionCookie(await userIdOf(ROLE_EMAILS[role]));
  }
  cookies.anon = null;
});

afterAll(async () => {
  await db.destroy();
});

describe('statistics as each role', () => {
  it.each([
    ['anon', 401],
    ['aEstimator', 200],
    ['aContributor', 200],
    ['aEngineer', 200],
    ['steward', 200],
    ['platformAdmin', 200],
  ] as const)('%s reads /api/statistics: %i', async (role, status) => {
    const result = await call('GET', '/api/statistics?unit=saltreach-estuarine-clay', cookies[role]);
    expect(result.status, result.text.slice(0, 200)).toBe(status);
  });

  it('gives an estimator statistics but not the records behind them', async () => {
    expect((await call('GET', '/api/records?limit=5', cookies.aEstimator)).status).toBe(403);
    const result = await call('GET', '/api/statistics/correlation?unit=saltreach-estuarine-clay&pair=cc-ll', cookies.aEstimator);
    expect(result.status).toBe(200);
    expect(result.text).not.toMatch(/"id":"[0-9a-f-]{36}"/);
  });

  it("shows a firm's own figures to its members and none to a steward", async () => {
    const own = summaryOf(
      (await call('GET', '/api/statistics?unit=saltreach-estuarine-clay', cookies.aEngineer)).body,
      'compressionIndex',
    );
    expect(own.own?.n).toBeGreaterThan(0);
    const steward = summaryOf(
      (await call('GET', '/api/statistics?unit=saltreach-estuarine-clay', cookies.steward)).body,
      'compressionIndex',
    );
    expect(steward.own).toBeNull();
  });
});

describe('the demo bank', () => {
  it.each(DEMO_UNITS)('%s passes the rule: Cc and cv NC pooled from at least 2 firms, with the cautions', async (unit) => {
    const result = await call('GET', `/api/statistics?unit=${unit}`, cookies.aEngineer);
    expect(result.status).toBe(200);
    for (const parameter of ['compressionIndex', 'cvNcM2PerYear']) {
      const pooled = summaryOf(result.body, parameter).pooled;
      expect(pooled.released, `${unit} ${parameter}: ${JSON.stringify(pooled.reasons)}`).toBe(true);
      expect(pooled.firms).toBeGreaterThanOrEqual(2);
      expect(pooled.n).toBeGreaterThanOrEqual(5);
    }
    expect((result.body as Overview).cautions.join(' ')).toContain('No substitute for site-specific investigation');
  });

  it('explains a thin selection instead of showing pooled numbers', async () => {
    const result = await call('GET', '/api/statistics?unit=saltreach-estuarine-clay&depth=10..10.5', cookies.aEngineer);
    expect(result.status).toBe(200);
    const pooled = summaryOf(result.body, 'compressionIndex').pooled;
    expect(pooled.released).toBe(false);
    expect(pooled.reasons?.[0]?.message).toMatch(/tests|firm/);
    for (const key of ['mean', 'sd', 'p5', 'p10', 'p50', 'p90', 'p95']) expect(pooled).not.toHaveProperty(key);
  });
});

/**
 * Two selections of the estuarine clay by depth that differ by exactly one published test of another
 * firm (firm B or C, seen from firm A): the top of the depth range is moved past that one test.
 */
async function oneOtherFirmTestApart(viewerFirmId: string) {
  const rows = await inTenantTransaction(db, { firmId: null, platformRole: 'steward' }, (trx) =>
    trx
      .selectFrom('test_record as r')
      .innerJoin('geological_unit as u', 'u.id', 'r.geological_unit_id')
      .select(['r.firm_id as firmId', 'r.depth_top_m as depthTopM', 'r.compression_index as cc'])
      .where('u.slug', '=', 'saltreach-estuarine-clay')
      .where('r.status', '=', 'published')
      .orderBy('r.depth_top_m')
      .execute(),
  );
  // from the deep end, so that the selections below it hold enough tests to pass the rule
  for (let i = rows.length - 1; i > 40; i--) {
    const row = rows[i];
    const below = rows[i - 1];
    if (!row || !below || row.firmId === viewerFirmId || row.cc === null) continue;
    if (row.depthTopM === below.depthTopM || rows[i + 1]?.depthTopM === row.depthTopM) continue;
    return { lower: (below.depthTopM + row.depthTopM) / 2, upper: row.depthTopM, trueCc: row.cc };
  }
  throw new Error('No depth isolates one test of another firm in the demo bank.');
}

describe('differencing', () => {
  it("two selections differing by one other firm's test reveal only its masked value, at least a tenth away from the truth", async () => {
    const firmA = await firmIdOf('quillfen');
    const { lower, upper, trueCc } = await oneOtherFirmTestApart(firmA);
    const read = async (top: number) =>
      summaryOf(
        (await call('GET', `/api/statistics?unit=saltreach-estuarine-clay&depth=0..${top}`, cookies.aEngineer)).body,
        'compressionIndex',
      ).pooled;
    const without = await read(lower);
    const withIt = await read(upper);
    expect(without.released && withIt.released).toBe(true);
    expect(withIt.n).toBe((without.n as number) + 1);
    // n·mean of the one selection less that of the other is the added test's value as the figures use it
    const recovered = (withIt.n as number) * (withIt.mean as number) - (without.n as number) * (without.mean as number);
    const error = Math.abs(recovered - trueCc) / trueCc;
    // the masking band of Cc is a third to two thirds of its usual spread (0.3): 10–20 %
    const band = PARAMETERS.compressionIndex.maskBand;
    expect(error).toBeGreaterThanOrEqual(band.min - 1e-9);
    expect(error).toBeLessThanOrEqual(band.max + 1e-9);
  });

  it("never shows another firm's points when the rule does not hold for the plotted selection", async () => {
    const result = await call(
      'GET',
      '/api/statistics/correlation?unit=saltreach-estuarine-clay&depth=10..10.5&pair=cc-ll',
      cookies.aEngineer,
    );
    expect(result.status).toBe(200);
    const correlation = (result.body as { correlation: { pooled: { released: boolean; points?: unknown } } }).correlation;
    expect(correlation.pooled.released).toBe(false);
    expect(correlation.pooled).not.toHaveProperty('points');
  });
});

describe('each view', () => {
  it('draws a correlation with its line, bands and the published lines named', async () => {
    const result = await call('GET', '/api/statistics/correlation?unit=saltreach-estuarine-clay&pair=cc-ll', cookies.aEngineer);
    const { correlation, published } = result.body as {
      correlation: {
        pooled: { released: boolean; line: { bands: unknown[]; fit: { rSquared: number } } };
        published: { source: string }[];
      };
      published: { correlation: { source: string } }[];
    };
    expect(correlation.pooled.released).toBe(true);
    expect(correlation.pooled.line.bands.length).toBeGreaterThan(2);
    expect(correlation.pooled.line.fit.rSquared).toBeGreaterThan(0);
    expect(correlation.published.map((p) => p.source).join(' ')).toContain('Skempton');
    expect(published.length).toBe(correlation.published.length);
  });

  it("gives the depth profiles with the σ'v0 line from the unit weights", async () => {
    const result = await call('GET', '/api/statistics/profile?unit=saltreach-estuarine-clay&waterTableM=1.5', cookies.aEngineer);
    const body = result.body as {
      profile: { panels: { parameter: string }[]; effectiveStressLine: { effectiveStressKpa: number[] } };
      stressLine: { waterTableM: number };
    };
    expect(body.profile.panels.map((p) => p.parameter)).toEqual([
      'waterContentPct',
      'liquidLimitPct',
      'initialVoidRatio',
      'compressionIndex',
      'preconsolidationStressKpa',
      'overconsolidationRatio',
    ]);
    expect(body.stressLine.waterTableM).toBe(1.5);
    expect(body.profile.effectiveStressLine.effectiveStressKpa.at(-1)).toBeGreaterThan(0);
  });

  it('places two site results in the distribution, a gross one flagged', async () => {
    const result = await call('POST', '/api/statistics/compare?unit=saltreach-estuarine-clay', cookies.aEngineer, {
      values: { compressionIndex: [0.75, 9] },
    });
    expect(result.status).toBe(200);
    const [comparison] = (
      result.body as { comparisons: { basis: string; results: { percentile: number; outlier: string | null }[] }[] }
    ).comparisons;
    expect(comparison?.basis).toBe('pooled');
    expect(comparison?.results[0]?.outlier).toBeNull();
    expect(comparison?.results[0]?.percentile).toBeGreaterThan(20);
    expect(comparison?.results[1]?.outlier).toBe('high');
  });
});

describe('bad input is refused in the error shape', () => {
  it.each([
    ['GET', '/api/statistics?colour=red', 'colour'],
    ['GET', '/api/statistics?depth=15..5', 'depth'],
    ['GET', '/api/statistics?unit=Not%20A%20Slug', 'unit.0'],
    ['GET', '/api/statistics/correlation?unit=vennmoor-peat', 'pair'],
    ['GET', '/api/statistics/correlation?pair=cc-xx', 'pair'],
    ['GET', '/api/statistics/profile?waterTableM=-3', 'waterTableM'],
    ['GET', '/api/statistics?weighting=heavy', 'weighting'],
  ])('%s %s → 400 naming %s', async (method, path, field) => {
    const result = await call(method, path, cookies.aEngineer);
    expect(result.status).toBe(400);
    const body = result.body as { error: { code: string; issues: { path: string }[] } };
    expect(body.error.code).toBe('VALIDATION_FAILED');
    expect(JSON.stringify(body.error.issues)).toContain(field);
  });

  it.each([
    [{ values: {} }, 'values'],
    [{ values: { compressionIndex: ['a'] } }, 'values.compressionIndex.0'],
    [{ values: { compressionIndex: [1] }, extra: 1 }, ''],
    [{ values: { notAParameter: [1] } }, 'values'],
    [{ values: { compressionIndex: Array.from({ length: 21 }, () => 1) } }, 'values.compressionIndex'],
  ])('compare refuses %j', async (body, path) => {
    const result = await call('POST', '/api/statistics/compare?unit=saltreach-estuarine-clay', cookies.aEngineer, body);
    expect(result.status).toBe(400);
    const error = (result.body as { error: { code: string; issues: { path: string }[] } }).error;
    expect(error.code).toBe('VALIDATION_FAILED');
    expect(error.issues.some((i) => i.path === path)).toBe(true);
  });
});
