import fc from 'fast-check';
import { Matrix, solve } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { TridiagonalSolver } from '../../../src/physics/integrator/tridiagonal.ts';

describe('TridiagonalSolver', () => {
  it('solves diagonally dominant symmetric systems as ml-matrix does', () => {
    const system = fc.integer({ min: 1, max: 30 }).chain((n) =>
      fc.record({
        off: fc.array(fc.double({ min: -10, max: 10, noNaN: true }), { minLength: n - 1, maxLength: n - 1 }),
        extra: fc.array(fc.double({ min: 0.1, max: 10, noNaN: true }), { minLength: n, maxLength: n }),
        b: fc.array(fc.double({ min: -100, max: 100, noNaN: true }), { minLength: n, maxLength: n }),
      }),
    );
    fc.assert(
      fc.property(system, ({ off, extra, b }) => {
        const n = b.length;
        const diag = extra.map((x, i) => x + Math.abs(off[i - 1] ?? 0) + Math.abs(off[i] ?? 0));
        const s = new TridiagonalSolver(n);
        s.factor(Float64Array.from(diag), Float64Array.from(off.length ? off : [0]));
        const x = new Float64Array(n);
        s.solve(Float64Array.from(b), x);
        const A = Matrix.zeros(n, n);
        diag.forEach((d, i) => A.set(i, i, d));
        off.forEach((o, i) => {
          A.set(i, i + 1, o);
          A.set(i + 1, i, o);
        });
        const ref = solve(A, Matrix.columnVector(b)).to1DArray();
        return ref.every((v, i) => Math.abs(v - x[i]) <= 1e-9 * (1 + Math.abs(v)));
      }),
    );
  });

  it('refuses a singular system', () => {
    expect(() => new TridiagonalSolver(2).factor(Float64Array.from([1, 1]), Float64Array.from([1]))).toThrow(/singular at row 1/);
  });
});
