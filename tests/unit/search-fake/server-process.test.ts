// The fake as `npm start` runs it: a separate process configured by the environment. A task reported
// succeeded is on disk, so killing the process outright (SIGKILL) loses nothing that was acknowledged.
import { type ChildProcess, spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Meilisearch } from 'meilisearch';
import { afterAll, describe, expect, it } from 'vitest';

const root = join(import.meta.dirname, '../../..');
const dataDir = mkdtempSync(join(tmpdir(), 'claybank-search-process-'));
const key = randomBytes(16).toString('hex');
let child: ChildProcess | null = null;

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const server = createServer().listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
  });
}

async function start(port: number): Promise<void> {
  // node itself (not the tsx wrapper), so SIGKILL reaches the server and not only a parent process.
  child = spawn(process.execPath, ['--import', 'tsx', 'fakes/search/server.ts'], {
    cwd: root,
    env: { ...process.env, SEARCH_FAKE_PORT: String(port), SEARCH_FAKE_DATA_DIR: dataDir, SEARCH_FAKE_KEY: key },
    stdio: 'ignore',
  });
  for (let attempt = 0; attempt < 100; attempt += 1) {
    const up = await fetch(`http://127.0.0.1:${port}/health`).catch(() => null);
    if (up?.ok) return;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error('the search fake did not start');
}

afterAll(() => {
  child?.kill('SIGKILL');
  rmSync(dataDir, { recursive: true, force: true });
});

describe('the search fake as a process', () => {
  it('keeps every acknowledged write through a SIGKILL and ignores half-written files', async () => {
    const port = await freePort();
    await start(port);
    const client = new Meilisearch({ host: `http://127.0.0.1:${port}`, apiKey: key });
    const index = client.index('records');
    const added = await index
      .addDocuments(
        [
          { id: 'a', unit: 'Marsh Peat' },
          { id: 'b', unit: 'River Sand' },
        ],
        { primaryKey: 'id' },
      )
      .waitTask();
    expect(added.status).toBe('succeeded');
    expect((await index.updateFilterableAttributes(['unit']).waitTask()).status).toBe('succeeded');
    child?.kill('SIGKILL');
    await new Promise((r) => setTimeout(r, 200));
    writeFileSync(join(dataDir, 'indexes', 'records.json.tmp-99999'), '{"half": ');

    await start(port);
    const again = new Meilisearch({ host: `http://127.0.0.1:${port}`, apiKey: key });
    const result = await again.index('records').search(null, { filter: 'unit = "river sand"' });
    expect(result.hits).toEqual([{ id: 'b', unit: 'River Sand' }]);
    expect((await again.tasks.getTask(added.uid)).status).toBe('succeeded');
    expect((await fetch(`http://127.0.0.1:${port}/indexes`)).status).toBe(401);
  });
});
