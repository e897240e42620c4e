/**
 * Symmetric tridiagonal systems A·x = b by the LDLᵀ form of the Thomas algorithm (Golub & Van
 * Loan, Matrix Computations, Sec. 4.3, banded LDLᵀ; from memory, confident): O(n) to factor and
 * O(n) to solve, no pivoting, which is safe for the positive-definite matrices the integrator
 * forms (inertia/h² plus stiffness and damping). `diag` is A's diagonal, `off[i]` = A[i][i+1].
 */
export class TridiagonalSolver {
  private readonly l: Float64Array;
  private readonly invD: Float64Array;

  constructor(readonly n: number) {
    this.l = new Float64Array(n);
    this.invD = new Float64Array(n);
  }

  /** Factors A in place of the previous factorisation. Throws on a zero pivot (a singular system is a bug). */
  factor(diag: Float64Array, off: Float64Array): void {
    const { l, invD, n } = this;
    let d = diag[0];
    if (!(Math.abs(d) > 0)) throw new Error('tridiagonal system is singular at row 0');
    invD[0] = 1 / d;
    for (let i = 1; i < n; i++) {
      const li = off[i - 1] * invD[i - 1];
      l[i] = li;
      d = diag[i] - li * off[i - 1];
      if (!(Math.abs(d) > 0)) throw new Error(`tridiagonal system is singular at row ${i}`);
      invD[i] = 1 / d;
    }
  }

  /** Solves with the last factorisation; `x` may be `b`. */
  solve(b: Float64Array, x: Float64Array): void {
    const { l, invD, n } = this;
    x[0] = b[0];
    for (let i = 1; i < n; i++) x[i] = b[i] - l[i] * x[i - 1];
    x[n - 1] *= invD[n - 1];
    for (let i = n - 2; i >= 0; i--) x[i] = x[i] * invD[i] - l[i + 1] * x[i + 1];
  }
}
