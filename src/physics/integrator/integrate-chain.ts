import { enterEvent, eventSources, eventValues, locateEvent, type ChainEvent } from './chain-events.ts';
import { ChainRecorder, type ChainHistory } from './chain-recorder.ts';
import { chainEnergy, holdingJamTorque, holdingTorque, motorPieceValue } from './chain-forces.ts';
import { ChainStepper } from './chain-stepper.ts';
import { tripDrive } from './drive-state.ts';
import type { ChainSystem } from './chain-system.ts';
import type { TorqueLaw } from '../torque-law.ts';

export interface IntegrationOptions {
  /** Simulated time from the stop's start, s. */
  duration: number;
  /** Regular step, s; steps are cut short at the ramp's end and at located events. */
  timeStep: number;
  /**
   * A finer step for the transients: used from the start until `fineUntil` (s) and for
   * `fineAfterEvent` (s) after every located event, where modes above the lowest are freshly
   * excited. Default: the regular step throughout.
   */
  fineStep?: number;
  fineUntil?: number;
  fineAfterEvent?: number;
  /** Samples kept for the histories (default 400; 0 keeps none, for a run whose peaks alone are read). */
  samples?: number;
}

/** What happened to a belt over the incident. */
export interface BeltOutcome {
  /** Friction work in the belt, J. */
  slipWork: number;
  /** Angle the belt slipped through at the shaft, rad. */
  slipAngle: number;
  /** Largest torque the belt carried, N·m at the shaft. */
  peakTorque: number;
  /** Whether it was still slipping when the window ended. */
  slippingAtEnd: boolean;
}

export interface IntegrationResult {
  duration: number;
  timeStep: number;
  /** Steps taken, including the short ones at events. */
  steps: number;
  /** Largest |torque| in each element over the window, N·m, and when. */
  peakTorque: Float64Array;
  peakTime: Float64Array;
  history: ChainHistory;
  /** The laws after the run (their dissipated work and slip or parting). */
  laws: TorqueLaw[];
  /** One per drive; undefined where the drive has no belt. */
  belts: (BeltOutcome | undefined)[];
  /** One per one-way node (`ChainSystem.holds`): the largest torque it held the shaft with against turning backwards, N·m (0: never held). */
  holds: { peakTorque: number }[];
  /** The soft jam, when it has a torque capacity. */
  jam?: { slipWork: number; slipAngle: number; slippingAtEnd: boolean };
  /** Largest torque the shaft put on a soft jam, N·m (0 for a jam that holds any torque). */
  peakJamTorque: number;
  events: ChainEvent[];
  /**
   * Each element's damping work over the window, J: its dashpot's, and the dashpot work its law
   * books itself (a slipping limiter's spring relaxing). Sums to `energy.dampingWork`.
   */
  elementDampingWork: Float64Array;
  /** Energy books over the window, J: final − initial = motor + boundary − damping − slip − released. */
  energy: { initial: number; final: number; motorWork: number; boundaryWork: number; dampingWork: number; slipWork: number; released: number };
}

/** Most events located at one instant before the integrator stops looking (guards against chatter). */
const MAX_EVENTS_AT_ONE_INSTANT = 12;

/**
 * The time history of the chain from the stop's start: fixed steps of the trapezoidal rule (see
 * `ChainStepper`), cut at the end of the stop's ramp, with every event (a limiter or belt starting
 * or ending its slip, a pin parting, the jam slipping, a motor reaching standstill) located within
 * its step by the Illinois variant of regula falsi (Dahlquist & Björck, Numerical Methods, Sec. 6.2;
 * from memory, confident) on the event functions, and the step restarted from there on the new
 * branch. Cost is O(elements) per step.
 */
