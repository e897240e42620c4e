import { configDefaults, defineConfig } from 'vitest/config';

/** Files that mock a module (vi.mock): they get a module graph of their own. */
const MOCKING = ['test/cli/report-pdf.test.ts', 'test/io/write-report-faults.test.ts'];

export default defineConfig({
  test: {
    // Long convergence studies are in test/slow/ (npm run test:slow, vitest.slow.config.ts).
    exclude: ['test/slow/**', 'node_modules/**'],
    // A margin for a loaded 2-core machine (the browser test, the built CLI); no test here is long by nature.
    testTimeout: 60_000,
    hookTimeout: 60_000,
    env: { TZ: 'UTC' },
    projects: [
      {
        extends: true,
        // One module graph per worker: the engine, the report's libraries and the shared report
        // fixtures (test/report/report-fixtures.ts) load once per worker, not once per file.
        test: { name: 'shared', include: ['test/**/*.test.ts'], exclude: ['test/slow/**', 'node_modules/**', ...MOCKING], isolate: false },
      },
      { extends: true, test: { name: 'mocking', include: MOCKING } },
    ],
  },
});
