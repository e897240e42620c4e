import { describe, expect, it } from 'vitest';
import { dynamicMetrics, investigate } from '../../src/finding/investigate.ts';
import { runDynamicUncertainty } from '../../src/uncertainty/uncertainty.ts';
import { rampedOneDisc } from '../helpers/ramped-one-disc.ts';

describe("the dynamic model's chance of yield against brute force (slow)", () => {
  it("on a small ramped stop, 40 runs with the energy method's 10 000 samples agree with 2000 dynamic runs within their joint error", () => {
    const c = rampedOneDisc(10_000, 40);
    const r = investigate(c);
    const chance = r.uncertainty!.dynamic!.yieldChance;
    const u = c.analysis.uncertainty;
    const brute = runDynamicUncertainty(c, (k) => dynamicMetrics(k, r.dynamic.elementTarget), { samples: 2000, seed: u.seed + 1, strengthScatter: u.strengthScatter }).yieldChance;
    // Their difference within 2.58 of its standard error (a 99 % bound), and the intervals overlap.
    const se = (e: typeof chance) => (e.interval[1] - e.interval[0]) / (2 * 1.96);
    expect(Math.abs(chance.probability - brute.probability)).toBeLessThan(2.58 * Math.hypot(se(chance), se(brute)));
    expect(brute.interval[0]).toBeLessThanOrEqual(chance.interval[1]);
    expect(brute.interval[1]).toBeGreaterThanOrEqual(chance.interval[0]);
  });
});
