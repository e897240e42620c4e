import type { CaseReader, Path } from './case-reader.ts';
import type { Drive } from './case.ts';

/**
 * The keys of a station's `drive:` this branch reads. The dynamics model's fuller drive (rotor
 * inertia, torque curve, belt) replaces this reader; the resize options read the drive only through
 * `runningTorque` (src/results/running-torque.ts).
 */
export const DRIVE_KEYS = ['power', 'running_torque', 'speed_ratio'];

/** A station's `drive: {power, running_torque, speed_ratio}`; undefined when absent or wrong. */
export function readDrive(r: CaseReader, path: Path): Drive | undefined {
  if (!r.map(path, DRIVE_KEYS)) return undefined;
  const power = r.quantity([...path, 'power'], 'power', { positive: true, example: 'the power in normal running, such as "30 kW" or "15 hp"' });
  const torque = r.quantity([...path, 'running_torque'], 'torque', {
    positive: true,
    example: 'the torque at shaft speed in normal running, such as "680 N*m" or "500 lbf*ft"',
  });
  const speedRatio = r.number([...path, 'speed_ratio'], { example: "the drive's speed over the shaft's, such as 3.52", positive: true });
  const drive: Drive = {};
  if (power) drive.power = power.value;
  if (torque) drive.runningTorque = torque.value;
  if (speedRatio !== undefined) drive.speedRatio = speedRatio;
  return drive;
}
