import type { SideName } from '../model/shaft-model.ts';
import type { DynamicResult } from '../results/dynamic-result.ts';
import type { Results } from '../results/results.ts';
import { show, sig } from './display-units.ts';

/** The dynamic model's elastic peak torque on a side, N·m: the like-for-like figure beside the energy method's. */
export function elasticDynamicPeak(d: DynamicResult, side: SideName): number {
  return Math.max(0, ...d.pieces.filter((p) => p.side === side).map((p) => p.elasticPeakTorque));
}

/**
 * One sentence on why the two models' numbers differ, like for like: the elastic peak torque of
 * each side by the energy method against the dynamic model's elastic peak (never the capped one).
 */
export function whyTheModelsDiffer(r: Results): string {
  const u = r.case.units;
  const pairs = r.dynamic.sides.map((s) => ({ side: s.side, energy: s.energyPeakTorque, dynamic: elasticDynamicPeak(r.dynamic, s.side) }));
  const each = pairs.map((p) => `side ${p.side} ${show(p.energy, 'torque', u)} against ${show(p.dynamic, 'torque', u)}`).join('; ');
  if (r.verdictBasis === 'energy method') {
    const worst = Math.max(...pairs.map((p) => Math.abs(p.dynamic / p.energy - 1)));
    const adds = r.dynamic.shaftInertia ? "the shaft's own inertia and damping" : 'damping';
    return `Why they differ: the dynamic model adds ${adds}; like for like (both elastic), its peak torques are within ${sig(100 * worst, 2)} % of the energy method's (${each}).`;
  }
  return `Why they differ: the energy method puts all of a side's kinetic energy into its shaft at once with nothing else acting, which this case leaves (see why the finding uses the dynamic model); like for like (both elastic), its peak torque against the dynamic model's: ${each}.`;
}
