import type { ChainSystem } from './chain-system.ts';
import type { StopMotion } from '../stop-motion.ts';
import type { TorqueLaw } from '../torque-law.ts';
import type { DriveState } from './drive-state.ts';
import { motorTorque } from './drive-state.ts';

/**
 * What the force functions read of the stepper's state: the fields of `ChainStepper`
 * (chain-stepper.ts, which implements this), named here so that this file does not import the
 * stepper that imports it.
 */
export interface StepperState {
  readonly sys: ChainSystem;
  readonly n: number;
  readonly m: number;
  readonly t: number;
  readonly v: Float64Array;
  readonly theta: Float64Array;
  readonly tq: Float64Array;
  readonly vT: Float64Array;
  readonly thetaT: Float64Array;
  readonly rateT: Float64Array;
  readonly hT: number;
  readonly jeff: Float64Array;
  readonly cEff: Float64Array;
  readonly acc: Float64Array;
  readonly laws: TorqueLaw[];
  readonly motion: StopMotion;
  readonly P: number;
  readonly jam: -1 | 0 | 1;
  readonly drives: DriveState[];
  /** 1 where a one-way node is held at standstill. */
  readonly heldNode: Uint8Array;
  motorSpeed(d: DriveState, trial: boolean): number;
}

// Torques, accelerations and energy of the chain at the stepper's trial end or committed state:
// what the event functions, the jam's work and the recorder read. Not on the hot path of a plain
// step, except the accelerations the recorder needs for end-face torques.

/**
 * Net torque on node i at the trial step's end, from the elements, motors, belts and a slipping
 * jam (not a holding jam). The dashpots enter with the step's mean twist rate Δθ/h, the rate the
 * trapezoidal rule itself uses: the end-point rate of an element much stiffer than the step
 * resolves swings from step to step and would make the belt and jam checks chatter.
 */
export function trialForce(st: StepperState, i: number): number {
  const { m, laws, thetaT, cEff, sys } = st;
  let F = 0;
  if (i > 0) F -= laws[i - 1].torque(thetaT[i - 1]) + cEff[i - 1] * meanRate(st, i - 1);
  if (i < m) F += laws[i].torque(thetaT[i]) + cEff[i] * meanRate(st, i);
  for (let j = 0; j < st.drives.length; j++) {
    const d = st.drives[j];
    if (d.node !== i) continue;
    F += d.stuck ? motorTorque(d, st.vT[i]) : d.sigma * d.beltSlipTorque!;
  }
  if (st.jam !== 0 && i === st.P) F -= st.jam * sys.stop.torqueCapacity!;
  return F;
}

/** Element e's mean twist rate over the trial step, rad/s (its end-point rate for a zero-length trial). */
function meanRate(st: StepperState, e: number): number {
  return st.hT > 0 ? (st.thetaT[e] - st.theta[e]) / st.hT : st.rateT[e];
}

/** Acceleration of node i at the trial step's end, rad/s² (the ramp's for a holding stop node). */
export function trialAcceleration(st: StepperState, i: number): number {
  if (i === st.P && st.jam === 0) return st.motion.accelerationAt(st.t + 0.5 * st.hT);
  if (st.heldNode[i] === 1) return 0;
  return trialForce(st, i) / st.jeff[i];
}

/** Torque a sticking belt must carry at the trial end: motor torque less what accelerates the rotor. */
export function stuckBeltTorque(st: StepperState, d: DriveState): number {
  return motorTorque(d, st.vT[d.node]) - d.rotorInertia * trialAcceleration(st, d.node);
}

/** Torque the holding jam puts on the stop node at the trial end, N·m. */
export function holdingJamTorque(st: StepperState): number {
  return st.jeff[st.P] * st.motion.accelerationAt(st.t + 0.5 * st.hT) - trialForce(st, st.P);
}

/**
 * Torque a held one-way node's backstop (or locked worm) puts on it at the trial end, N·m, positive
 * forward: what keeps the node at standstill against the torques that would turn it backwards.
 */
export function holdingTorque(st: StepperState, i: number): number {
  return -trialForce(st, i);
}

/** Motor-curve event value for drive d at the trial end (> 0: its speed left the curve's piece). */
export function motorPieceValue(st: StepperState, d: DriveState): number {
  const w = st.motorSpeed(d, true);
  return Math.max(d.lo - w, w - d.hi);
}

/**
 * Node accelerations the recorder's end-face torques take, at the committed state: from the
 * elements' law torques, motors, slipping belts and a slipping jam, over the node's inertia. The
 * dashpots are left out, as they are from every reported torque (see `ChainRecorder.elementTorque`):
 * with them, T ∓ ½j·a at a face would carry half the difference of the neighbouring dashpot torques,
 * and next to an instantaneously stopped node or a slipping device (no dashpot) that difference is
 * c·Δω, which grows as the shaft is split finer (c = β·k) and the step is shortened.
 */
export function updateAccelerations(st: StepperState, h: number): void {
  const { n, m, tq, acc, jeff, P } = st;
  acc.fill(0);
  for (let e = 0; e < m; e++) {
    acc[e] += tq[e];
    acc[e + 1] -= tq[e];
  }
  for (let j = 0; j < st.drives.length; j++) {
    const d = st.drives[j];
    acc[d.node] += d.stuck ? motorTorque(d, st.v[d.node]) : d.sigma * d.beltSlipTorque!;
  }
  if (st.jam !== 0) acc[P] -= st.jam * st.sys.stop.torqueCapacity!;
  for (let i = 0; i < n; i++) acc[i] = jeff[i] > 0 && st.heldNode[i] === 0 ? acc[i] / jeff[i] : 0;
  if (st.jam === 0) acc[P] = st.motion.accelerationAt(st.t - 0.5 * h);
}

/** Node i's torque averaged over the trial step as the trapezoidal rule takes it (elements, dashpots, motors), N·m. */
export function meanForce(st: StepperState, i: number): number {
  const { m, laws, cEff, hT: h } = st;
  let F = 0;
  const el = (e: number) => 0.5 * (st.tq[e] + laws[e].torque(st.thetaT[e])) + (cEff[e] * (st.thetaT[e] - st.theta[e])) / h;
  if (i > 0) F -= el(i - 1);
  if (i < m) F += el(i);
  for (let j = 0; j < st.drives.length; j++) {
    const d = st.drives[j];
    if (d.node !== i) continue;
    F += d.stuck ? d.base + 0.5 * d.slope * (st.vT[i] + st.v[i]) : d.sigma * d.beltSlipTorque!;
  }
  return F;
}

/** Total mechanical energy at the committed state: kinetic + strain, J. */
export function chainEnergy(st: StepperState): number {
  let E = 0;
  for (let i = 0; i < st.n; i++) E += 0.5 * st.jeff[i] * st.v[i] * st.v[i];
  for (const d of st.drives) if (!d.stuck) E += 0.5 * d.rotorInertia * d.vR * d.vR;
  for (let e = 0; e < st.m; e++) E += st.laws[e].energy(st.theta[e]);
  return E;
}
