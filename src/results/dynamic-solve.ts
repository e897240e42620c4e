import { DEFAULT_DYNAMIC_PLASTICITY, type Case } from '../case/case.ts';
import { buildChain, type Chain } from '../model/chain.ts';
import { sideModes, type SideMode } from '../model/chain-modes.ts';
import type { ShaftModel, SideName } from '../model/shaft-model.ts';
import { integrateChain, type IntegrationResult } from '../physics/integrator/integrate-chain.ts';
import { jamWithFit } from './fit-at-stop.ts';
import { leastDampingRatio } from './element-damping.ts';
import { shaftElementLaw } from './shaft-element-law.ts';
import { systemOf } from './system-of-chain.ts';

/** One solution of the chain at one element count. */
export interface ChainSolution {
  chain: Chain;
  modes: SideMode[];
  run: IntegrationResult;
  /** Peak |torque| per chain piece over the window, N·m, and when. */
  piecePeak: number[];
  pieceTime: number[];
  /** The element carrying each piece's peak. */
  pieceElement: number[];
}

export interface DynamicSolve {
  final: ChainSolution;
  /** The element count aimed at for `final` (`analysis.elements` set to it gives the same chain). */
  target: number;
  /** Peak torque (max over pieces) at each element count tried. */
  refinement: { elements: number; peakTorque: number }[];
  /** Whether the last refinement changed every piece's peak by less than REFINE_TOLERANCE of the largest. */
  converged: boolean;
  /** Largest change of a piece's peak at the last refinement, relative to the largest peak. */
  lastChange: number;
  notes: string[];
}

/** What a solution may leave out. */
export interface SolveOptions {
  /**
   * false: no sampled time histories (\`IntegrationResult.history\` is empty), for a rerun that
   * reads only peaks and what the laws kept (the read-back's trial speeds, the elastic peaks, a
   * Monte Carlo sample): the peaks are taken at every step either way.
   */
  histories?: boolean;
}

/** Refinement stops when no piece's peak torque moves by more than this share of the largest. */
export const REFINE_TOLERANCE = 0.005;
/** Steps per period of the lowest mode. */
const STEPS_PER_LOWEST_PERIOD = 120;
/** Steps per period of the highest mode that carries energy (see `stepFor`). */
const STEPS_PER_ENERGETIC_PERIOD = 20;
/** Auto refinement doubles the elements up to this many, within the work budget below. */
const MAX_AUTO_ELEMENTS = 96;
/** Element-steps all refinement levels together may take, to keep `check` quick. */
const WORK_BUDGET = 4e6;
/** Steps one run may take at most; a longer window takes coarser steps (and says so). */
const MAX_STEPS = 60000;
/** Longest default window, s. */
const MAX_DEFAULT_DURATION = 2;

/**
 * Solves the dynamic model: with shaft inertia, doubling the elements from one per piece until the
 * peak torque of every piece changes by less than 0.5 % (bounded by a work budget), or at the
 * case's fixed `analysis.elements`; without shaft inertia, the one chain of stations.
 */
