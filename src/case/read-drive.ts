import type { CaseReader, Path } from './case-reader.ts';
import type { Drive, MotorTorqueSpec, Part, Station } from './case.ts';
import { CURVE_POINT_SHAPE, DRIVE_SHAPE, keysOf } from './case-shape.ts';
import { NUMBER_LIMITS, SIZE_LIMITS } from './limits.ts';
import { readBelt } from './read-belt.ts';

const DRIVE_KEYS = keysOf(DRIVE_SHAPE);
/** Parts at a direct drive (speed ratio 1) whose names say they are the motor's rotor. */
const ROTOR_NAME = /\b(motor|rotor)\b/i;

/**
 * A station's `drive:`. The rotor's inertia is counted once, as a part: `rotor_inertia` (at the
 * motor's own speed) is added to the station's `parts` as "motor rotor"; without it the rotor is
 * the station's parts that turn at the drive's speed ratio. A rotor given both ways is refused.
 * `parts` is the station's list being built; the rotor part is appended to it. `gearRatio` is the
 * station's gearbox ratio, where it has one: without a belt the motor turns at it, so it is the
 * drive's speed ratio where the case leaves that out, and a different one is refused (one fact,
 * said once); with a belt the drive's ratio is the belt's times the gearbox's, and is not checked.
 */
export function readDrive(r: CaseReader, path: Path, parts: Part[], gearRatio?: number): Drive | undefined {
  if (!r.map(path, DRIVE_KEYS)) return undefined;
  const givenRatio = r.number([...path, 'speed_ratio'], {
    example: "the motor's speed over the shaft's, from 0.001 to 1000, such as 3.52",
    min: NUMBER_LIMITS.speedRatio[0],
    max: NUMBER_LIMITS.speedRatio[1],
  });
  const rotorInertia = r.quantity([...path, 'rotor_inertia'], 'inertia', { positive: true, example: 'the rotor\'s inertia from the motor data sheet, such as "0.42 kg*m^2"' });
  const power = r.quantity([...path, 'power'], 'power', { positive: true });
  const running = r.quantity([...path, 'running_torque'], 'torque', { positive: true, example: 'the motor\'s normal running torque, such as "240 N*m"' });
  const torque = readMotorTorque(r, path);
  const belt = r.has([...path, 'belt']) ? readBelt(r, [...path, 'belt']) : undefined;
  const tripAfter = r.quantity([...path, 'trip_after'], 'time', {
    positive: true,
    example: 'the time from the stop after which the drive or overload relay cut the motor, from the drive\'s fault log, such as "250 ms"',
  });
  const torqueLimit = r.quantity([...path, 'torque_limit'], 'torque', {
    positive: true,
    example: 'the most torque the drive lets the motor give (its current limit as a torque, at the motor shaft), such as "300 N*m"',
  });

  const geared = [...new Set(parts.filter((p) => p.speedRatio !== 1).map((p) => p.speedRatio))];
  if (gearRatio !== undefined && !belt && givenRatio !== undefined && Math.abs(givenRatio - gearRatio) > 1e-9 * gearRatio) {
    r.fail(
      'E_RANGE',
      [...path, 'speed_ratio'],
      `${givenRatio} differs from this station's gearbox ratio ${gearRatio}, and no belt lies between: the motor turns at the gearbox's ratio; give it once (leave drive.speed_ratio out, or make it ${gearRatio})`,
    );
    return undefined;
  }
  let speedRatio = givenRatio ?? (gearRatio !== undefined && !belt ? gearRatio : 1);
  if (givenRatio === undefined && (gearRatio === undefined || belt) && geared.length === 1 && !rotorInertia) speedRatio = geared[0];
  if (givenRatio === undefined && (gearRatio === undefined || belt) && geared.length > 1 && !rotorInertia) {
    r.fail('E_MISSING', [...path, 'speed_ratio'], `the station's parts turn at several speed ratios (${geared.join(', ')}); give the motor's, such as speed_ratio: ${geared[0]}`);
    return undefined;
  }

  let rotorParts = parts.flatMap((p, i) => (p.speedRatio === speedRatio && speedRatio !== 1 ? [i] : []));
  if (rotorInertia) {
    const twice = parts.find((p) => (speedRatio !== 1 ? p.speedRatio === speedRatio : ROTOR_NAME.test(p.name)));
    if (twice) {
      r.fail(
        'E_RANGE',
        [...path, 'rotor_inertia'],
        `the rotor is already listed as the part "${twice.name}" (speed_ratio ${twice.speedRatio}); give its inertia once: drop drive.rotor_inertia or that part`,
      );
      return undefined;
    }
    parts.push({ name: 'motor rotor', shape: 'inertia', inertia: rotorInertia.value, count: 1, speedRatio, dimensions: { inertia: rotorInertia.value } });
    rotorParts = [parts.length - 1];
  }
  if (belt && rotorParts.length === 0) {
    r.fail(
      'E_MISSING',
      [...path, 'rotor_inertia'],
      `a belt drive needs the motor's rotor behind the belt: give rotor_inertia (at the motor's speed), or list the rotor as a part with speed_ratio ${speedRatio === 1 ? 'such as 3.5' : speedRatio}`,
    );
  }
  if (belt && parts.length === rotorParts.length) {
    r.fail('E_MODEL', [...path, 'belt'], "a belt drive needs the pulley on this shaft: add the pulley (sheave) to this station's parts");
  }
  if (parts.length === 0) {
    r.fail('E_MISSING', [...path, 'rotor_inertia'], 'a drive needs the rotor\'s inertia: give rotor_inertia, such as "0.42 kg*m^2", or the rotor as one of the station\'s parts');
  }
  const drive: Drive = { speedRatio, rotorParts };
  if (power) drive.power = power.value;
  if (running) drive.runningTorque = running.value;
  if (torque) drive.torque = torque;
  if (belt) drive.belt = belt;
  if (tripAfter) drive.tripAfter = tripAfter.value;
  if (torqueLimit) drive.torqueLimit = torqueLimit.value;
  return drive;
}

