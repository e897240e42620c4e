import { describe, expect, it } from 'vitest';
import { bisect } from '../../src/resize/bisect.ts';

describe('bisect', () => {
  it('finds √2 as the root of x² − 2 between 1 and 2', () => {
    expect(bisect((x) => x * x - 2, 1, 2)).toBeCloseTo(Math.SQRT2, 9);
  });

  it('works with a decreasing function', () => {
    expect(bisect((x) => 1 / x - 0.25, 1, 10)).toBeCloseTo(4, 9);
  });

  it('refuses a range without a change of sign', () => {
    expect(() => bisect((x) => x * x + 1, -1, 1)).toThrow(/no change of sign between -1 and 1/);
  });
});
