// Serves a built Claybank (Astro's Node adapter, standalone handler) on HOST:PORT.
//   CLAYBANK_BUILD_DIR=dist NODE_ENV=production node scripts/serve.mjs
// The client address the app sees (rate limits, audit log) is the socket's. X-Forwarded-For is
// dropped unless TRUSTED_PROXY_HOPS says how many proxies in front of the app append to it; then the
// entry that the outermost trusted proxy added is kept. (Astro would otherwise believe the first
// entry, which any client can write.)
import { createServer } from 'node:http';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { trustedForwardedFor } from './lib/forwarded.mjs';

process.env.ASTRO_NODE_AUTOSTART = 'disabled';
const buildDir = resolve(process.env.CLAYBANK_BUILD_DIR ?? join(import.meta.dirname, '..', 'dist'));
const host = process.env.HOST ?? '127.0.0.1';
const port = Number(process.env.PORT ?? 4321);
const trustedHops = Number(process.env.TRUSTED_PROXY_HOPS ?? 0);

const { handler } = await import(pathToFileURL(join(buildDir, 'server', 'entry.mjs')).href);

const server = createServer((req, res) => {
  const trusted = trustedForwardedFor(req.headers['x-forwarded-for'], trustedHops);
  delete req.headers['x-forwarded-for'];
  if (trusted) req.headers['x-forwarded-for'] = trusted;
  handler(req, res);
});
server.listen(port, host, () => console.log(`Claybank listening on http://${host}:${port}`));

for (const signal of ['SIGTERM', 'SIGINT']) {
  process.on(signal, () => {
    server.close(() => process.exit(0));
    server.closeAllConnections();
    setTimeout(() => process.exit(0), 3000).unref();
  });
}
