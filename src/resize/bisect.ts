/**
 * A root of `g` between `lo` and `hi`, where g(lo) and g(hi) differ in sign, by bisection to a
 * relative width of `tolerance`. Plain and sure: each call of g is one run of the engine.
 */
export function bisect(g: (x: number) => number, lo: number, hi: number, tolerance = 1e-10): number {
  let gLo = g(lo);
  if (gLo === 0) return lo;
  if (Math.sign(gLo) === Math.sign(g(hi))) throw new Error(`bisect: no change of sign between ${lo} and ${hi}`);
  while (hi - lo > tolerance * Math.abs(hi)) {
    const mid = 0.5 * (lo + hi);
    const gMid = g(mid);
    if (gMid === 0) return mid;
    if (Math.sign(gMid) === Math.sign(gLo)) {
      lo = mid;
      gLo = gMid;
    } else {
      hi = mid;
    }
  }
  return 0.5 * (lo + hi);
}
