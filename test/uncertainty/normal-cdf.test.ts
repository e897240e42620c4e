import { jStat } from 'jstat';
import { describe, expect, it } from 'vitest';
import { normalCdf } from '../../src/uncertainty/normal-cdf.ts';

describe('normalCdf(x)', () => {
  it("agrees with jstat's normal.cdf within 1.5e-7 (the bound of Abramowitz & Stegun 7.1.26)", () => {
    for (let x = -8; x <= 8; x += 0.25) expect(Math.abs(normalCdf(x) - jStat.normal.cdf(x, 0, 1))).toBeLessThan(1.5e-7);
  });

  it('is symmetric: Φ(−x) = 1 − Φ(x), and Φ(1.96) ≈ 0.975', () => {
    for (const x of [0.3, 1.7, 4]) expect(normalCdf(-x)).toBeCloseTo(1 - normalCdf(x), 12);
    expect(normalCdf(1.959963984540054)).toBeCloseTo(0.975, 6);
  });
});