export function integrateChain(sys: ChainSystem, opts: IntegrationOptions): IntegrationResult {
  const st = new ChainStepper(sys);
  const sources = eventSources(st);
  const K = sources.length;
  const ev0 = new Float64Array(K);
  const evT = new Float64Array(K);
  const events: ChainEvent[] = [];
  const rec = new ChainRecorder(st, opts.duration, opts.samples ?? 400);
  const belt = new Float64Array(st.drives.length);
  const soft = sys.stop.torqueCapacity !== undefined;
  const peakHold = new Float64Array(st.holdNode.length);
  // Belt torques at every step (for their peaks); the jam's only where it is kept (a soft jam's
  // peak, and the history's samples), as it costs a sum over the stop node's neighbours.
  const measure = (sampling: boolean): number => {
    // Each belt's torque was found with the event values of this same trial end.
    for (let i = 0; i < st.drives.length; i++) belt[i] = st.drives[i].beltSlipTorque === undefined ? NaN : st.drives[i].beltTorque;
    // A held one-way node's torque at this same trial end, for its peak (the rebound it takes).
    for (let k = 0; k < peakHold.length; k++) if (st.held[k]) peakHold[k] = Math.max(peakHold[k], holdingTorque(st, st.holdNode[k]));
    if (!soft && !sampling) return 0;
    return st.jam === 0 ? -holdingJamTorque(st) : st.jam * sys.stop.torqueCapacity!;
  };
  const enter = (k: number, direction: number) => {
    events.push({ time: st.t, source: sources[k], what: enterEvent(st, sources[k], direction) });
    st.refreshBranches();
  };

  // A branch may already be wrong at the start (a soft jam that cannot take the ramp's deceleration).
  eventValues(st, sources, ev0);
  for (let k = 0; k < K; k++) if (ev0[k] > 0) enter(k, -1);
  st.refreshStart();
  eventValues(st, sources, ev0);
  rec.record(0, belt, measure(true));
  const E0 = chainEnergy(st);

  const T = opts.duration;
  const h0 = opts.timeStep;
  const hFine = Math.min(opts.fineStep ?? h0, h0);
  let fineUntil = opts.fineUntil ?? 0;
  const rampEnd = sys.stop.duration;
  let steps = 0;
  let burst = 0;
  let burstTime = -1;
  const direction = new Float64Array(K);
  // A drive's trip is an event at a known time: the step lands on it, and from there the motor
  // gives no torque. Checked once a step, over the drives only.
  const tripAt = sys.drives.map((d) => d.tripAfter ?? Infinity);
  const tripped = sys.drives.map(() => false);
  let nextTrip = Math.min(Infinity, ...tripAt);
  while (st.t < T * (1 - 1e-12)) {
    if (st.t >= nextTrip * (1 - 1e-12) - 1e-15) {
      for (let j = 0; j < st.drives.length; j++) {
        if (tripped[j] || st.t < tripAt[j] * (1 - 1e-12) - 1e-15) continue;
        tripped[j] = true;
        tripDrive(st.drives[j], st.motorSpeed(st.drives[j], false));
        events.push({ time: st.t, source: { kind: 'motor', index: j }, what: 'trips: its torque is cut off' });
      }
      nextTrip = Math.min(Infinity, ...tripAt.filter((_, j) => !tripped[j]));
      st.dirty = true;
      fineUntil = Math.max(fineUntil, st.t + (opts.fineAfterEvent ?? 0));
      st.refreshStart();
      eventValues(st, sources, ev0);
    }
    // Steps end on the grid of the step in use, so an event's short step is followed by one that
    // brings the grid back (samples and the peak parabola then fall on equal steps).
    const hNow = st.t < fineUntil ? hFine : h0;
    let grid = (Math.floor(st.t / hNow) + 1) * hNow;
    if (grid - st.t < 1e-9 * hNow) grid += hNow;
    let h = Math.min(grid - st.t, T - st.t);
    // A step within rounding of the regular one is the regular one (the factorisation is kept).
    if (Math.abs(h - hNow) <= 1e-9 * hNow) h = hNow;
    if (rampEnd > st.t * (1 + 1e-12) + 1e-15 && rampEnd < st.t + h) h = rampEnd - st.t;
    if (nextTrip > st.t * (1 + 1e-12) + 1e-15 && nextTrip < st.t + h) h = nextTrip - st.t;
    st.trial(h);
    eventValues(st, sources, evT);
    // A motor passing a point of its curve is located only at standstill (its time is reported: the
    // motor stalls, or is driven backwards). Elsewhere the curve's torque is continuous at its points
    // (only the slope changes), so the step's error from the old piece is of second order in the
    // step, and a motor settled at a point (a free motor at its curve's end) would otherwise be
    // located anew every step. The piece is changed at the step's end instead (see below).
    let violated = false;
    let motorPassed = false;
    for (let k = 0; k < K; k++) {
      if (evT[k] <= 0) continue;
      const src = sources[k];
      if (src.kind === 'motor' && !passesStandstill(st, st.drives[src.index])) motorPassed = true;
      else violated = true;
    }
    if (violated && burst < MAX_EVENTS_AT_ONE_INSTANT) {
      sources.forEach((src, k) => (direction[k] = src.kind === 'motor' ? Math.sign(st.motorSpeed(st.drives[src.index], true) - st.motorSpeed(st.drives[src.index], false)) : 0));
      const hit = locateEvent(st, sources, h, ev0, evT);
      const jam = measure(rec.due(st.t + st.hT));
      st.commit();
      steps++;
      rec.record(st.hT, belt, jam);
      if (Math.abs(st.t - burstTime) < 1e-9 * h0) burst++;
      else {
        burst = 1;
        burstTime = st.t;
      }
      for (const k of hit) enter(k, direction[k]);
      fineUntil = Math.max(fineUntil, st.t + (opts.fineAfterEvent ?? 0));
      st.refreshStart();
      eventValues(st, sources, ev0);
      continue;
    }
    const last = st.t + h >= T * (1 - 1e-12);
    const jam = measure(last || rec.due(st.t + h));
    if (motorPassed) sources.forEach((src, k) => (direction[k] = src.kind === 'motor' ? Math.sign(st.motorSpeed(st.drives[src.index], true) - st.motorSpeed(st.drives[src.index], false)) : 0));
    st.commit();
    steps++;
    rec.record(h, belt, jam, last);
    if (motorPassed) {
      sources.forEach((src, k) => {
        if (src.kind !== 'motor') return;
        const d = st.drives[src.index];
        // Onto the piece that holds the speed now, one point at a time (each a point passed).
        for (let guard = 0; guard <= d.line.speeds.length && motorPieceValue(st, d) > 0; guard++) enter(k, direction[k]);
      });
      st.refreshStart();
      eventValues(st, sources, ev0);
    } else ev0.set(evT);
    if (Math.abs(st.t - burstTime) >= 1e-9 * h0) burst = 0;
  }

  const lawWork = st.laws.reduce((s, l) => s + (l.kind === 'torque limiter' ? l.dissipated : 0), 0);
  const released = st.laws.reduce((s, l) => s + (l.kind === 'shear pin' ? l.dissipated : 0), 0);
  const otherLaw = st.laws.reduce((s, l) => s + (l.kind !== 'torque limiter' && l.kind !== 'shear pin' ? l.dissipated : 0), 0);
  return {
    duration: T,
    timeStep: h0,
    steps,
    peakTorque: rec.peak,
    peakTime: rec.peakTime,
    history: rec.history(),
    laws: st.laws,
    belts: st.drives.map((d, i) => (d.beltSlipTorque === undefined ? undefined : { slipWork: d.slipWork, slipAngle: d.slipAngle, peakTorque: rec.peakBelt[i], slippingAtEnd: !d.stuck })),
    holds: Array.from(peakHold, (peakTorque) => ({ peakTorque })),
    jam: sys.stop.torqueCapacity === undefined ? undefined : { slipWork: st.jamWork, slipAngle: st.jamSlipAngle, slippingAtEnd: st.jam !== 0 },
    peakJamTorque: rec.peakJam,
    events,
    elementDampingWork: Float64Array.from(st.laws, (l, e) => st.elementDampingWork[e] + (l.dampingWork ?? 0)),
    energy: {
      initial: E0,
      final: chainEnergy(st),
      motorWork: st.motorWork,
      boundaryWork: st.boundaryWork,
      dampingWork: st.dampingWork + st.laws.reduce((s, l) => s + (l.dampingWork ?? 0), 0),
      slipWork: lawWork + otherLaw + st.drives.reduce((w, d) => w + d.slipWork, 0) + st.jamWork + st.holdWork,
      released,
    },
  };
}

/** Whether the motor's trial speed leaves its piece through the curve's point at standstill. */
function passesStandstill(st: ChainStepper, d: ChainStepper['drives'][number]): boolean {
  const w = st.motorSpeed(d, true);
  return (w > d.hi && d.hi === 0) || (w < d.lo && d.lo === 0);
}
