/**
 * Natural frequencies and mode shapes of a torsional chain: K·φ = ω²·M·φ with K symmetric
 * tridiagonal (springs between neighbouring nodes, and to ground where a node is held) and M
 * diagonal (lumped inertias, all positive).
 *
 * Method. The diagonal M is split as M^½·M^½, which turns the pencil into the standard symmetric
 * tridiagonal A = M^-½·K·M^-½ (the Cholesky reduction, trivial for a diagonal M, and A stays
 * tridiagonal). Eigenvalues of A come from Sturm-sequence bisection: the number of negative pivots
 * of the LDLᵀ factorisation of A − x·I equals the number of eigenvalues below x (Sylvester's law of
 * inertia; Golub & Van Loan, Matrix Computations, Sec. 8.4, tridiagonal bisection; from memory,
 * confident). Each count is O(n), any single eigenvalue can be had to full precision without the
 * others, and nothing dense is formed. Shapes come from inverse iteration with the converged
 * eigenvalue as shift (same reference, Sec. 8.2), re-orthogonalised against the previous shapes
 * where eigenvalues cluster. The shape returned is M^-½·y, scaled to a largest entry of +1.
 */
export interface ChainMode {
  /** Circular natural frequency, rad/s. */
  omega: number;
  /** Natural frequency, Hz. */
  frequency: number;
  /** Amplitude at each node, largest +1. */
  shape: Float64Array;
  /**
   * Share of a uniform-speed start's kinetic energy this mode carries: (φᵀM·1)²/(φᵀMφ · 1ᵀM1).
   * A sudden stop from running speed starts every free node at the same speed, so this is the
   * share of the energy the mode rings with after an instantaneous stop.
   */
  participation: number;
}

/** The `count` lowest modes (fewer if the chain has fewer nodes), ascending. */
export function chainModes(kDiag: ArrayLike<number>, kOff: ArrayLike<number>, mass: ArrayLike<number>, count: number): ChainMode[] {
  const n = mass.length;
  if (n === 0) return [];
  const s = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    if (!(mass[i] > 0)) throw new Error(`chainModes: node ${i} has no inertia`);
    s[i] = 1 / Math.sqrt(mass[i]);
  }
  const a = new Float64Array(n);
  const b = new Float64Array(Math.max(n - 1, 0));
  for (let i = 0; i < n; i++) a[i] = kDiag[i] * s[i] * s[i];
  for (let i = 0; i < n - 1; i++) b[i] = kOff[i] * s[i] * s[i + 1];
  const totalMass = Array.from(mass).reduce((x, y) => x + y, 0);
  const modes: ChainMode[] = [];
  const ys: Float64Array[] = [];
  for (let k = 0; k < Math.min(count, n); k++) {
    const lambda = Math.max(eigenvalue(a, b, k), 0);
    const y = inverseIteration(
      a,
      b,
      lambda,
      ys,
      modes.map((m) => m.omega ** 2),
    );
    ys.push(y);
    const phi = new Float64Array(n);
    let big = 0;
    let gamma = 0;
    for (let i = 0; i < n; i++) {
      phi[i] = y[i] * s[i];
      gamma += y[i] / s[i];
      if (Math.abs(phi[i]) > Math.abs(big)) big = phi[i];
    }
    for (let i = 0; i < n; i++) phi[i] /= big;
    const omega = Math.sqrt(lambda);
    modes.push({ omega, frequency: omega / (2 * Math.PI), shape: phi, participation: (gamma * gamma) / totalMass });
  }
  return modes;
}

/** Number of eigenvalues of the tridiagonal (a, b) below x, by the Sturm sequence of pivots. */
export function countBelow(a: ArrayLike<number>, b: ArrayLike<number>, x: number): number {
  let count = 0;
  let q = 1;
  for (let i = 0; i < a.length; i++) {
    q = a[i] - x - (i > 0 ? (b[i - 1] * b[i - 1]) / q : 0);
    if (q === 0) q = -Number.EPSILON * (Math.abs(a[i]) + Math.abs(x) + Number.MIN_VALUE);
    if (q < 0) count++;
  }
  return count;
}

/** The k-th smallest eigenvalue (0-based) by bisection between Gershgorin bounds. */
function eigenvalue(a: Float64Array, b: Float64Array, k: number): number {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < a.length; i++) {
    const r = (i > 0 ? Math.abs(b[i - 1]) : 0) + (i < b.length ? Math.abs(b[i]) : 0);
    lo = Math.min(lo, a[i] - r);
    hi = Math.max(hi, a[i] + r);
  }
  for (let it = 0; it < 200; it++) {
    const mid = 0.5 * (lo + hi);
    if (mid <= lo || mid >= hi || hi - lo <= 2 * Number.EPSILON * Math.max(Math.abs(lo), Math.abs(hi))) break;
    if (countBelow(a, b, mid) > k) hi = mid;
    else lo = mid;
  }
  return 0.5 * (lo + hi);
}

/** Unit eigenvector of (a, b) for eigenvalue λ; orthogonal to earlier vectors whose eigenvalues are close. */
function inverseIteration(a: Float64Array, b: Float64Array, lambda: number, earlier: Float64Array[], earlierLambda: number[]): Float64Array {
  const n = a.length;
  const scale = Math.max(...Array.from(a, Math.abs), 1e-300);
  const shift = lambda + scale * 1e-13;
  const close = earlier.filter((_, j) => Math.abs(earlierLambda[j] - lambda) <= 1e-8 * scale);
  let y = new Float64Array(n);
  for (let i = 0; i < n; i++) y[i] = 1 + 0.37 * Math.sin(1.7 * i + 0.3);
  const d = new Float64Array(n);
  const l = new Float64Array(n);
  // LDLᵀ of A − shift·I without pivoting; a tiny pivot only makes the iteration converge faster.
  for (let i = 0; i < n; i++) {
    const prev = i > 0 ? d[i - 1] : 1;
    l[i] = i > 0 ? b[i - 1] / prev : 0;
    d[i] = a[i] - shift - (i > 0 ? l[i] * b[i - 1] : 0);
    if (Math.abs(d[i]) < Number.EPSILON * scale) d[i] = Number.EPSILON * scale;
  }
  for (let it = 0; it < 4; it++) {
    const x = new Float64Array(n);
    x[0] = y[0];
    for (let i = 1; i < n; i++) x[i] = y[i] - l[i] * x[i - 1];
    for (let i = 0; i < n; i++) x[i] /= d[i];
    for (let i = n - 2; i >= 0; i--) x[i] -= l[i + 1] * x[i + 1];
    for (const e of close) {
      let dot = 0;
      for (let i = 0; i < n; i++) dot += x[i] * e[i];
      for (let i = 0; i < n; i++) x[i] -= dot * e[i];
    }
    let norm = 0;
    for (let i = 0; i < n; i++) norm += x[i] * x[i];
    norm = Math.sqrt(norm);
    for (let i = 0; i < n; i++) x[i] /= norm;
    y = x;
  }
  return y;
}
