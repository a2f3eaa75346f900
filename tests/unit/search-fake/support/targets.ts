// Where the contract tests run: the local fake (started in-process on a free port, with a key and a
// data folder) always, and a real Meilisearch when MEILISEARCH_CONTRACT_URL and
// MEILISEARCH_CONTRACT_KEY are set. Tests that need to restart the service run against the fake only.
import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Meilisearch } from 'meilisearch';
import { createSearchFake, type SearchFake } from '../../../../fakes/search/app';

export interface ContractTarget {
  name: string;
  url: string;
  key: string;
  client: Meilisearch;
  /** Stops and starts the service on the same data (the fake only). */
  restart?: () => Promise<void>;
  close: () => Promise<void>;
}

export const realConfigured = Boolean(process.env.MEILISEARCH_CONTRACT_URL && process.env.MEILISEARCH_CONTRACT_KEY);

export const TARGETS = [
  { name: 'the local search fake', real: false, skip: false },
  {
    name: 'a real Meilisearch',
    real: true,
    skip: !realConfigured,
  },
] as const;

if (!realConfigured) {
  console.info(
    'Search contract: no real Meilisearch configured, so its half of these tests is skipped (set MEILISEARCH_CONTRACT_URL and MEILISEARCH_CONTRACT_KEY to run it).',
  );
}

export const SKIP_NOTE = realConfigured
  ? ''
  : ' (skipped: set MEILISEARCH_CONTRACT_URL and MEILISEARCH_CONTRACT_KEY to run these against a real Meilisearch)';

async function listen(fake: SearchFake, port = 0): Promise<Server> {
  const server = createServer((req, res) => fake.handle(req, res));
  await new Promise<void>((resolve) => server.listen(port, '127.0.0.1', resolve));
  return server;
}

async function stop(server: Server, fake: SearchFake): Promise<void> {
  server.closeAllConnections();
  await new Promise<void>((resolve) => server.close(() => resolve()));
  await fake.engine.idle();
  // Let the client's pooled keep-alive sockets see the close before the next request.
  await new Promise((resolve) => setTimeout(resolve, 50));
}

export async function startFake(): Promise<ContractTarget> {
  const dataDir = mkdtempSync(join(tmpdir(), 'claybank-search-fake-'));
  const key = randomBytes(16).toString('hex');
  let fake = createSearchFake({ dataDir, apiKey: key });
  let server = await listen(fake);
  const { port } = server.address() as AddressInfo;
  const url = `http://127.0.0.1:${port}`;
  return {
    name: 'fake',
    url,
    key,
    client: new Meilisearch({ host: url, apiKey: key, defaultWaitOptions: { interval: 10, timeout: 10_000 } }),
    restart: async () => {
      await stop(server, fake);
      fake = createSearchFake({ dataDir, apiKey: key });
      server = await listen(fake, port);
    },
    close: async () => {
      await stop(server, fake);
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
}

export async function startTarget(real: boolean): Promise<ContractTarget> {
  if (!real) return startFake();
  const url = process.env.MEILISEARCH_CONTRACT_URL as string;
  const key = process.env.MEILISEARCH_CONTRACT_KEY as string;
  return {
    name: 'real',
    url,
    key,
    client: new Meilisearch({ host: url, apiKey: key, defaultWaitOptions: { interval: 20, timeout: 30_000 } }),
    close: async () => {},
  };
}

/** A fresh index name, so runs against a shared server never collide. */
export function uniqueUid(label: string): string {
  return `contract_${label}_${randomBytes(4).toString('hex')}`;
}
