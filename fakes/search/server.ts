// A local stand-in for the search service (the part of Meilisearch's HTTP API the app's client uses),
// on 127.0.0.1. Port and data folder from the environment or the command line; the key from the
// environment only, so it never shows in a process list.
//   SEARCH_FAKE_PORT=7700 SEARCH_FAKE_DATA_DIR=.data/search SEARCH_FAKE_KEY=… tsx fakes/search/server.ts
import { createServer } from 'node:http';
import { parseArgs } from 'node:util';
import { createSearchFake } from './app';

const { values } = parseArgs({
  options: {
    port: { type: 'string', default: process.env.SEARCH_FAKE_PORT ?? '7700' },
    dir: { type: 'string', default: process.env.SEARCH_FAKE_DATA_DIR ?? '' },
  },
});
const host = '127.0.0.1';
const port = Number(values.port);
const apiKey = process.env.SEARCH_FAKE_KEY || null;
const fake = createSearchFake({ dataDir: values.dir || null, apiKey });
const server = createServer((req, res) => fake.handle(req, res));

server.listen(port, host, () => {
  const where = values.dir ? `data in ${values.dir}` : 'in memory only';
  console.log(`[search fake] http://${host}:${port} (${where}${apiKey ? ', key required' : ', no key'})`);
});

let stopping = false;
async function shutdown() {
  if (stopping) return;
  stopping = true;
  server.close();
  await fake.engine.idle();
  process.exit(0);
}
process.on('SIGTERM', () => void shutdown());
process.on('SIGINT', () => void shutdown());
