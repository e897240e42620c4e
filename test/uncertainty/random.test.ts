import { jStat } from 'jstat';
import { describe, expect, it } from 'vitest';
import { normalSource, seededRandom } from '../../src/uncertainty/random.ts';
import { quantileSorted } from '../../src/uncertainty/percentiles.ts';

describe('the seeded sampler', () => {
  it('seededRandom gives the same sequence for the same seed and another for another seed', () => {
    const a = seededRandom(7);
    const b = seededRandom(7);
    const c = seededRandom(8);
    const sa = Array.from({ length: 5 }, a);
    expect(Array.from({ length: 5 }, b)).toEqual(sa);
    expect(Array.from({ length: 5 }, c)).not.toEqual(sa);
    for (const x of sa) expect(x >= 0 && x < 1).toBe(true);
  });

  // Reference moments from jstat (a general-purpose statistics library, tests only): a uniform on
  // [0,1) has mean 1/2 and variance 1/12; a standard normal has mean 0, variance 1, skewness 0,
  // excess kurtosis 0. Tolerances are a few standard errors for n = 200 000.
  it('uniform and normal draws have the known moments', () => {
    const n = 200_000;
    const u = seededRandom(123);
    const us = Array.from({ length: n }, u);
    expect(Math.abs(jStat.mean(us) - 0.5)).toBeLessThan(4 * Math.sqrt(1 / 12 / n));
    expect(Math.abs(jStat.variance(us) - 1 / 12)).toBeLessThan(0.002);
    const z = normalSource(seededRandom(321));
    const zs = Array.from({ length: n }, z);
    expect(Math.abs(jStat.mean(zs))).toBeLessThan(4 / Math.sqrt(n));
    expect(Math.abs(jStat.variance(zs) - 1)).toBeLessThan(4 * Math.sqrt(2 / n));
    expect(Math.abs(jStat.skewness(zs))).toBeLessThan(4 * Math.sqrt(6 / n));
    expect(Math.abs(jStat.kurtosis(zs))).toBeLessThan(4 * Math.sqrt(24 / n));
  });

  it('normal draws have the quantiles of the normal distribution (jstat normal.inv as reference)', () => {
    const z = normalSource(seededRandom(99));
    const zs = Float64Array.from({ length: 100_000 }, z).sort();
    for (const p of [0.05, 0.25, 0.5, 0.75, 0.95]) expect(quantileSorted(zs, p)).toBeCloseTo(jStat.normal.inv(p, 0, 1), 1);
  });

  it('quantileSorted interpolates between ranks (Hyndman & Fan definition 7)', () => {
    expect(quantileSorted([1, 2, 3, 4], 0.5)).toBe(2.5);
    expect(quantileSorted([1, 2, 3, 4], 0)).toBe(1);
    expect(quantileSorted([1, 2, 3, 4], 1)).toBe(4);
    expect(quantileSorted([10], 0.3)).toBe(10);
  });
});
