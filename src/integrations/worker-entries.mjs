// @ts-check
// Makes the worker-thread entries exist wherever the server runs. For each entry below the server
// imports `virtual:claybank/<name>-worker`, the file URL of that worker's entry:
// - `astro build`: the task module is emitted as its own entry chunk, `<name>-worker.mjs` beside
//   `entry.mjs` in the server output, and the URL is Rollup's reference to that chunk, resolved
//   relative to the chunk that imports it (so the built folder can move);
// - `astro dev`: the tsx loader next to the task module, which runs the TypeScript directly.
// A new kind of CPU-heavy task adds one line to WORKERS (and a `declare module` in src/env.d.ts).
import { fileURLToPath } from 'node:url';

/** name → the task module (the worker's default export) and its tsx loader for `astro dev`. */
const WORKERS = {
  preview: { task: '../lib/server/estimates/preview-task.ts', dev: '../lib/server/estimates/preview-task-dev.mjs' },
  statistics: { task: '../lib/server/statistics/statistics-task.ts', dev: '../lib/server/statistics/statistics-task-dev.mjs' },
};

const entries = Object.entries(WORKERS).map(([name, files]) => ({
  name,
  virtualId: `virtual:claybank/${name}-worker`,
  resolvedId: `\0virtual:claybank/${name}-worker`,
  task: fileURLToPath(new URL(files.task, import.meta.url)),
  devEntry: new URL(files.dev, import.meta.url).href,
  fileName: `${name}-worker.mjs`,
}));

/** @returns {import('vite').Plugin} */
function workerEntriesPlugin() {
  let serving = false;
  let ssrBuild = false;
  /** @type {Map<string, string>} */
  const references = new Map();
  return {
    name: 'claybank:worker-entries',
    configResolved(config) {
      serving = config.command === 'serve';
      ssrBuild = Boolean(config.build.ssr);
    },
    buildStart() {
      references.clear();
      if (serving || !ssrBuild) return;
      for (const entry of entries) {
        references.set(entry.resolvedId, this.emitFile({ type: 'chunk', id: entry.task, fileName: entry.fileName }));
      }
    },
    resolveId(id) {
      return entries.find((entry) => entry.virtualId === id)?.resolvedId ?? null;
    },
    load(id) {
      const entry = entries.find((e) => e.resolvedId === id);
      if (!entry) return null;
      const reference = references.get(id);
      if (reference) return `export default import.meta.ROLLUP_FILE_URL_${reference};`;
      if (serving) return `export default ${JSON.stringify(entry.devEntry)};`;
      this.error(`${entry.virtualId} is for server code only.`);
    },
  };
}

/** @returns {import('astro').AstroIntegration} */
export function workerEntries() {
  return {
    name: 'claybank:worker-entries',
    hooks: {
      'astro:config:setup': ({ updateConfig }) => {
        updateConfig({ vite: { plugins: [workerEntriesPlugin()] } });
      },
    },
  };
}
