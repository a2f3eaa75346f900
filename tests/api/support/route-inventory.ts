import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { LIBRARY_ROUTES } from '../../../src/lib/server/auth/library-routes';

const pagesDir = join(import.meta.dirname, '../../../src/pages');

function walk(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    return entry.isDirectory() ? walk(path) : [path];
  });
}

/** Astro's file name → URL pattern: `[id]` → `:id`, `[...all]` → `*all`, `index` dropped. */
function routePattern(file: string): string {
  const path = relative(pagesDir, file)
    .replace(/\.(ts|astro)$/, '')
    .replace(/(^|\/)index$/, '')
    .replace(/\[\.\.\.(\w+)\]/g, '*$1')
    .replace(/\[(\w+)\]/g, ':$1');
  return `/${path}`;
}

/**
 * Every route the app serves, as `METHOD /pattern` for endpoints and `PAGE /pattern` for pages,
 * read from the files under src/pages (so a new file shows up here by itself), and the sign-in
 * library's routes that its catch-all lets through (from the allow-list in library-routes.ts).
 */
export function routeInventory(): string[] {
  const routes: string[] = [];
  for (const file of walk(pagesDir)) {
    if (file.endsWith('.astro')) routes.push(`PAGE ${routePattern(file)}`);
    if (file.endsWith('.ts')) {
      const methods = [...readFileSync(file, 'utf8').matchAll(/export const (GET|POST|PUT|PATCH|DELETE|ALL)\b/g)].map(
        (m) => m[1],
      );
      for (const method of methods) routes.push(`${method} ${routePattern(file)}`);
    }
  }
  for (const route of LIBRARY_ROUTES) routes.push(`${route.method} ${route.path}`);
  return routes.sort();
}
