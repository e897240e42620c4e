/**
 * The torques of a gear stage of ratio i (input speed over output speed) and efficiency η, by the
 * definition of a gear unit's efficiency as output power over input power, η = P_out/P_in (common
 * practice: catalogues quote it so; Shigley's Mechanical Engineering Design, 9th ed., Ch. 13, the
 * force analysis of worm gearing, defines it the same way; from memory). With ω_in = i·ω_out:
 *
 *   driven forward (input drives output):   T_out = η·i·T_in,   so T_in = T_out/(η·i);
 *   back-driven (output drives input):       T_in = η·T_out/i.
 *
 * The dynamic model passes the motor's torque forward (× η·i: `forwardTorque`) at every speed,
 * also while the motor is back-driven, where a real mesh would pass T·i/η: the model then resists
 * the reversal a little less than the gears do, so the reverse swing and the rebound are not
 * understated. The rotor's inertia is reflected without loss (J·i²), so the mesh's losses while the
 * rotor's energy drives into the jam are left out and the peak is not understated either. The
 * rating check takes the input torque of a forward-driven stage (`forwardInputTorque`), since in a
 * jam the motor side drives into the stop.
 */

/** Output torque of a stage driven forward by input torque `input`, N·m. */
export function forwardTorque(input: number, ratio: number, efficiency: number): number {
  return input * ratio * efficiency;
}

/** Input torque that drives a stage forward against output torque `output`, N·m: T_out/(η·i). */
export function forwardInputTorque(output: number, ratio: number, efficiency: number): number {
  return output / (ratio * efficiency);
}
