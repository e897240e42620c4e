import { holdingJamTorque, holdingTorque, motorPieceValue, stuckBeltTorque } from './chain-forces.ts';
import type { ChainStepper } from './chain-stepper.ts';
import { setPiece, type DriveState } from './drive-state.ts';
import { ElasticLaw } from '../torque-law.ts';

/** Where an event comes from: an element's law, a drive's belt, the jam, a drive's motor curve, or a one-way node (`ChainSystem.holds`). */
export type EventSource = { kind: 'element'; index: number } | { kind: 'belt'; index: number } | { kind: 'jam' } | { kind: 'motor'; index: number } | { kind: 'hold'; index: number };

/** An event the integrator located in time. */
export interface ChainEvent {
  /** s from the stop's start. */
  time: number;
  source: EventSource;
  /** What happened, in words without the element's name: "starts to slip", "parts", "reaches standstill". */
  what: string;
}

/** The event functions the integrator watches, for a system: elements with a law other than plain elastic (limiters, pins, yielding shaft), belts, a soft jam, motors. */
export function eventSources(st: ChainStepper): EventSource[] {
  const out: EventSource[] = [];
  st.laws.forEach((l, e) => {
    if (!(l instanceof ElasticLaw)) out.push({ kind: 'element', index: e });
  });
  st.drives.forEach((d, i) => {
    if (d.beltSlipTorque !== undefined) out.push({ kind: 'belt', index: i });
  });
  if (st.sys.stop.torqueCapacity !== undefined) out.push({ kind: 'jam' });
  st.drives.forEach((_, i) => out.push({ kind: 'motor', index: i }));
  st.holdNode.forEach((_, i) => out.push({ kind: 'hold', index: i }));
  return out;
}

/**
 * Event values at the stepper's trial end, into `out`: ≤ 0 while each element, belt, jam and motor
 * stays on its branch, > 0 once it has left it.
 */
export function eventValues(st: ChainStepper, sources: readonly EventSource[], out: Float64Array): void {
  for (let k = 0; k < sources.length; k++) {
    const src = sources[k];
    if (src.kind === 'element') {
      out[k] = st.laws[src.index].leave(st.thetaT[src.index], st.rateT[src.index]);
    } else if (src.kind === 'belt') {
      const d = st.drives[src.index];
      d.beltTorque = d.stuck ? stuckBeltTorque(st, d) : d.sigma * d.beltSlipTorque!;
      out[k] = d.stuck ? Math.abs(d.beltTorque) - d.beltSlipTorque! : -d.sigma * (d.vRT - st.vT[d.node]);
    } else if (src.kind === 'jam') {
      out[k] = st.jam === 0 ? Math.abs(holdingJamTorque(st)) - st.sys.stop.torqueCapacity! : -st.jam * (st.vT[st.P] - st.motion.speedAt(st.t + st.hT));
    } else if (src.kind === 'hold') {
      // Free: its speed going below zero; held: the holding torque turning negative (the torques on
      // the node push it forward again).
      const i = st.holdNode[src.index];
      out[k] = st.held[src.index] ? -holdingTorque(st, i) : -st.vT[i];
    } else {
      out[k] = motorPieceValue(st, st.drives[src.index]);
    }
  }
}

/**
 * Moves the source onto the branch the committed state enters, and says what happened. `direction`
 * is the sense the motor's speed was moving in (for the motor curve's next piece).
 */
export function enterEvent(st: ChainStepper, src: EventSource, direction: number): string {
  if (src.kind === 'element') {
    const e = src.index;
    return st.laws[e].enter(st.theta[e], st.v[e + 1] - st.v[e]);
  }
  if (src.kind === 'belt') return enterBelt(st, st.drives[src.index]);
  if (src.kind === 'jam') return enterJam(st);
  if (src.kind === 'hold') return enterHold(st, src.index);
  const d = st.drives[src.index];
  setPiece(d, Math.max(0, Math.min(d.line.speeds.length, d.piece + (direction >= 0 ? 1 : -1))));
  st.dirty = true;
  const crossed = d.line.speeds[direction < 0 ? d.piece : d.piece - 1];
  if (crossed === 0) return direction < 0 ? 'reaches standstill' : 'turns forward again';
  return 'passes a point of its curve';
}

