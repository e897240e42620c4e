import { defineConfig } from 'vitest/config';

// npm run test:slow: the long statistical checks, left out of the default suite.
export default defineConfig({
  test: {
    include: ['test/slow/**/*.test.ts'],
    testTimeout: 600_000,
    env: { TZ: 'UTC' },
  },
});
