import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { expect, it } from 'vitest';

const root = join(import.meta.dirname, '../../..');
const ALLOWED = new Set([
  'astro.config.mjs',
  'package.json',
  'package-lock.json',
  'tsconfig.json',
  'biome.json',
  'src',
  'migrations',
  'tests',
  'fakes',
  'public',
  'scripts',
  '.ci',
  'README.md',
  'DEVELOPERS.md',
  '.gitignore',
  '.git',
]);
const GENERATED = new Set(['node_modules', 'dist', '.astro', '.data']);

it('keeps the top level to the agreed layout (DEVELOPERS.md)', () => {
  const extra = readdirSync(root).filter((name) => !ALLOWED.has(name) && !GENERATED.has(name));
  expect(extra).toEqual([]);
});
