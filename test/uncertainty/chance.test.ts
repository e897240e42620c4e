import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { controlVariateChance, monteCarloChance, wilsonInterval } from '../../src/uncertainty/chance.ts';
import { coverage, synthetic } from '../helpers/synthetic-chance.ts';

describe('wilsonInterval(p, n)', () => {
  it('matches the published Wilson intervals of Newcombe (Statistics in Medicine 17, 1998, Table II, method 3)', () => {
    // Newcombe, "Two-sided confidence intervals for the single proportion: comparison of seven
    // methods"; the values are recalled from memory, to the 4 decimals printed.
    const cases: [number, number, number, number][] = [
      [81, 263, 0.2553, 0.3662],
      [15, 148, 0.0624, 0.1605],
      [0, 20, 0, 0.1611],
      [1, 29, 0.0061, 0.1718],
      [29, 29, 0.883, 1],
    ];
    for (const [k, n, lo, hi] of cases) {
      const [a, b] = wilsonInterval(k / n, n);
      expect(a).toBeCloseTo(lo, 4);
      expect(b).toBeCloseTo(hi, 4);
    }
  });

  it('0 of n gives [0, z²/(n + z²)]: 0 of 10 000 gives [0, 3.840e-4] (by hand, z = 1.95996)', () => {
    const z2 = 1.959963984540054 ** 2;
    expect(wilsonInterval(0, 10_000)).toEqual([0, expect.closeTo(z2 / (10_000 + z2), 12)]);
    expect(wilsonInterval(0, 10_000)[1]).toBeCloseTo(3.84e-4, 6);
    expect(wilsonInterval(1, 40)).toEqual([expect.closeTo(1 - z2 / (40 + z2), 12), 1]);
  });

  it('holds the share k/n, stays within [0, 1] and narrows as n grows', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 5000 }), fc.double({ min: 0, max: 1, noNaN: true }), (n, u) => {
        const p = Math.round(u * n) / n;
        const [a, b] = wilsonInterval(p, n);
        const [c, d] = wilsonInterval(p, 4 * n);
        return a >= 0 && b <= 1 && a <= p && p <= b && d - c <= b - a + 1e-12;
      }),
    );
  });

  it('with no trials says nothing: [0, 1]', () => {
    expect(wilsonInterval(0, 0)).toEqual([0, 1]);
  });
});

describe('monteCarloChance(ratios)', () => {
  it('is the share at 1 or more, with the Wilson interval of that share', () => {
    const c = monteCarloChance([0.5, 1, 1.2, 0.99]);
    expect(c).toEqual({ probability: 0.5, interval: wilsonInterval(0.5, 4), method: 'monte-carlo', runs: 4 });
    expect(monteCarloChance(new Float64Array(10_000).fill(0.3)).interval[1]).toBeCloseTo(3.84e-4, 6);
  });
});

describe('controlVariateChance(fine, coarse)', () => {
  it("its 95 % interval covers the known chance in at least 90 % of seeded repeats, and is narrower than the plain runs' interval", () => {
    // A smaller version of test/slow/chance-coverage.test.ts (more repeats, 10 000 cheap samples).
    for (const [a0, k, r] of [
      [0.13, 1, 0.04], // p ≈ 0.33, a loose relation
      [0.25, 1, 0.04], // p ≈ 0.89
    ]) {
      const { covered, width, plainWidth } = coverage(a0, k, r, 50, 1000);
      expect(covered).toBeGreaterThanOrEqual(0.9);
      expect(width).toBeLessThan(plainWidth);
    }
  });

  it('where the fine ratio follows the cheap one closely, 40 runs are as sure as hundreds', () => {
    const { fine, coarse, truth } = synthetic(7, 0.13, 1, 0.005, 40, 10_000);
    const c = controlVariateChance(fine, coarse);
    expect(c.interval[1] - c.interval[0]).toBeLessThan(0.1);
    expect(c.interval[0]).toBeLessThanOrEqual(truth);
    expect(c.interval[1]).toBeGreaterThanOrEqual(truth);
    expect(c).toMatchObject({ runs: 40, controlSamples: 10_000 });
  });

  it("where every fine run agrees, the interval is Wilson's from the fine runs alone, and holds the point", () => {
    // Every fine run below 1, and the cheap samples say so too: 0 of 40 is [0, 8.8 %], not [0, 0].
    const coarse = Float64Array.from({ length: 1000 }, (_, i) => 0.5 + 0.1 * Math.sin(i));
    const fine = Float64Array.from(coarse.subarray(0, 40), (x, i) => 0.8 * x * (1 + 0.01 * Math.cos(3 * i)));
    const c = controlVariateChance(fine, coarse);
    expect(c.interval).toEqual(wilsonInterval(0, 40));
    expect(c.interval[1]).toBeCloseTo(0.0876, 4);
    expect(c.probability).toBeGreaterThanOrEqual(0);
    expect(c.probability).toBeLessThanOrEqual(c.interval[1]);
    const every = controlVariateChance(
      fine.map((y) => 4 * y),
      coarse,
    );
    expect(every.interval).toEqual(wilsonInterval(1, 40));
  });

  it('with fewer than 3 runs, no extra cheap samples or a ratio that is not positive, it is the plain share', () => {
    expect(controlVariateChance([1.2, 0.8], [1, 1, 1, 1])).toEqual(monteCarloChance([1.2, 0.8]));
    expect(controlVariateChance([1.2, 0.8, 0.9], [1, 0.7, 0.8])).toEqual(monteCarloChance([1.2, 0.8, 0.9]));
    expect(controlVariateChance([1.2, 0.8, 0.9], [1, 0, 0.8, 0.9])).toEqual(monteCarloChance([1.2, 0.8, 0.9]));
  });

  it('is reproducible, within [0, 1] and holds its point, on any paired data', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 1000 }), fc.double({ min: -0.3, max: 0.3, noNaN: true }), fc.double({ min: 0, max: 0.2, noNaN: true }), (seed, a0, r) => {
        const { fine, coarse } = synthetic(seed, a0, 1, r, 12, 200);
        const c = controlVariateChance(fine, coarse);
        expect(controlVariateChance(fine, coarse)).toEqual(c);
        const [lo, hi] = c.interval;
        return lo >= 0 && hi <= 1 && lo <= c.probability && c.probability <= hi;
      }),
      { numRuns: 50 },
    );
  });
});