export function solveDynamics(asGiven: Case, model: ShaftModel, opts: SolveOptions = {}): DynamicSolve {
  const c = jamWithFit(asGiven);
  const notes: string[] = [];
  let shaftInertiaOn = c.analysis.shaftInertia;
  if (shaftInertiaOn && c.shaft.segments.some((s) => c.materials[s.material].density === undefined)) {
    shaftInertiaOn = false;
    notes.push("The shaft's own inertia is left out of the dynamic model because a shaft material has no density.");
  }
  const pieceCount = buildChain(c, model, { elements: 1, shaftInertia: false }).pieces.length;
  const fixed = !shaftInertiaOn ? pieceCount : c.analysis.elements;
  const refinement: DynamicSolve['refinement'] = [];
  let prev: ChainSolution | undefined;
  let prevTarget = 0;
  let lastChange = Infinity;
  let work = 0;
  for (let target = fixed ?? pieceCount; ; target *= 2) {
    const sol = solveOnce(c, model, target, shaftInertiaOn, notes, opts.histories ?? true);
    work += sol.run.steps * sol.chain.elements.length;
    refinement.push({ elements: sol.chain.elements.length, peakTorque: Math.max(...sol.piecePeak) });
    if (prev) {
      const top = Math.max(...sol.piecePeak);
      lastChange = Math.max(...sol.piecePeak.map((p, i) => Math.abs(p - prev!.piecePeak[i]) / top));
    }
    prev = sol;
    prevTarget = target;
    if (fixed !== undefined || lastChange < REFINE_TOLERANCE) break;
    // The next level has twice the elements, so about twice this level's work.
    const nextWork = 2 * sol.run.steps * sol.chain.elements.length;
    if (target * 2 > MAX_AUTO_ELEMENTS || work + nextWork > WORK_BUDGET) break;
  }
  const converged = fixed !== undefined || lastChange < REFINE_TOLERANCE;
  if (!converged) {
    notes.push(
      `The peak torques were still changing by ${(100 * lastChange).toFixed(1)} % at ${prev!.chain.elements.length} shaft elements when refinement stopped; set analysis.elements higher for a closer result.`,
    );
  }
  return { final: prev!, target: prevTarget, refinement, converged, lastChange: Number.isFinite(lastChange) ? lastChange : 0, notes: [...new Set(notes)] };
}

function solveOnce(c: Case, model: ShaftModel, target: number, shaftInertia: boolean, notes: string[], histories: boolean): ChainSolution {
  const chain = buildChain(c, model, { elements: target, shaftInertia });
  const P = chain.stopNode;
  if (c.stop.torqueCapacity !== undefined && !(chain.nodes[P].inertia > 0)) {
    const floor = 1e-3 * Math.min(...chain.nodes.filter((n) => n.inertia > 0).map((n) => n.inertia));
    chain.nodes[P].inertia = floor;
    notes.push("The stop station carries no inertia, so the soft jam's slipping point is given a token one (a thousandth of the lightest node's).");
  }
  const modes = sideModes(chain, 12);
  const lowest: Partial<Record<SideName, number>> = {};
  for (const m of modes) lowest[m.side] ??= m.omega;
  const plastic = c.analysis.dynamicPlasticity ?? DEFAULT_DYNAMIC_PLASTICITY;
  const sys = systemOf(chain, c.speed, c.stop, c, lowest, plastic ? (el, twist) => shaftElementLaw(c, chain, el, twist) : undefined);
  const omega1 = Math.min(...modes.map((m) => m.omega));
  const duration = c.analysis.duration ?? defaultDuration(c, chain, omega1);
  const steps = stepFor(modes, c.stop.duration, leastDampingRatio(c, chain.elements));
  let h = steps.regular;
  if (duration / h > MAX_STEPS) {
    h = duration / MAX_STEPS;
    notes.push(
      `The window of ${duration.toPrecision(3)} s is long for the lowest mode, so the time step was widened to ${(h * 1e6).toPrecision(3)} µs (${((2 * Math.PI) / omega1 / h).toFixed(0)} steps per lowest period).`,
    );
  }
  const fineSpan = Math.min(duration, c.stop.duration + steps.settle);
  if (fineSpan / steps.fine > MAX_STEPS) {
    // A long ramp at the step of the highest energetic mode would take without bound.
    steps.fine = fineSpan / MAX_STEPS;
    notes.push(`The stop's ramp of ${c.stop.duration.toPrecision(3)} s is long for the highest energetic mode, so its time step was widened to ${(steps.fine * 1e6).toPrecision(3)} µs.`);
  }
  const run = integrateChain(sys, {
    duration,
    timeStep: h,
    fineStep: steps.fine,
    fineUntil: c.stop.duration + steps.settle,
    fineAfterEvent: steps.afterEvent,
    ...(histories ? {} : { samples: 0 }),
  });
  const piecePeak = chain.pieces.map(() => 0);
  const pieceTime = chain.pieces.map(() => 0);
  const pieceElement = chain.pieces.map(() => -1);
  chain.elements.forEach((el, e) => {
    for (const i of el.pieces) {
      if (run.peakTorque[e] > piecePeak[i]) {
        piecePeak[i] = run.peakTorque[e];
        pieceTime[i] = run.peakTime[e];
        pieceElement[i] = e;
      }
    }
  });
  return { chain, modes, run, piecePeak, pieceTime, pieceElement };
}

