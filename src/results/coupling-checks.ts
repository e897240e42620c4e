import type { Case, Segment } from '../case/case.ts';
import type { SideResult } from '../physics/energy-method.ts';
import type { DynamicResult } from './dynamic-result.ts';
import type { VerdictBasis } from './verdict-basis.ts';

/** A coupling checked against the torque it carried in the incident. */
export interface CouplingCheck {
  segment: Segment;
  /** N·m/rad; undefined for a rigid coupling. */
  stiffness?: number;
  ratedTorque: number;
  peakRating?: number;
  /** Peak torque through the coupling in the incident, N·m, by the verdict's model. */
  torque: number;
  /** torque / rated torque. */
  ratedRatio: number;
  /** torque / the coupling's capacity (its peak rating where given, else its rated torque). */
  capacityRatio: number;
  /** The capacity the ratio is taken against, N·m. */
  capacity: number;
}

/**
 * Every coupling, against the peak torque of its segment by the verdict's model (the dynamic
 * model's piece, or the energy method's side). A coupling's maximum torque is what it may take
 * now and then without damage; above it the maker gives no assurance (elastomer torn, teeth or
 * grid broken); the rated torque is for continuous duty, with the maker's service factors.
 */
export function couplingChecks(c: Case, basis: VerdictBasis, sides: readonly SideResult[], dynamic: DynamicResult): CouplingCheck[] {
  return c.shaft.segments
    .filter((s) => s.coupling)
    .map((seg) => {
      const cp = seg.coupling!;
      const torque =
        basis === 'energy method'
          ? Math.max(0, ...sides.filter((s) => s.pieces.some((p) => p.piece.segment.index === seg.index)).map((s) => s.peakTorque))
          : Math.max(0, ...dynamic.pieces.filter((p) => p.piece.segment.index === seg.index).map((p) => p.peakTorque));
      const capacity = cp.peakTorque ?? cp.ratedTorque;
      return {
        segment: seg,
        ...(cp.stiffness !== undefined ? { stiffness: cp.stiffness } : {}),
        ratedTorque: cp.ratedTorque,
        ...(cp.peakTorque !== undefined ? { peakRating: cp.peakTorque } : {}),
        torque,
        ratedRatio: torque / cp.ratedTorque,
        capacityRatio: torque / capacity,
        capacity,
      };
    });
}