/** `torque:` (constant while pulled down) or `curve:` (speed–torque points from 0 rpm up), not both. */
function readMotorTorque(r: CaseReader, path: Path): MotorTorqueSpec | undefined {
  if (r.has([...path, 'torque']) && r.has([...path, 'curve'])) {
    r.fail('E_RANGE', [...path, 'curve'], 'give either torque (constant) or curve (speed–torque points), not both');
    return undefined;
  }
  if (r.has([...path, 'torque'])) {
    const t = r.quantity([...path, 'torque'], 'torque', { nonNegative: true, example: 'the motor\'s torque while it is pulled down, such as "580 N*m"' });
    return t && { kind: 'constant', torque: t.value };
  }
  const n = r.list([...path, 'curve'], { max: Infinity });
  if (n === 0 && !r.has([...path, 'curve'])) return undefined;
  if (n > SIZE_LIMITS.curvePoints) {
    r.fail('E_RANGE', [...path, 'curve'], `has ${n} points, more than ${SIZE_LIMITS.curvePoints}; give the curve's shape in fewer points, such as 5 to 20`);
    return undefined;
  }
  if (n < 2) {
    r.fail('E_RANGE', [...path, 'curve'], 'give at least two points, from 0 rpm to the running speed, such as [{speed: 0 rpm, torque: 580 N*m}, {speed: 1480 rpm, torque: 290 N*m}]');
    return undefined;
  }
  const points: { speed: number; torque: number }[] = [];
  for (let i = 0; i < n; i++) {
    const p = [...path, 'curve', i];
    if (!r.map(p, keysOf(CURVE_POINT_SHAPE), { required: true, example: 'a point such as {speed: 1200 rpm, torque: 640 N*m}' })) continue;
    const speed = r.quantity([...p, 'speed'], 'angular_speed', { required: true, nonNegative: true, example: 'the motor\'s speed at this point, such as "1200 rpm"' });
    const torque = r.quantity([...p, 'torque'], 'torque', { required: true, nonNegative: true, example: 'the motor\'s torque at this point, zero or more, such as "640 N*m"' });
    if (!speed || !torque) continue;
    if (i === 0 && speed.value !== 0) r.fail('E_RANGE', [...p, 'speed'], 'the curve starts at standstill; give the locked-rotor point first, such as {speed: 0 rpm, torque: 580 N*m}');
    if (points.length > 0 && speed.value <= points[points.length - 1].speed) {
      r.fail('E_RANGE', [...p, 'speed'], 'speeds must rise from one point to the next; list the points from 0 rpm upward');
    }
    points.push({ speed: speed.value, torque: torque.value });
  }
  return points.length === n ? { kind: 'curve', points } : undefined;
}

/**
 * Checks needing the whole case: a speed–torque curve must reach the motor's speed at the stop
 * (shaft speed × ratio), or the motor's torque there would be a guess. Call with no problems left.
 */
export function checkDriveCurves(r: CaseReader, stations: readonly Station[], shaftSpeed: number): void {
  stations.forEach((s, i) => {
    const t = s.drive?.torque;
    if (!s.drive || t?.kind !== 'curve') return;
    const motorSpeed = shaftSpeed * s.drive.speedRatio;
    const top = t.points[t.points.length - 1].speed;
    if (top < motorSpeed * (1 - 1e-9)) {
      const rpm = (w: number) => `${Number(((w * 60) / (2 * Math.PI)).toPrecision(4))} rpm`;
      r.fail(
        'E_RANGE',
        ['stations', i, 'drive', 'curve'],
        `ends at ${rpm(top)}, below the motor's speed at the stop (${rpm(motorSpeed)} = shaft speed × speed_ratio ${s.drive.speedRatio}); extend the curve to the synchronous speed`,
      );
    }
  });
}
