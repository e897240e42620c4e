import { pieceOf, pieceSlope, pieceTorque, type TorqueSpeedLine } from '../motor-torque.ts';

/** A drive's state during the integration. */
export interface DriveState {
  node: number;
  line: TorqueSpeedLine;
  rotorInertia: number;
  beltSlipTorque?: number;
  /** Belt sticking (or no belt). */
  stuck: boolean;
  /** Slip sense while slipping: +1 rotor ahead of the pulley. */
  sigma: number;
  /** Rotor speed while the belt slips, committed and trial, rad/s at shaft. */
  vR: number;
  vRT: number;
  dphiR: number;
  /** Piece of the motor's curve the motor's speed is on, and that piece as T = base + slope·ω between lo and hi (see `setPiece`). */
  piece: number;
  base: number;
  slope: number;
  lo: number;
  hi: number;
  /** Belt torque at the last trial's end, N·m (set with the event values). */
  beltTorque: number;
  /** Total slip angle so far, rad at the shaft. */
  slipAngle: number;
  /** Friction work in the belt so far, J. */
  slipWork: number;
}

/** Puts the drive on piece j of its curve, caching the piece's line so steps make no calls for it. */
export function setPiece(d: DriveState, j: number): void {
  const s = d.line.speeds;
  d.piece = j;
  d.slope = pieceSlope(d.line, j);
  d.base = pieceTorque(d.line, j, 0);
  d.lo = j <= 0 ? -Infinity : s[j - 1];
  d.hi = j >= s.length ? Infinity : s[j];
}

/** The motor's torque at speed w on its current piece, N·m at the shaft. */
export function motorTorque(d: DriveState, w: number): number {
  return d.base + d.slope * w;
}

/** A motor with no torque at any speed: what a drive gives once its protection has tripped. */
const TRIPPED: TorqueSpeedLine = { speeds: [0], torques: [0] };

/** Cuts the drive's torque for good (its overload or drive trips): its line becomes zero at every speed. */
export function tripDrive(d: DriveState, motorSpeed: number): void {
  d.line = TRIPPED;
  setPiece(d, pieceOf(TRIPPED, motorSpeed));
}
