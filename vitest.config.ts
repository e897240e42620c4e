import { configDefaults, defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    // The long statistical checks run with npm run test:slow (vitest.slow.config.ts).
    exclude: [...configDefaults.exclude, 'test/slow/**'],
    // Report and browser tests spawn the built CLI and Chromium; give them room on a 2-core machine.
    testTimeout: 60_000,
    hookTimeout: 60_000,
    env: { TZ: 'UTC' },
  },
});
