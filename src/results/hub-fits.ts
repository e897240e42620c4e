import type { Case } from '../case/case.ts';
import { fitCapacity } from '../model/fit-capacity.ts';
import type { SideResult } from '../physics/energy-method.ts';
import type { DynamicResult } from './dynamic-result.ts';
import { hubTorque, shaftYieldTorqueToStop } from './hub-torque.ts';
import type { VerdictBasis } from './verdict-basis.ts';

/** A station's shrink or press fit checked at the incident torque. */
export interface FitCheck {
  station: string;
  /** Contact pressure at the seat by the thick-cylinder (Lamé) relations, Pa. */
  contactPressure: number;
  /** Torque at which the fit slips, T = π·μ·p·d²·L/2, N·m. */
  slipTorque: number;
  /** Hoop stress at the hub's bore under the fit, Pa, and the hub material's yield strength, Pa (undefined where the material gives none). */
  hubHoopStress: number;
  hubYieldStrength: number | undefined;
  /** Peak torque through the hub in the incident, N·m (capped at the slip torque where the dynamic model let the fit slip). */
  torque: number;
  /** Whether `torque` is an upper bound (loaded stations beyond the hub, or the stop taking both sides). */
  upperBound: boolean;
  /** Whether the fit slipped in the incident. */
  slipped: boolean;
  /** Whether the dynamic model carried the fit as a slip element (a fit at the chain's end or at the stop). */
  inDynamicModel: boolean;
  /** Torque at which the shaft between the hub and the stop first yields (kt applied), N·m. */
  shaftYieldTorque: number;
  /** Whether the fit slips at a lower torque than the shaft yields at: it is the fuse. */
  slipsBeforeShaftYields: boolean;
}

/** Every fit in the case, at the incident's torque by the verdict's model. */
export function hubFits(c: Case, basis: VerdictBasis, sides: readonly SideResult[], dynamic: DynamicResult): FitCheck[] {
  return c.stations
    .filter((s) => s.fit)
    .map((s) => {
      const cap = fitCapacity(c, s);
      const through = hubTorque(c, s, basis, sides, dynamic);
      const slip = dynamic.slips.find((x) => (x.kind === 'hub fit' && x.element === `the shrink fit at "${s.name}"`) || (x.kind === 'jam' && s.name === c.stop.at));
      const slipped = slip ? slip.firstSlip !== undefined : through.torque >= cap.slipTorque;
      const shaftYieldTorque = shaftYieldTorqueToStop(c, s);
      return {
        station: s.name,
        contactPressure: cap.contactPressure,
        slipTorque: cap.slipTorque,
        hubHoopStress: cap.hubHoopStress,
        hubYieldStrength: c.materials[s.fit!.hubMaterial].yieldStrength,
        torque: through.torque,
        upperBound: through.upperBound,
        slipped,
        inDynamicModel: slip !== undefined,
        shaftYieldTorque,
        slipsBeforeShaftYields: cap.slipTorque < shaftYieldTorque,
      };
    });
}
