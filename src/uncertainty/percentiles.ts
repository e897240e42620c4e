/**
 * The p-quantile of sorted values by linear interpolation between closest ranks (the "R-7"
 * definition, the default of R and NumPy; Hyndman & Fan, Am. Statistician 50, 1996; from memory,
 * confident). `sorted` must be ascending and non-empty.
 */
export function quantileSorted(sorted: ArrayLike<number>, p: number): number {
  const h = (sorted.length - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(lo + 1, sorted.length - 1);
  return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
}

/** 5th, 50th and 95th percentiles of `values` (not mutated). */
export function p5p50p95(values: ArrayLike<number>): [number, number, number] {
  const s = Float64Array.from(values).sort();
  return [quantileSorted(s, 0.05), quantileSorted(s, 0.5), quantileSorted(s, 0.95)];
}
