import type { Case } from '../case/case.ts';
import { torqueFromPower } from '../physics/power.ts';
import { forwardTorque } from '../physics/gear-stage.ts';

/** The torque the shaft carries in normal running, where the case says. */
export interface RunningTorque {
  /** N·m at shaft speed. */
  torque: number;
  /** Where it came from, in words, for the output. */
  source: string;
  /** The station whose drive gave it. */
  station: string;
}

/**
 * The running torque at shaft speed from the first station with a `drive:`: its `running_torque`
 * (given at the motor shaft, so times the drive's speed ratio at the machine shaft, and the
 * station's gearbox efficiency where it has one: src/physics/gear-stage.ts), or else its
 * `power` over the shaft speed ω (T = P/ω). ω is the case's speed at the stop, taken
 * as the running speed. Undefined when no drive gives either. The one place the resize options
 * read the drive: the dynamics model's fuller drive replaces what is read here, not the callers.
 */
export function runningTorque(c: Case): RunningTorque | undefined {
  for (const s of c.stations) {
    const d = s.drive;
    if (d?.runningTorque !== undefined) {
      const ratio = d.speedRatio;
      const eta = s.gearbox?.efficiency ?? 1;
      return {
        torque: forwardTorque(d.runningTorque, ratio, eta),
        source: `running_torque of the drive at "${s.name}"${ratio !== 1 ? ` × its speed ratio ${ratio}` : ''}${eta !== 1 ? ` × its gearbox's efficiency ${eta}` : ''}`,
        station: s.name,
      };
    }
    if (d?.power !== undefined) {
      const eta = s.gearbox?.efficiency ?? 1;
      return {
        torque: torqueFromPower(d.power, c.speed) * eta,
        source: `power of the drive at "${s.name}" over the shaft speed, T = P/ω${eta !== 1 ? `, × its gearbox's efficiency ${eta}` : ''}`,
        station: s.name,
      };
    }
  }
  return undefined;
}
