import { defineConfig } from 'vitest/config';

// npm run test:slow: the long statistical checks, the full fuzz of the case reader and the killed
// report at every step, left out of the default suite.
const PACKAGE = 'test/slow/package.test.ts';

export default defineConfig({
  test: {
    // A process per file (process.cpuUsage, the fuzz's bound per input, is then that file's own), and
    // two at a time: vitest's default on a 2-core machine is one, leaving a core idle through the
    // fuzz's shards (test/slow/fuzz-case-*.test.ts).
    pool: 'forks',
    maxWorkers: 2,
    testTimeout: 600_000,
    env: { TZ: 'UTC' },
    projects: [
      // The package test rebuilds dist/ (tsc rewrites every file); it runs first and alone, so no
      // test that runs the built CLI (the fuzz's processes, the killed report) reads a file mid-write.
      { extends: true, test: { name: 'build', include: [PACKAGE], sequence: { groupOrder: 0 } } },
      { extends: true, test: { name: 'slow', include: ['test/slow/**/*.test.ts'], exclude: [PACKAGE, 'node_modules/**'], sequence: { groupOrder: 1 } } },
    ],
  },
});
