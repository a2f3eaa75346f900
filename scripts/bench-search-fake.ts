// Benchmark of the local search fake alone: 100,000 generated records (invented, not data), then
// searches with 6 facets and 2 numeric ranges, in-process and over HTTP through the meilisearch
// client. Prints p50/p95 (not a test).   npm run bench:search-fake [-- --docs 100000 --runs 200]
import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import { parseArgs } from 'node:util';
import { Meilisearch } from 'meilisearch';
import { createSearchFake } from '../fakes/search/app';
import { readSearchBody } from '../fakes/search/search/params';
import { runSearch } from '../fakes/search/search/run-search';

const { values } = parseArgs({
  options: { docs: { type: 'string', default: '100000' }, runs: { type: 'string', default: '200' } },
});
const DOCS = Number(values.docs);
const RUNS = Number(values.runs);

let seed = 20261203;
function random(): number {
  seed = (seed + 0x6d2b79f5) | 0;
  let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
  t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
  return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
}
const pick = <T>(list: T[]): T => list[Math.floor(random() * list.length)] as T;
const between = (lo: number, hi: number, digits = 3) => Number((lo + random() * (hi - lo)).toFixed(digits));

const REGIONS = [
  'North Estuary',
  'South Estuary',
  'Upper Valley',
  'Lower Valley',
  'Coastal Plain',
  'Fenland',
  'Uplands',
  'Harbour',
];
const UNITS = Array.from({ length: 40 }, (_, i) => `Unit ${String.fromCharCode(65 + (i % 26))}${Math.floor(i / 26) + 1} Clay`);
const GENESIS = ['estuarine', 'alluvial', 'glacial', 'lacustrine', 'marine', 'made ground'];
const USCS = ['CH', 'CL', 'MH', 'ML', 'OH', 'OL', 'PT', 'SC', 'SM', 'CL-ML', 'GC', 'SP'];
const METHODS = ['incremental loading', 'constant rate of strain', 'controlled gradient'];
const QUALITY = ['A', 'B', 'C', 'D', 'E'];
const WORDS = [
  'soft',
  'firm',
  'stiff',
  'grey',
  'brown',
  'silty',
  'sandy',
  'organic',
  'shelly',
  'laminated',
  'fissured',
  'clay',
  'silt',
  'peat',
];

function record(i: number) {
  return {
    id: `r${i}`,
    region: pick(REGIONS),
    geological_unit: pick(UNITS),
    genesis: pick(GENESIS),
    uscs_symbol: pick(USCS),
    test_method: pick(METHODS),
    sample_quality: pick(QUALITY),
    own_firm: random() < 0.1,
    bank_version: 1 + Math.floor(random() * 20),
    depth_m: between(0.5, 40, 2),
    wn_percent: between(15, 120, 1),
    ll_percent: between(20, 120, 1),
    pi_percent: between(5, 80, 1),
    e0: between(0.4, 3, 3),
    cc: between(0.05, 1.5),
    cr: between(0.005, 0.2),
    preconsolidation_kpa: between(20, 600, 1),
    ocr: between(1, 8, 2),
    cv_nc_m2_per_year: between(0.1, 20, 2),
    cv_oc_m2_per_year: between(0.5, 60, 2),
    c_alpha: between(0.001, 0.05, 4),
    description: Array.from({ length: 6 }, () => pick(WORDS)).join(' '),
  };
}

const FACETS = ['region', 'geological_unit', 'genesis', 'uscs_symbol', 'test_method', 'sample_quality'];
const NUMERIC = [
  'depth_m',
  'wn_percent',
  'll_percent',
  'pi_percent',
  'e0',
  'cc',
  'cr',
  'preconsolidation_kpa',
  'ocr',
  'cv_nc_m2_per_year',
  'cv_oc_m2_per_year',
  'c_alpha',
];

function query(withStats: boolean) {
  const depthFrom = between(0, 20, 1);
  const filter = [
    `region IN ["${pick(REGIONS)}", "${pick(REGIONS)}", "${pick(REGIONS)}"]`,
    `uscs_symbol != ${pick(USCS)}`,
    `depth_m ${depthFrom} TO ${depthFrom + between(5, 20, 1)}`,
    `cc >= ${between(0.1, 0.6, 2)}`,
  ];
  return {
    filter,
    facets: withStats ? [...FACETS, ...NUMERIC] : FACETS,
    limit: 20,
    sort: random() < 0.5 ? ['cc:desc'] : undefined,
  };
}

function percentiles(samples: number[]) {
  const s = [...samples].sort((a, b) => a - b);
  const at = (p: number) => s[Math.min(s.length - 1, Math.floor(p * s.length))] as number;
  return `p50 ${at(0.5).toFixed(1)} ms, p95 ${at(0.95).toFixed(1)} ms, max ${at(1).toFixed(1)} ms`;
}

const fake = createSearchFake({ dataDir: null, apiKey: 'bench-key-0123456789' });
const server = createServer((req, res) => fake.handle(req, res));
await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
const client = new Meilisearch({
  host: url,
  apiKey: 'bench-key-0123456789',
  defaultWaitOptions: { timeout: 600_000, interval: 50 },
});

let started = performance.now();
const docs = Array.from({ length: DOCS }, (_, i) => record(i));
const index = client.index('bench');
await index
  .updateSettings({
    filterableAttributes: [...FACETS, ...NUMERIC, 'own_firm', 'bank_version'],
    sortableAttributes: ['cc', 'depth_m'],
  })
  .waitTask();
for (let i = 0; i < docs.length; i += 10_000)
  await index.addDocuments(docs.slice(i, i + 10_000), { primaryKey: 'id' }).waitTask();
console.log(`Loaded ${DOCS.toLocaleString('en')} documents over HTTP in ${((performance.now() - started) / 1000).toFixed(1)} s`);

const engineIndex = fake.engine.indexes.get('bench');
if (!engineIndex) throw new Error('the bench index was not created');
for (const withStats of [false, true]) {
  const label = withStats ? '6 facets + stats of 12 numeric facets, 2 ranges' : '6 facets, 2 ranges';
  for (let i = 0; i < 10; i += 1) runSearch(engineIndex, readSearchBody(query(withStats)));
  const inProcess: number[] = [];
  for (let i = 0; i < RUNS; i += 1) {
    const body = readSearchBody(query(withStats));
    started = performance.now();
    runSearch(engineIndex, body);
    inProcess.push(performance.now() - started);
  }
  const overHttp: number[] = [];
  for (let i = 0; i < RUNS; i += 1) {
    const { filter, ...rest } = query(withStats);
    started = performance.now();
    await index.search(null, { filter, ...rest });
    overHttp.push(performance.now() - started);
  }
  console.log(`${label}: in-process ${percentiles(inProcess)}; over HTTP (client) ${percentiles(overHttp)}  [${RUNS} runs each]`);
}
const textRuns: number[] = [];
for (let i = 0; i < RUNS; i += 1) {
  started = performance.now();
  await index.search(pick(['soft clay', 'organic silt', 'fisured', 'laminated grey', 'sil']), {
    filter: query(false).filter,
    facets: FACETS,
  });
  textRuns.push(performance.now() - started);
}
console.log(`with a text query as well, over HTTP: ${percentiles(textRuns)}`);
server.close();
