import type { Segment } from '../case/case.ts';
import type { DamperEnergy, DynamicDamping } from '../results/dynamic-damping.ts';
import type { Results } from '../results/results.ts';
import { show, sig } from './display-units.ts';

const segmentName = (s: Segment) => (s.label ? `"${s.label}"` : `segment ${s.index + 1}`);
const pct = (x: number) => `${sig(100 * x, 2)} %`;

/** "the coupling in "flex coupling"" / "the shaft's material damping" / "the shaft in segment 2". */
export function damperName(d: DamperEnergy): string {
  if (d.kind === 'coupling') return `the coupling in ${segmentName(d.segment!)}`;
  return d.segment ? `the shaft's material damping in ${segmentName(d.segment)}` : "the shaft's material damping";
}

/**
 * Which damping dominated, in one sentence from `DynamicResult.damping` (nothing recomputed):
 * "Damping: the coupling in "flex" (8 % of critical) took 62 % of the 41 J dissipated; the shaft's
 * material damping (0.5 %) 38 %." Undefined where the dampers took nothing.
 */
export function dampingSentence(r: Results): string | undefined {
  const d: DynamicDamping = r.dynamic.damping;
  if (!(d.total > 0) || d.dampers.length === 0) return undefined;
  const [first, ...rest] = d.dampers;
  if (rest.length === 0)
    return `Damping: ${damperName(first)} (${pct(first.dampingRatio)} of critical) is the model's only damping; it dissipated ${show(d.total, 'energy', r.case.units)} over the window.`;
  const head = `${damperName(first)} (${pct(first.dampingRatio)} of critical) took ${pct(first.share)} of the ${show(d.total, 'energy', r.case.units)} the model's damping dissipated over the window`;
  const tail = rest.map((x) => `${damperName(x)} (${pct(x.dampingRatio)}) ${pct(x.share)}`);
  return `Damping: ${[head, ...tail].join('; ')}.`;
}

/**
 * Whether the most loaded piece still rings at the end of the window, from `DynamicResult.damping.ringing`:
 * said where it rings on (with the caution that the ringing is the model's), and where it has died down.
 */
export function ringingWords(r: Results): string | undefined {
  const g = r.dynamic.damping.ringing;
  if (!g) return undefined;
  const u = r.case.units;
  const p = r.dynamic.pieces[g.piece].piece;
  const where = `the torque in ${segmentName(p.segment)}`;
  const cycles = `its last cycle swings ±${show(g.lastCycle, 'torque', u)}, ${pct(g.ratio)} of the first after the peak (±${show(g.firstCycle, 'torque', u)})`;
  return g.ringsOn
    ? `Still ringing at about constant amplitude at the end of the ${sig(r.dynamic.duration * 1000)} ms window: ${where}: ${cycles}. Only the damping above takes energy out; the machine's other losses are not modelled, so the ringing after the peak is the model's, not a prediction of what the machine did.`
    : `Rings down within the window: ${where}: ${cycles}.`;
}
