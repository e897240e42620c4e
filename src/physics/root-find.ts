/**
 * Root of a continuous function on a bracket [lo, hi] where f(lo) and f(hi) differ in sign, by
 * Brent's method: inverse quadratic interpolation and secant steps, falling back to bisection so
 * it never does worse than bisection (R. P. Brent, Algorithms for Minimization without
 * Derivatives, 1973, Ch. 4; from memory, confident). Stops when the bracket is narrower than
 * `tol` (absolute, in x) or f is exactly zero.
 */
export function bracketedRoot(f: (x: number) => number, lo: number, hi: number, tol = 0): number {
  let a = lo;
  let b = hi;
  let fa = f(a);
  let fb = f(b);
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (Math.sign(fa) === Math.sign(fb)) throw new RangeError(`bracketedRoot: f(${lo}) and f(${hi}) have the same sign`);
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let i = 0; i < 200; i++) {
    if (Math.sign(fb) === Math.sign(fc)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      [a, b, c] = [b, c, b];
      [fa, fb, fc] = [fb, fc, fb];
    }
    const tol1 = 2 * Number.EPSILON * Math.abs(b) + 0.5 * tol;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol1 || fb === 0) return b;
    if (Math.abs(e) >= tol1 && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol1 * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol1 ? d : m > 0 ? tol1 : -tol1;
    fb = f(b);
  }
  return b;
}

/**
 * The smallest x = start·2ᵏ (k = 0, 1, …, up to `maxDoublings`) at which a non-decreasing
 * function reaches `target`; undefined when it never does within that range.
 */
export function growUntil(f: (x: number) => number, target: number, start: number, maxDoublings = 200): number | undefined {
  let x = start;
  for (let k = 0; k <= maxDoublings; k++, x *= 2) if (f(x) >= target) return x;
  return undefined;
}
