// Worker entry for `astro dev` and the tests: loads the TypeScript task through tsx. Built apps use
// the bundled preview-worker.mjs instead (src/integrations/worker-entries.mjs).
import { tsImport } from 'tsx/esm/api';

const task = await tsImport('./preview-task.ts', import.meta.url);

export default task.default;
