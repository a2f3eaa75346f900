import { defineConfig } from 'vitest/config';

// One config for the suites that run without the built app: unit (pure core) and db (real PostgreSQL).
// The api and browser suites run against the built server and are started by scripts/test.mjs.
export default defineConfig({
  root: new URL('..', import.meta.url).pathname,
  test: {
    environment: 'node',
    testTimeout: 20_000,
    hookTimeout: 30_000,
    projects: [
      { extends: true, test: { name: 'unit', include: ['tests/unit/**/*.test.ts'] } },
      {
        extends: true,
        test: { name: 'db', include: ['tests/db/**/*.test.ts'], fileParallelism: false },
      },
      {
        extends: true,
        test: { name: 'api', include: ['tests/api/**/*.test.ts'], fileParallelism: false },
      },
      {
        extends: true,
        test: { name: 'browser', include: ['tests/browser/**/*.test.ts'], fileParallelism: false, testTimeout: 60_000 },
      },
    ],
  },
});
