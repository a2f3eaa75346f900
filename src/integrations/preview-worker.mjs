// @ts-check
// Makes the preview worker entry exist wherever the server runs. The server imports
// `virtual:claybank/preview-worker`, the file URL of the worker's entry:
// - `astro build`: the task module is emitted as its own entry chunk, `preview-worker.mjs` beside
//   `entry.mjs` in the server output, and the URL is Rollup's reference to that chunk, resolved
//   relative to the chunk that imports it (so the built folder can move);
// - `astro dev`: the tsx loader next to the task module, which runs the TypeScript directly.
import { fileURLToPath } from 'node:url';

const VIRTUAL_ID = 'virtual:claybank/preview-worker';
const RESOLVED_ID = `\0${VIRTUAL_ID}`;
const TASK = fileURLToPath(new URL('../lib/server/estimates/preview-task.ts', import.meta.url));
const DEV_ENTRY = new URL('../lib/server/estimates/preview-task-dev.mjs', import.meta.url).href;
export const PREVIEW_WORKER_FILE = 'preview-worker.mjs';

/** @returns {import('vite').Plugin} */
function previewWorkerPlugin() {
  let serving = false;
  let ssrBuild = false;
  /** @type {string | null} */
  let reference = null;
  return {
    name: 'claybank:preview-worker',
    configResolved(config) {
      serving = config.command === 'serve';
      ssrBuild = Boolean(config.build.ssr);
    },
    buildStart() {
      reference = null;
      if (serving || !ssrBuild) return;
      reference = this.emitFile({ type: 'chunk', id: TASK, fileName: PREVIEW_WORKER_FILE });
    },
    resolveId(id) {
      return id === VIRTUAL_ID ? RESOLVED_ID : null;
    },
    load(id) {
      if (id !== RESOLVED_ID) return null;
      if (reference) return `export default import.meta.ROLLUP_FILE_URL_${reference};`;
      if (serving) return `export default ${JSON.stringify(DEV_ENTRY)};`;
      this.error(`${VIRTUAL_ID} is for server code only.`);
    },
  };
}

/** @returns {import('astro').AstroIntegration} */
export function previewWorker() {
  return {
    name: 'claybank:preview-worker',
    hooks: {
      'astro:config:setup': ({ updateConfig }) => {
        updateConfig({ vite: { plugins: [previewWorkerPlugin()] } });
      },
    },
  };
}
