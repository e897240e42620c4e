import type { Case } from '../case/case.ts';
import type { DynamicResult } from './dynamic-result.ts';

/** A station's backstop and the rebound it took. */
export interface BackstopCheck {
  station: string;
  /** The largest torque it held the shaft with against turning backwards in the incident, N·m (the dynamic model; 0 where it never had to hold). */
  reboundTorque: number;
  /** When it first held, s from the stop's start; undefined where it never did. */
  firstHeld?: number;
  /** Its rated torque, N·m, where the case gives it, and reboundTorque over it. */
  ratedTorque?: number;
  ratio?: number;
  /** Whether the dynamic model carried it (a node at its station that is not the stop). */
  inDynamicModel: boolean;
}

/**
 * Every backstop with the rebound torque it held. Only the dynamic model follows the rebound (the
 * energy method ends at the first peak), so this is the dynamic model's whatever the verdict
 * stands on. A backstop at the stop, or where the dynamic model has no node (an unloaded station
 * beyond the loaded run), is not in the model and took nothing there.
 */
export function backstopChecks(c: Case, dynamic: DynamicResult): BackstopCheck[] {
  return c.stations
    .filter((s) => s.backstop)
    .map((s) => {
      const hold = dynamic.holds.find((h) => h.station === s.name && h.kind === 'backstop');
      const rebound = hold?.peakTorque ?? 0;
      const rated = s.backstop!.ratedTorque;
      return {
        station: s.name,
        reboundTorque: rebound,
        ...(hold?.firstHeld !== undefined ? { firstHeld: hold.firstHeld } : {}),
        ...(rated !== undefined ? { ratedTorque: rated, ratio: rebound / rated } : {}),
        inDynamicModel: hold !== undefined,
      };
    });
}
