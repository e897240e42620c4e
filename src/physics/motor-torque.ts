import type { MotorTorqueSpec } from '../case/case.ts';

/**
 * A motor's torque against speed as a piecewise-linear function: linear between `speeds`, held at
 * the end values beyond them (below standstill the locked-rotor torque, above the last point the
 * last torque). Speeds rad/s, torques N·m, `speeds` strictly rising. A constant torque is a single
 * point at standstill, so the moment the motor's speed passes zero is still a breakpoint that the
 * integrator locates in time.
 */
export interface TorqueSpeedLine {
  speeds: readonly number[];
  torques: readonly number[];
}

/** The line at the motor's own shaft, from the case's spec. */
export function motorLine(spec: MotorTorqueSpec): TorqueSpeedLine {
  if (spec.kind === 'constant') return { speeds: [0], torques: [spec.torque] };
  return { speeds: spec.points.map((p) => p.speed), torques: spec.points.map((p) => p.torque) };
}

/**
 * The same motor seen at the machine shaft through a speed ratio r (motor speed / shaft speed):
 * power is conserved, so T_shaft = r·T_motor at ω_shaft = ω_motor/r (Den Hartog, Mechanical
 * Vibrations, geared systems; from memory, confident).
 */
export function reflectLine(line: TorqueSpeedLine, ratio: number): TorqueSpeedLine {
  return { speeds: line.speeds.map((w) => w / ratio), torques: line.torques.map((t) => t * ratio) };
}

/** Index of the piece that holds `speed`: 0 below the first point, n beyond the last (n = points). */
export function pieceOf(line: TorqueSpeedLine, speed: number): number {
  const s = line.speeds;
  let j = 0;
  while (j < s.length && speed >= s[j]) j++;
  return j;
}

/** Slope dT/dω on piece `j`, N·m·s/rad (0 on the held ends). */
export function pieceSlope(line: TorqueSpeedLine, j: number): number {
  if (j <= 0 || j >= line.speeds.length) return 0;
  return (line.torques[j] - line.torques[j - 1]) / (line.speeds[j] - line.speeds[j - 1]);
}

/** Torque on piece `j` at `speed` (extended linearly past the piece's ends, for trial steps). */
export function pieceTorque(line: TorqueSpeedLine, j: number, speed: number): number {
  if (j <= 0) return line.torques[0];
  if (j >= line.speeds.length) return line.torques[line.torques.length - 1];
  return line.torques[j - 1] + pieceSlope(line, j) * (speed - line.speeds[j - 1]);
}

/** Torque at `speed`, N·m. */
export function torqueAt(line: TorqueSpeedLine, speed: number): number {
  return pieceTorque(line, pieceOf(line, speed), speed);
}

/**
 * How far `speed` lies outside piece `j`, rad/s: ≤ 0 inside it, > 0 past one of its ends. The
 * integrator's event function for the motor moving onto the next piece of its curve.
 */
export function outsidePiece(line: TorqueSpeedLine, j: number, speed: number): number {
  const lo = j <= 0 ? -Infinity : line.speeds[j - 1];
  const hi = j >= line.speeds.length ? Infinity : line.speeds[j];
  return Math.max(lo - speed, speed - hi);
}

/**
 * The line held to at most `limit` (a drive's current limit, as a torque): where a piece crosses
 * the limit a point is put at the crossing, so the capped line is still piecewise linear and its
 * breakpoints are the integrator's events. Torques below the limit are kept as they are.
 */
export function capLine(line: TorqueSpeedLine, limit: number): TorqueSpeedLine {
  const speeds: number[] = [];
  const torques: number[] = [];
  const n = line.speeds.length;
  for (let i = 0; i < n; i++) {
    if (i > 0) {
      const t0 = line.torques[i - 1];
      const t1 = line.torques[i];
      if ((t0 - limit) * (t1 - limit) < 0) {
        const w = line.speeds[i - 1] + ((limit - t0) / (t1 - t0)) * (line.speeds[i] - line.speeds[i - 1]);
        speeds.push(w);
        torques.push(limit);
      }
    }
    speeds.push(line.speeds[i]);
    torques.push(Math.min(line.torques[i], limit));
  }
  return { speeds, torques };
}
