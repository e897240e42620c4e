import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { bracketedRoot, growUntil } from '../../src/physics/root-find.ts';

describe('bracketedRoot', () => {
  // Closed-form roots checked by hand: x² = 2 at √2; cos x = x at 0.7390851332151607 (the Dottie
  // number, a standard fixed-point example; from memory, confident), checked by substitution below.
  it('finds √2 as the root of x² − 2 on [0, 2]', () => {
    expect(bracketedRoot((x) => x * x - 2, 0, 2, 1e-15)).toBeCloseTo(Math.SQRT2, 14);
  });

  it('finds the fixed point of cos x, which satisfies cos x = x', () => {
    const x = bracketedRoot((x) => Math.cos(x) - x, 0, 1, 1e-15);
    expect(Math.abs(Math.cos(x) - x)).toBeLessThan(1e-14);
    expect(x).toBeCloseTo(0.7390851332151607, 13);
  });

  it('returns an end of the bracket that is already a root', () => {
    expect(bracketedRoot((x) => x - 3, 3, 5)).toBe(3);
    expect(bracketedRoot((x) => x - 5, 3, 5)).toBe(5);
  });

  it('throws when the bracket does not change sign', () => {
    expect(() => bracketedRoot((x) => x * x + 1, -1, 1)).toThrow(/same sign/);
  });

  it('recovers the root of any increasing cubic a(x − r)³ + b(x − r) in its bracket (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -100, max: 100, noNaN: true }), fc.double({ min: 0.01, max: 10, noNaN: true }), fc.double({ min: 0, max: 10, noNaN: true }), (r, a, b) => {
        const f = (x: number) => a * (x - r) ** 3 + b * (x - r);
        const x = bracketedRoot(f, r - 7, r + 13, 1e-12);
        expect(Math.abs(x - r)).toBeLessThan(1e-6);
      }),
    );
  });
});

describe('growUntil', () => {
  it('doubles from the start until a non-decreasing function reaches the target', () => {
    expect(growUntil((x) => x, 10, 1)).toBe(16);
    expect(growUntil((x) => x, 0.5, 1)).toBe(1);
  });

  it('gives up (undefined) on a function that never reaches the target', () => {
    expect(growUntil(() => 1, 2, 1, 10)).toBeUndefined();
  });
});
