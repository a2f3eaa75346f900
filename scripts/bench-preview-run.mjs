// The measuring half of `npm run bench:preview` (started by scripts/bench-preview.mjs against a
// served build). Latencies are collected per response and their p50/p95 computed here
// (autocannon's summary has no p95).
import autocannon from 'autocannon';
import { previewEstimate } from '../src/lib/consolidation/index.ts';
import { estimatePreviewSchema } from '../src/lib/schemas/estimate-preview.ts';
import { readmePreviewExample } from './lib/readme-preview-example.mjs';

const base = process.env.BENCH_BASE_URL;
const signIns = JSON.parse(await (await import('node:fs/promises')).readFile(process.env.BENCH_SIGN_INS ?? '', 'utf8'));
const SECONDS = Number(process.env.BENCH_SECONDS ?? 15);
const example = readmePreviewExample();
const exampleText = JSON.stringify(example);

function percentile(sorted, p) {
  if (!sorted.length) return Number.NaN;
  const h = (sorted.length - 1) * p;
  const k = Math.floor(h);
  return sorted[k] + (h - k) * ((sorted[Math.min(k + 1, sorted.length - 1)] ?? sorted[k]) - sorted[k]);
}
const summary = (values) => {
  const sorted = [...values].sort((a, b) => a - b);
  return { n: sorted.length, p50: percentile(sorted, 0.5), p95: percentile(sorted, 0.95) };
};
const ms = (x) => `${x.toFixed(0)} ms`;

async function signIn() {
  const engineer = signIns.find((person) => person.email.startsWith('engineer@'));
  const response = await fetch(`${base}/api/session/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base },
    body: JSON.stringify({ email: engineer.email, password: engineer.password }),
  });
  if (response.status !== 200) throw new Error(`sign-in answered ${response.status}`);
  return response.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
}

/** Runs autocannon for `seconds` and returns per-response latencies (ms) and status counts. */
function load({ path, method = 'GET', body, cookie, connections, seconds = SECONDS }) {
  return new Promise((resolve, reject) => {
    const latencies = [];
    const statuses = {};
    const instance = autocannon(
      {
        url: `${base}${path}`,
        method,
        body,
        connections,
        duration: seconds,
        headers: {
          origin: base,
          ...(cookie ? { cookie } : {}),
          ...(body ? { 'content-type': 'application/json' } : {}),
        },
      },
      (error) => (error ? reject(error) : resolve({ latencies, statuses })),
    );
    instance.on('response', (_client, statusCode, _bytes, responseTime) => {
      latencies.push(responseTime);
      statuses[statusCode] = (statuses[statusCode] ?? 0) + 1;
    });
  });
}

function engineTimes(runs = 20) {
  const input = estimatePreviewSchema.parse(example);
  for (let i = 0; i < 5; i++) previewEstimate(input);
  const engine = [];
  const stringify = [];
  for (let i = 0; i < runs; i++) {
    const started = performance.now();
    const result = previewEstimate(input);
    const computed = performance.now();
    JSON.stringify(result);
    engine.push(computed - started);
    stringify.push(performance.now() - computed);
  }
  return { engine: summary(engine), stringify: summary(stringify) };
}

const cookie = await signIn();
const preview = { path: '/api/estimates/preview', method: 'POST', body: exampleText, cookie };
const health = { path: '/api/health' };
console.log(`bench:preview — ${base}, ${SECONDS} s per phase, README preview example (5000 realisations)\n`);

await load({ ...health, connections: 1, seconds: 3 });
const idle = await load({ ...health, connections: 1 });
const idleHealth = summary(idle.latencies);
console.log(
  `/api/health, 1 client, idle:            p50 ${ms(idleHealth.p50)}, p95 ${ms(idleHealth.p95)} (${idleHealth.n} requests)`,
);

await load({ ...preview, connections: 1, seconds: 3 });
const single = await load({ ...preview, connections: 1 });
const singlePreview = summary(single.latencies);
const engine = engineTimes();
console.log(
  `preview, 1 client:                      p50 ${ms(singlePreview.p50)}, p95 ${ms(singlePreview.p95)} (${singlePreview.n} requests, statuses ${JSON.stringify(single.statuses)})`,
);
console.log(
  `engine alone, same input, in-process:   p50 ${ms(engine.engine.p50)}, p95 ${ms(engine.engine.p95)} (JSON.stringify of the result adds ${engine.stringify.p50.toFixed(1)} ms)`,
);

const [busy, loaded] = await Promise.all([
  load({ ...preview, connections: 4 }),
  new Promise((resolve) => setTimeout(resolve, 1000)).then(() => load({ ...health, connections: 1, seconds: SECONDS - 2 })),
]);
const loadedHealth = summary(loaded.latencies);
const busyPreview = summary(busy.latencies);
console.log(
  `/api/health, 1 client, 4 on previews:   p50 ${ms(loadedHealth.p50)}, p95 ${ms(loadedHealth.p95)} (${loadedHealth.n} requests)`,
);
console.log(
  `preview, 4 clients:                     p50 ${ms(busyPreview.p50)}, p95 ${ms(busyPreview.p95)} (${busyPreview.n} requests, statuses ${JSON.stringify(busy.statuses)})`,
);
const ratio = loadedHealth.p95 / idleHealth.p95;
console.log(`\nhealth p95 under load / idle p95: ${ratio.toFixed(2)} (target ≤ 2) ${ratio <= 2 ? 'met' : 'NOT met'}`);
