// The request body shown in the README's `POST /api/estimates/preview` section (used by the tests
// and by bench:preview, so the documented example is the one checked and measured).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';

/** @returns {unknown} the parsed JSON example */
export function readmePreviewExample() {
  const readme = readFileSync(join(import.meta.dirname, '..', '..', 'README.md'), 'utf8');
  const section = readme.slice(readme.indexOf('### `POST /api/estimates/preview`'));
  return JSON.parse(/```json\n([\s\S]*?)```/.exec(section)?.[1] ?? '');
}
