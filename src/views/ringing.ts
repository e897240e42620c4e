import type { Results } from '../results/results.ts';
import { damperName } from './damping-words.ts';
import { sig } from './display-units.ts';

/**
 * The half-amplitude of a series' swing over the last quarter of its window, where it has hardly
 * decayed from the quarter before (at least 70 % of it) and is more than 2 % of the series' largest
 * value: a response that rings on to the end of the window. Undefined where it dies away or stays still.
 */
export function ringsOn(values: ArrayLike<number>): number | undefined {
  const n = values.length;
  if (n < 8) return undefined;
  const swing = (from: number, to: number) => {
    let lo = Infinity;
    let hi = -Infinity;
    for (let i = from; i < to; i++) {
      lo = Math.min(lo, values[i]);
      hi = Math.max(hi, values[i]);
    }
    return (hi - lo) / 2;
  };
  let largest = 0;
  for (let i = 0; i < n; i++) largest = Math.max(largest, Math.abs(values[i]));
  const third = swing(Math.floor(n / 2), Math.floor((3 * n) / 4));
  const last = swing(Math.floor((3 * n) / 4), n);
  return last > 0.02 * largest && last >= 0.7 * third ? last : undefined;
}

/**
 * The caption's sentence for series that ring on at about constant amplitude to the end of the
 * window: which, how much, and the model's damping, so that a reader does not take the ringing for
 * what the machine did. Empty where none rings.
 */
export function ringingSentence(r: Results, ringing: readonly { name: string; amplitude: string }[]): string {
  if (ringing.length === 0) return '';
  const d = r.dynamic;
  const which = ringing.map((s) => `${s.name} (about ±${s.amplitude})`).join('; ');
  const ratios = new Set(d.damping.dampers.map((x) => x.dampingRatio));
  const damping =
    ratios.size <= 1
      ? `${sig(100 * (d.damping.dampers[0]?.dampingRatio ?? d.dampingRatio), 2)} % of critical in each side's lowest mode (stiffness-proportional)`
      : `stiffness-proportional, each element's own: ${d.damping.dampers.map((x) => `${damperName(x)} ${sig(100 * x.dampingRatio, 2)} %`).join(', ')} of critical`;
  return ` Rings on at about constant amplitude to the end of the ${sig(d.duration * 1000)} ms window: ${which}. The model's only damping is ${damping}; the motor's losses and trip, friction and the driven material are not modelled, so the ringing after the peak is the model's, not a prediction of what the machine did.`;
}
