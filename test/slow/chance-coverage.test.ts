import { describe, expect, it } from 'vitest';
import { coverage } from '../helpers/synthetic-chance.ts';

// The bigger version of the coverage test in test/uncertainty/chance.test.ts: 40 fine runs and
// 10 000 cheap samples, as `check` takes them, over 200 seeded repeats per relation.
describe('controlVariateChance over many seeded repeats (slow)', () => {
  it('its 95 % interval covers the known chance in at least 90 % of repeats, for loose, weak and rare relations', () => {
    for (const [a0, k, r] of [
      [0.13, 1, 0.04], // p ≈ 0.33
      [0.13, 1, 0.005], // p ≈ 0.29, a tight relation
      [0.25, 1, 0.04], // p ≈ 0.89
      [0.05, 1, 0.04], // p ≈ 0.06
      [0.03, 0.3, 0.06], // p ≈ 0.68, a weak relation
    ]) {
      const { covered, width, plainWidth } = coverage(a0, k, r, 200, 10_000);
      expect(covered).toBeGreaterThanOrEqual(0.9);
      expect(width).toBeLessThan(1.05 * plainWidth);
    }
  });
});