function enterBelt(st: ChainStepper, d: DriveState): string {
  if (d.stuck) {
    const Tb = stuckBeltTorque(st, d);
    d.stuck = false;
    d.sigma = Tb >= 0 ? 1 : -1;
    d.vR = st.v[d.node];
    st.updateInertia();
    return 'starts to slip';
  }
  // The rotor has caught up with its pulley: try sticking, keeping the momentum of the pair.
  const J = st.jeff[d.node];
  const merged = (J * st.v[d.node] + d.rotorInertia * d.vR) / (J + d.rotorInertia);
  d.slipWork += 0.5 * J * st.v[d.node] ** 2 + 0.5 * d.rotorInertia * d.vR ** 2 - 0.5 * (J + d.rotorInertia) * merged ** 2;
  st.v[d.node] = merged;
  d.vR = merged;
  d.stuck = true;
  st.updateInertia();
  st.refreshStart();
  const Tb = stuckBeltTorque(st, d);
  if (Math.abs(Tb) <= d.beltSlipTorque! * (1 + 1e-9)) return 'stops slipping';
  d.stuck = false;
  d.sigma = Tb >= 0 ? 1 : -1;
  st.updateInertia();
  return 'reverses its slip';
}

function enterJam(st: ChainStepper): string {
  const cap = st.sys.stop.torqueCapacity!;
  if (st.jam === 0) {
    st.jam = holdingJamTorque(st) <= 0 ? 1 : -1;
    st.dirty = true;
    return 'starts to slip';
  }
  const ground = st.motion.speedAt(st.t);
  st.jamWork += 0.5 * st.jeff[st.P] * (st.v[st.P] ** 2 - ground ** 2);
  st.v[st.P] = ground;
  st.jam = 0;
  st.dirty = true;
  st.refreshStart();
  const R = holdingJamTorque(st);
  if (Math.abs(R) <= cap * (1 + 1e-9)) return 'holds again';
  st.jam = R <= 0 ? 1 : -1;
  return 'slips again';
}

/**
 * A one-way node reaching standstill on its way backwards is caught and held (its speed, within
 * the located event's tolerance of zero, set to zero; the kinetic energy that takes is booked); a
 * held one is let go once the torques on it push it forward.
 */
function enterHold(st: ChainStepper, k: number): string {
  const i = st.holdNode[k];
  st.dirty = true;
  if (!st.held[k]) {
    st.holdWork += 0.5 * st.jeff[i] * st.v[i] ** 2;
    st.v[i] = 0;
    st.held[k] = 1;
    st.heldNode[i] = 1;
    st.refreshStart();
    return 'holds the shaft against turning backwards';
  }
  st.held[k] = 0;
  st.heldNode[i] = 0;
  return 'lets the shaft go forward again';
}

/**
 * Finds where in the trial step of length h the first event happens, by the Illinois variant of
 * regula falsi (Dahlquist & Björck, Numerical Methods, Sec. 6.2; from memory, confident) on the
 * largest of the violated event functions, each scaled by its change over the step; leaves the
 * stepper's trial at that point (on the safe side of it) and returns the sources that reach their
 * switch there.
 */
export function locateEvent(st: ChainStepper, sources: readonly EventSource[], h: number, ev0: Float64Array, evT: Float64Array): number[] {
  const V: number[] = [];
  const scale: number[] = [];
  for (let k = 0; k < sources.length; k++) {
    if (evT[k] > 0) {
      V.push(k);
      scale.push(Math.max(evT[k] - ev0[k], 1e-300));
    }
  }
  const vals = new Float64Array(sources.length);
  const G = (x: ArrayLike<number>) => V.reduce((g, k, j) => Math.max(g, x[k] / scale[j]), -Infinity);
  let lo = 0;
  let glo = Math.min(G(ev0), 0);
  let hi = 1;
  let ghi = G(evT);
  let side = 0;
  let found = -1;
  for (let it = 0; it < 80 && hi - lo > 1e-12; it++) {
    let s = glo < 0 ? lo + ((hi - lo) * glo) / (glo - ghi) : 0.5 * (lo + hi);
    if (!(s > lo && s < hi)) s = 0.5 * (lo + hi);
    st.trial(s * h);
    eventValues(st, sources, vals);
    const g = G(vals);
    if (g > 0) {
      hi = s;
      ghi = g;
      if (side === 1) glo *= 0.5;
      side = 1;
    } else {
      lo = s;
      glo = g;
      if (side === -1) ghi *= 0.5;
      side = -1;
    }
    if (Math.abs(g) < 1e-12) {
      found = s;
      break;
    }
  }
  // The root itself where it was hit, else the bracket's safe end (its late end if the event is at the start).
  const s = found >= 0 ? found : lo > 0 ? lo : hi;
  st.trial(s * h);
  eventValues(st, sources, vals);
  const hit = V.filter((k, j) => vals[k] / scale[j] >= -1e-6);
  if (hit.length === 0) {
    let best = V[0];
    V.forEach((k, j) => {
      if (vals[k] / scale[j] > vals[best] / scale[V.indexOf(best)]) best = k;
    });
    hit.push(best);
  }
  return hit;
}
