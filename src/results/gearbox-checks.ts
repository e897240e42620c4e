import type { Case } from '../case/case.ts';
import type { SideResult } from '../physics/energy-method.ts';
import { forwardInputTorque } from '../physics/gear-stage.ts';
import { lewisFormFactor, lewisStress, toothLoad } from '../physics/lewis.ts';
import type { DynamicResult } from './dynamic-result.ts';
import { hubTorque } from './hub-torque.ts';
import type { VerdictBasis } from './verdict-basis.ts';

/** A station's gearbox checked at the incident torque. */
export interface GearboxCheck {
  station: string;
  /** Input speed over output speed. */
  ratio: number;
  efficiency: number;
  backDrivable: boolean;
  /** The catalogue's rated output torque, N·m, and the service factor it is taken with. */
  ratedOutputTorque: number;
  serviceFactor: number;
  /** What the unit is checked against: rated output torque × service factor, N·m. */
  capacity: number;
  /** Peak torque at its output (the shaft at the station) in the incident by the verdict's model, N·m, and whether that is an upper bound. */
  outputTorque: number;
  upperBound: boolean;
  /** Torque at its input at that peak, T_out/(η·i), N·m at the input's speed (the motor side drives into the jam). */
  inputTorque: number;
  /** outputTorque / capacity. */
  ratingRatio: number;
  /**
   * A self-locking gearbox in the dynamic model: the largest torque it held the shaft with against
   * turning backwards, N·m at its output (0 where it never had to). Undefined where the unit is
   * back-drivable or the dynamic model has no node at the station (or it is the stop).
   */
  heldTorque?: number;
  /**
   * Where the case gives the output gear's teeth: the tangential tooth load at the larger of the
   * output and held torques, N, the Lewis form factor, and the Lewis bending stress, Pa (a first
   * estimate, src/physics/lewis.ts).
   */
  tooth?: { load: number; formFactor: number; bendingStress: number };
}

/**
 * Every gearbox at the torque through its station by the verdict's model (`hubTorque`: the peak of
 * the shaft next to the station on the stop's side), against rated output torque × service factor:
 * the gear unit's rating with the service factor the catalogue or the nameplate gives it. The
 * input torque follows from the output's by the forward power balance (src/physics/gear-stage.ts).
 */
export function gearboxChecks(c: Case, basis: VerdictBasis, sides: readonly SideResult[], dynamic: DynamicResult): GearboxCheck[] {
  return c.stations
    .filter((s) => s.gearbox)
    .map((s) => {
      const g = s.gearbox!;
      const through = hubTorque(c, s, basis, sides, dynamic);
      const capacity = g.ratedOutputTorque * g.serviceFactor;
      const hold = g.backDrivable ? undefined : dynamic.holds.find((h) => h.station === s.name);
      const gear = g.outputGear;
      const load = gear && toothLoad(Math.max(through.torque, hold?.peakTorque ?? 0), gear.module, gear.teeth);
      const Y = gear && lewisFormFactor(gear.teeth);
      return {
        station: s.name,
        ratio: g.ratio,
        efficiency: g.efficiency,
        backDrivable: g.backDrivable,
        ratedOutputTorque: g.ratedOutputTorque,
        serviceFactor: g.serviceFactor,
        capacity,
        outputTorque: through.torque,
        upperBound: through.upperBound,
        inputTorque: forwardInputTorque(through.torque, g.ratio, g.efficiency),
        ratingRatio: through.torque / capacity,
        ...(hold ? { heldTorque: hold.peakTorque } : {}),
        ...(gear && load !== undefined && Y !== undefined ? { tooth: { load, formFactor: Y, bendingStress: lewisStress(load, gear.faceWidth, gear.module, Y) } } : {}),
      };
    });
}
