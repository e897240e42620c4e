import { defineConfig } from 'vitest/config';

// npm run test:slow: the long statistical checks, the full fuzz of the case reader and the killed
// report at every step, left out of the default suite.
export default defineConfig({
  test: {
    include: ['test/slow/**/*.test.ts'],
    // A process per file (process.cpuUsage, the fuzz's bound per input, is then that file's own), and
    // two at a time: vitest's default on a 2-core machine is one, leaving a core idle through the
    // fuzz's shards (test/slow/fuzz-case-*.test.ts).
    pool: 'forks',
    maxWorkers: 2,
    testTimeout: 600_000,
    env: { TZ: 'UTC' },
  },
});
