/**
 * Rainflow counting of a load history by ASTM E1049-85 (reapproved 2017), Standard Practices for
 * Cycle Counting in Fatigue Analysis, Sec. 5.4.4: ranges are counted as full cycles when a later
 * range is at least as large, and as half cycles where they hold the starting point or are left
 * at the end.
 */

/** A counted cycle: its range and mean (in the history's unit) and 0.5 or 1. */
export interface RainflowCycle {
  range: number;
  mean: number;
  count: 0.5 | 1;
}

/** The peaks and valleys of a history: runs of equal values are one point, and points on a slope are dropped. */
export function reversals(history: readonly number[]): number[] {
  const out: number[] = [];
  for (const v of history) {
    if (out.length > 0 && v === out[out.length - 1]) continue;
    if (out.length >= 2) {
      const a = out[out.length - 2];
      const b = out[out.length - 1];
      if ((b - a) * (v - b) > 0) {
        out[out.length - 1] = v;
        continue;
      }
    }
    out.push(v);
  }
  return out;
}

/** The cycles of a history, in the order the standard counts them. */
export function rainflow(history: readonly number[]): RainflowCycle[] {
  const cycles: RainflowCycle[] = [];
  const cycle = (a: number, b: number, count: 0.5 | 1) => cycles.push({ range: Math.abs(b - a), mean: (a + b) / 2, count });
  const stack: number[] = [];
  for (const point of reversals(history)) {
    stack.push(point);
    while (stack.length >= 3) {
      const n = stack.length;
      const x = Math.abs(stack[n - 1] - stack[n - 2]);
      const y = Math.abs(stack[n - 2] - stack[n - 3]);
      if (x < y) break;
      if (n === 3) {
        // Y holds the starting point: half a cycle, and the start moves to Y's second point.
        cycle(stack[0], stack[1], 0.5);
        stack.shift();
      } else {
        cycle(stack[n - 3], stack[n - 2], 1);
        stack.splice(n - 3, 2);
      }
    }
  }
  for (let i = 0; i + 1 < stack.length; i++) cycle(stack[i], stack[i + 1], 0.5);
  return cycles;
}