/**
 * The steps. Regular: 120 per period of the lowest mode. Fine, for the transients (from the stop
 * through its ramp and 0.3 of a lowest period, past the first peak at a quarter period, and for
 * ten periods of the highest energetic mode after every event): 20 per period of every mode
 * up to the one where 99 % of a side's energy after an instantaneous stop is accounted for, and 40
 * over a stop's ramp. Once stiffness-proportional damping has taken the higher modes down (ten
 * periods of the highest of them at least), the regular step carries on;
 * without damping the fine step is kept throughout. The trapezoidal rule is stable at any step,
 * so the choice is one of accuracy only.
 */
function stepFor(modes: SideMode[], ramp: number, damping: number): { regular: number; fine: number; settle: number; afterEvent: number } {
  const T1 = (2 * Math.PI) / Math.min(...modes.map((m) => m.omega));
  let fine = T1 / STEPS_PER_LOWEST_PERIOD;
  let shortest = T1;
  for (const side of ['A', 'B'] as const) {
    let sum = 0;
    for (const m of modes.filter((x) => x.side === side)) {
      shortest = Math.min(shortest, (2 * Math.PI) / m.omega);
      sum += m.participation;
      if (sum >= 0.99) break;
    }
  }
  fine = Math.min(fine, shortest / STEPS_PER_ENERGETIC_PERIOD);
  if (ramp > 0) fine = Math.min(fine, ramp / 40);
  const regular = damping > 0 ? T1 / STEPS_PER_LOWEST_PERIOD : fine;
  return { regular, fine, settle: Math.max(10 * shortest, 0.3 * T1), afterEvent: Math.max(10 * shortest, 20 * fine) };
}

/**
 * Default window: the stop's ramp and eight periods of the lowest mode; longer where something
 * slips, by the time its friction alone would take to bring to rest what it holds back (a
 * limiter: the inertia beyond it; a belt: the rotor; a soft jam: everything), plus four periods;
 * at most 2 s.
 */
function defaultDuration(c: Case, chain: Chain, omega1: number): number {
  const T1 = (2 * Math.PI) / omega1;
  const P = chain.stopNode;
  const rotorAt = (i: number) => chain.drives.reduce((s, d) => s + (d.belt && d.node === i ? d.rotorInertia : 0), 0);
  const inertiaOf = (keep: (i: number) => boolean) => chain.nodes.reduce((s, n, i) => s + (keep(i) ? n.inertia + rotorAt(i) : 0), 0);
  const times: number[] = [];
  chain.elements.forEach((el, e) => {
    if (el.device?.kind !== 'torque limiter' && el.device?.kind !== 'hub fit') return;
    const beyond = inertiaOf((i) => (e < P ? i <= e : i > e));
    times.push((beyond * c.speed) / el.device.torque);
  });
  for (const d of chain.drives) if (d.belt) times.push((d.rotorInertia * c.speed) / d.belt.slipTorque);
  if (c.stop.torqueCapacity !== undefined) times.push((inertiaOf(() => true) * c.speed) / c.stop.torqueCapacity);
  // A drive that trips drives the slip until then; afterwards the friction brings the rest to rest.
  const trip = Math.max(0, ...c.stations.map((s) => s.drive?.tripAfter ?? 0));
  const slipTime = Math.max(0, ...times) + (times.length > 0 ? trip : 0);
  return Math.min(MAX_DEFAULT_DURATION, Math.max(c.stop.duration + 8 * T1, trip + 8 * T1, slipTime + 4 * T1));
}
