import type { TorqueSpeedLine } from './motor-torque.ts';

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
  /** Piece of the motor's curve the motor's speed is on. */
  piece: number;
  /** Total slip angle so far, rad at the shaft. */
  slipAngle: number;
  /** Friction work in the belt so far, J. */
  slipWork: number;
}
