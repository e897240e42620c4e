import { DEFAULT_DAMPING_RATIO, DEFAULT_DYNAMIC_PLASTICITY, type Case, type Segment } from '../case/case.ts';
import type { Chain } from '../model/chain.ts';
import type { ShaftModel, ShaftPiece, SideName } from '../model/shaft-model.ts';
import type { SideResult } from '../physics/energy-method.ts';
import { verdictShearStrength } from '../physics/shear-strength.ts';
import type { BeltSlip } from '../physics/slip.ts';
import { shearStress } from '../physics/torsion.ts';
import { PlasticElementLaw } from '../physics/plastic/plastic-element-law.ts';
import { BacklashLaw } from '../physics/backlash-law.ts';
import { ShearPinLaw } from '../physics/shear-pin-law.ts';
import { dynamicPieceDamage, type PieceDamage } from './dynamic-piece-damage.ts';
import { modeFrequencies, type ModeFrequency } from './mode-convergence.ts';
import { dynamicHistories, type DynamicHistories, type Series } from './dynamic-histories.ts';
import { yieldPath, type YieldPath } from './yield-path.ts';
import { runningChecks } from './running-checks.ts';
import { slipOutcomes, type PinOutcome, type SlipOutcome } from './dynamic-slips.ts';
import { solveDynamics, type DynamicSolve } from './dynamic-solve.ts';
import { dynamicDamping, type DynamicDamping } from './dynamic-damping.ts';

/** The dynamic model's result for one piece of shaft (a segment cut at stations). */
export interface DynamicPiece {
  piece: ShaftPiece;
  side: SideName;
  /** Largest |torque| over the window and along the piece, N·m, and when, s (capped by plasticity where the piece yields). */
  peakTorque: number;
  peakTime: number;
  /**
   * The peak the piece would have carried had the shaft stayed elastic, N·m: the same chain solved
   * with elastic elements where the yielding run yielded or broke (else `peakTorque`). The elastic
   * check (stress, stress / shear yield) stands on it, as the energy method's does, so that the ratio says how
   * far past yield the incident went instead of stopping at the fully plastic torque.
   */
  elasticPeakTorque: number;
  /** kt times the outer-fibre stress at the elastic peak torque, Pa. */
  shearStress: number;
  shearYield: number;
  yieldRatio: number;
  /** Twist left in the piece at the end of the window, rad: elastic unloading from its peak (0 where it stayed elastic, broke, or plasticity is off). */
  permanentTwist: number;
  /** Largest outer-fibre shear strain of the net section, rad (0 where plasticity is off). */
  maxShearStrain: number;
  /** Whether the piece broke in the incident (its fracture strain, or a brittle piece's fracture torque, reached). */
  broken: boolean;
  /** When it broke, s from the stop's start. */
  breakTime?: number;
}

/** Energy method against dynamic model for one side. */
export interface SideComparison {
  side: SideName;
  energyPeakTorque: number;
  dynamicPeakTorque: number;
  energyYieldRatio: number;
  dynamicYieldRatio: number;
}

export interface DynamicMode {
  side: SideName;
  /** Hz. */
  frequency: number;
  /** Share of its side's running energy it rings with after an instantaneous stop. */
  participation: number;
  /** The shape along the shaft: node positions, m, and amplitudes (largest +1), the stop at 0. */
  at: number[];
  amplitude: number[];
}

/** The lumped torsional chain solved in time: the refined result beside the energy method. */
export interface DynamicResult {
  /** Shaft elements in the chain (springs between nodes). */
  elements: number;
  /** The element count aimed at (`analysis.elements` set to it gives the same chain), for reruns. */
  elementTarget: number;
  shaftInertia: boolean;
  dampingRatio: number;
  /** Simulated window from the stop's start, s, and the regular time step, s. */
  duration: number;
  timeStep: number;
  steps: number;
  /** Peak torque at each element count tried (automatic refinement), and whether it settled. */
  refinement: { elements: number; peakTorque: number }[];
  converged: boolean;
  /** Natural frequencies with the stop held, Hz, ascending (the lowest ten at most). */
  naturalFrequencies: number[];
  /**
   * The same modes with their side, their share of the side's energy after an instantaneous stop,
   * and whether the element count resolves them (within 1 %, from a chain with twice the elements;
   * see `modeFrequencies`). Higher modes of a coarse chain are low.
   */
  frequencies: ModeFrequency[];
  /** The lowest three modes with their shapes. */
  modes: DynamicMode[];
  pieces: DynamicPiece[];
  sides: SideComparison[];
  /** Maxima over all pieces and the whole window. */
  peakTorque: number;
  maxShearStress: number;
  yieldRatio: number;
  /** Index into `pieces` of the highest stress / shear yield. */
  governing: number;
  slips: SlipOutcome[];
  pins: PinOutcome[];
  /** Belts and their slip torque, with the capstan working where it came from belt data. */
  belts: { station: string; slip: BeltSlip }[];
  /** Located events in time order, as sentences (the first `MAX_EVENTS_KEPT`; `eventCount` says how many there were). */
  events: { time: number; text: string }[];
  eventCount: number;
  /** Each gap (a segment's backlash): the segment, the gap, rad, and how often it closed. */
  gaps: { segment: Segment; gap: number; contacts: number }[];
  /**
   * Each one-way node (a backstop, a self-locking gearbox) the dynamic model carries: its station,
   * the largest torque it held the shaft with against turning backwards (the rebound torque, N·m
   * at shaft speed; 0 where it never had to hold), and when it first held, s from the stop.
   */
  holds: { station: string; kind: 'backstop' | 'self-locking gearbox'; peakTorque: number; firstHeld?: number }[];
  /** Each drive's protection: its torque limit at the motor shaft, N·m, and when it tripped, s from the stop (undefined: it did not trip in the window). */
  protection: { station: string; torqueLimit?: number; tripAfter?: number; trippedAt?: number }[];
  /**
   * Whether the shaft elements carried their law past yield (analysis.dynamic_plasticity): the
   * elastic–plastic law of ductile material, or the brittle element's break at its fracture torque.
   */
  plasticity: boolean;
  /** Whether any shaft element went past yield. */
  yielded: boolean;
  /** Whether any shaft element broke. */
  fractured: boolean;
  /** Work of plastic flow in the shaft elements, J (part of `energy.slipWork`). */
  plasticWork: number;
  /** Energy books, J: final − initial = motor + boundary − damping − slip − released. */
  energy: { initial: number; final: number; motorWork: number; boundaryWork: number; dampingWork: number; slipWork: number; released: number };
  /** Which damper took `energy.dampingWork`, and whether the response still rings at the window's end. */
  damping: DynamicDamping;
  histories: DynamicHistories;
  /** The torque–twist path of the piece with the largest permanent twist, when one took any. */
  yieldPath?: YieldPath;
  /** The model's assumptions, as sentences for the report. */
  assumptions: string[];
  /** Remarks on this case's solution (refinement, window), as sentences. */
  notes: string[];
}

/** Events kept in the results (a belt that keeps reversing its slip can log hundreds). */
const MAX_EVENTS_KEPT = 100;
const QUIET_YIELD_EVENTS = new Set(['turns back', 'rejoins an earlier loading path', 'yields on']);

/** The piece that broke first in the dynamic model, if any. */
/**
 * The torque history of the dynamic model's piece that spans `piece` (a piece of the shaft model,
 * as the finding names it), or undefined where the dynamic model has none: one place for the
 * torque figure and the fatigue count to find the governing piece's history.
 */
export function pieceTorqueHistory(d: Pick<DynamicResult, 'pieces' | 'histories'>, piece: ShaftPiece): Series | undefined {
  const i = d.pieces.findIndex((p) => p.piece.start <= piece.start + 1e-9 && p.piece.end >= piece.end - 1e-9 && p.piece.segment.index === piece.segment.index);
  return i >= 0 ? d.histories.pieceTorques[i] : undefined;
}

export function firstBrokenPiece(d: Pick<DynamicResult, 'pieces'>): DynamicPiece | undefined {
  return d.pieces.filter((p) => p.broken).sort((a, b) => (a.breakTime ?? 0) - (b.breakTime ?? 0))[0];
}

/** Runs the dynamic model on a case and gathers what the views show. Pure: no I/O, no clock. */
export function dynamicResult(c: Case, model: ShaftModel, energy: readonly SideResult[]): DynamicResult {
  const solve = solveDynamics(c, model);
  const { chain, modes, run, piecePeak, pieceTime, pieceElement } = solve.final;
  const damage = dynamicPieceDamage(
    chain,
    run.laws,
    piecePeak,
    chain.pieces.map((p) => c.materials[p.piece.segment.material].shearModulus!),
  );
  const breakTime = (i: number) => run.events.find((e) => e.what === 'breaks' && e.source.kind === 'element' && chain.elements[e.source.index].pieces.includes(i))?.time;
  const plasticLaws = run.laws.filter((l): l is PlasticElementLaw => l instanceof PlasticElementLaw);
  const elasticPeak = elasticPeaksOf(c, model, solve, damage);
  const pieces: DynamicPiece[] = chain.pieces.map((p, i) => {
    const d = damage[i];
    const broke = d.broken ? { breakTime: breakTime(i) } : {};
    return {
      piece: p.piece,
      side: p.side,
      peakTorque: piecePeak[i],
      peakTime: pieceTime[i],
      elasticPeakTorque: elasticPeak[i],
      ...pieceStress(c, p.piece, elasticPeak[i]),
      ...d,
      ...broke,
    };
  });
  const governing = pieces.reduce((best, p, i) => (p.yieldRatio > pieces[best].yieldRatio ? i : best), 0);
  const sides = energy.map((s): SideComparison => {
    const mine = pieces.filter((p) => p.side === s.side);
    return {
      side: s.side,
      energyPeakTorque: s.peakTorque,
      dynamicPeakTorque: Math.max(0, ...mine.map((p) => p.peakTorque)),
      energyYieldRatio: Math.max(...s.pieces.map((p) => p.yieldRatio)),
      dynamicYieldRatio: Math.max(0, ...mine.map((p) => p.yieldRatio)),
    };
  });
  const { slips, pins } = slipOutcomes(c, chain, run);
  const P = chain.stopNode;
  const stopName = c.stop.at;
  const nameOf = (src: (typeof run.events)[number]['source']): string => {
    if (src.kind === 'element') return slips.find((s) => s.elementIndex === src.index)?.element ?? pins.find((p) => p.elementIndex === src.index)?.element ?? shaftElementName(chain, src.index);
    if (src.kind === 'belt') return `The belt at "${chain.drives[src.index].station}"`;
    if (src.kind === 'motor') return `The motor at "${chain.drives[src.index].station}"`;
    if (src.kind === 'hold') return `The ${chain.holds[src.index].kind} at "${chain.holds[src.index].station}"`;
    return `The jam at "${stopName}"`;
  };
  // A yielding element's turns and rejoined paths are bookkeeping of its hysteresis, not news.
  const shown = run.events.filter((e) => e.what !== 'passes a point of its curve' && !QUIET_YIELD_EVENTS.has(e.what));
  const events = shown.slice(0, MAX_EVENTS_KEPT).map((e) => ({ time: e.time, text: `${capitalise(nameOf(e.source))} ${e.what}.` }));
  return {
    elements: chain.elements.length,
    elementTarget: solve.target,
    shaftInertia: chain.shaftInertia,
    dampingRatio: c.analysis.dampingRatio,
    duration: run.duration,
    timeStep: run.timeStep,
    steps: run.steps,
    refinement: solve.refinement,
    converged: solve.converged,
    naturalFrequencies: modes.slice(0, 10).map((m) => m.frequency),
    frequencies: modeFrequencies(c, model, chain, modes.slice(0, 10), solve.target),
    modes: modes.slice(0, 3).map((m) => {
      const idx = chain.nodes.flatMap((n, i) => (n.side === m.side || i === P ? [i] : []));
      return { side: m.side, frequency: m.frequency, participation: m.participation, at: idx.map((i) => chain.nodes[i].at), amplitude: idx.map((i) => m.shape[i]) };
    }),
    pieces,
    sides,
    peakTorque: Math.max(...pieces.map((p) => p.peakTorque)),
    maxShearStress: Math.max(...pieces.map((p) => p.shearStress)),
    yieldRatio: pieces[governing].yieldRatio,
    governing,
    slips,
    pins,
    belts: chain.drives.flatMap((d) => (d.belt ? [{ station: d.station, slip: d.belt }] : [])),
    events,
    eventCount: shown.length,
    gaps: chain.elements.flatMap((el, e) => {
      const law = run.laws[e];
      return el.backlash && law instanceof BacklashLaw ? [{ segment: el.backlash.segment, gap: el.backlash.gap, contacts: law.contacts }] : [];
    }),
    holds: chain.holds.map((h, k) => ({
      station: h.station,
      kind: h.kind,
      peakTorque: run.holds[k].peakTorque,
      ...optional('firstHeld', run.events.find((e) => e.source.kind === 'hold' && e.source.index === k)?.time),
    })),
    protection: chain.drives.flatMap((d, i) =>
      d.drive.tripAfter === undefined && d.drive.torqueLimit === undefined
        ? []
        : [
            {
              station: d.station,
              ...optional('torqueLimit', d.drive.torqueLimit),
              ...optional('tripAfter', d.drive.tripAfter),
              ...optional('trippedAt', run.events.find((e) => e.source.kind === 'motor' && e.source.index === i && e.what.startsWith('trips'))?.time),
            },
          ],
    ),
    plasticity: plasticLaws.length > 0 || run.laws.some((l) => l instanceof ShearPinLaw && l.kind === 'shaft'),
    yielded: plasticLaws.some((l) => l.yielded),
    fractured: damage.some((d) => d.broken),
    plasticWork: plasticLaws.reduce((w, l) => w + l.dissipated - l.released, 0),
    energy: run.energy,
    damping: dynamicDamping(c, chain, run, modes, piecePeak, pieceElement),
    histories: dynamicHistories(chain, solve.final, slips),
    ...optional(
      'yieldPath',
      yieldPath(
        chain,
        solve.final,
        pieces.map((p) => p.permanentTwist),
      ),
    ),
    assumptions: assumptionsOf(
      c,
      chain.shaftInertia,
      chain.drives.flatMap((d) => d.assumptions),
    ).concat(
      chain.holds.map(
        (h) =>
          `The ${h.kind} at "${h.station}" holds the shaft there at standstill once it would turn backwards, with whatever torque that takes, and lets it go when the torques on it push it forward again: a rigid one-way stop${h.kind === 'self-locking gearbox' ? ' (the worm locks against the load; its motor side turns with the shaft there, as gears are rigid in the model)' : " (the backstop's own wind-up is left out)"}.`,
      ),
    ),
    notes: [...runningChecks(chain, c.speed), ...solve.notes, ...chain.drives.flatMap((d) => d.warnings)],
  };
}

/** "the shaft in "rotor body" (element 2 of 3 there)": a plain shaft element named by its segment (no units in the core's words). */
function shaftElementName(chain: Chain, e: number): string {
  const seg = chain.pieces[chain.elements[e].pieces[0]].piece.segment;
  const same = chain.elements.flatMap((el, k) => (chain.pieces[el.pieces[0]].piece.segment === seg ? [k] : []));
  const where = seg.label ? `"${seg.label}"` : `segment ${seg.index + 1}`;
  return same.length > 1 ? `the shaft in ${where} (element ${same.indexOf(e) + 1} of ${same.length} there, from the shaft's start)` : `the shaft in ${where}`;
}

/** Each piece's peak torque with the shaft elements elastic, the same chain (element count) otherwise, N·m. */
function elasticPeaks(c: Case, model: ShaftModel, target: number): number[] {
  return solveDynamics({ ...c, analysis: { ...c.analysis, dynamicPlasticity: false, elements: target } }, model, { histories: false }).final.piecePeak;
}

/** The peaks the elastic check stands on: the run's own, or, where it yielded or broke, the same chain's with its elements elastic (`DynamicPiece.elasticPeakTorque`). */
function elasticPeaksOf(c: Case, model: ShaftModel, solve: DynamicSolve, damage: readonly PieceDamage[]): number[] {
  const pastYield = solve.final.run.laws.some((l) => l instanceof PlasticElementLaw && l.yielded) || damage.some((d) => d.broken);
  return pastYield ? elasticPeaks(c, model, solve.target) : solve.final.piecePeak;
}

/** A piece's elastic check at a peak torque: kt times the outer-fibre stress, the verdict's shear strength, and their ratio. */
function pieceStress(c: Case, piece: ShaftPiece, peakTorque: number): { shearStress: number; shearYield: number; yieldRatio: number } {
  const seg = piece.segment;
  const tauY = verdictShearStrength(c.materials[seg.material], c.analysis.criterion);
  const tau = seg.kt * shearStress(peakTorque, seg.diameter, seg.bore);
  return { shearStress: tau, shearYield: tauY, yieldRatio: tau / tauY };
}

/**
 * Only the dynamic model's peaks a Monte Carlo sample keeps (the verdict's stress / shear yield,
 * the highest stress, the highest torque as carried), by the same solution and the same checks as
 * `dynamicResult`, without what only the views read (histories, events, mode convergence).
 */
export function dynamicPeakMetrics(c: Case, model: ShaftModel): { yieldRatio: number; maxShearStress: number; peakTorque: number } {
  const solve = solveDynamics(c, model, { histories: false });
  const { chain, run, piecePeak } = solve.final;
  const elasticPeak = elasticPeaksOf(c, model, solve, dynamicPieceDamage(chain, run.laws));
  let yieldRatio = -Infinity;
  let maxShearStress = -Infinity;
  chain.pieces.forEach((p, i) => {
    const s = pieceStress(c, p.piece, elasticPeak[i]);
    yieldRatio = Math.max(yieldRatio, s.yieldRatio);
    maxShearStress = Math.max(maxShearStress, s.shearStress);
  });
  return { yieldRatio, maxShearStress, peakTorque: Math.max(...piecePeak) };
}

/** The elements with a damping of their own, in words for the assumptions ("" where none has). */
function ownDamping(c: Case): string {
  const name = (s: Segment) => (s.label ? `"${s.label}"` : `segment ${s.index + 1}`);
  const pct = (z: number) => `${Number((100 * z).toPrecision(2))} %`;
  const own = c.shaft.segments.flatMap((s) => [
    ...(s.coupling?.dampingRatio !== undefined ? [`the coupling in ${name(s)} ${pct(s.coupling.dampingRatio)}`] : []),
    ...(s.dampingRatio !== undefined ? [`the shaft in ${name(s)} ${pct(s.dampingRatio)}`] : []),
  ]);
  return own.length === 0
    ? ''
    : `, except where the case gives an element its own (${own.join(', ')}): each spring of an element (a length of shaft, a coupling) has a dashpot c = (2ζ/ω₁)·k of its own ratio, and in series they act as one dashpot k_e²·Σ(2ζ_i/ω₁)/k_i across the element`;
}

function optional<K extends string, V>(key: K, value: V | undefined): Partial<Record<K, V>> {
  return value === undefined ? {} : ({ [key]: value } as Record<K, V>);
}

function capitalise(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}

function assumptionsOf(c: Case, shaftInertia: boolean, drives: string[]): string[] {
  // A coupling given a stiffness is a spring in series; one without is rigid, as gears are (no mesh stiffness).
  const rigid = c.shaft.segments.some((s) => s.coupling?.stiffness) ? 'gears and couplings given no stiffness are rigid' : 'gears and couplings are rigid';
  return [
    (c.analysis.dynamicPlasticity ?? DEFAULT_DYNAMIC_PLASTICITY)
      ? `The shaft is a chain of lumped inertias joined by torsional springs (k = G·J_p/L per element) that yield as the net section does, elastic–plastic at the shear yield of the criterion, with Masing's rule on reversals (analysis.dynamic_plasticity: true); parts count at their station as J·ratio², and ${rigid}.`
      : `The shaft is a chain of lumped inertias joined by elastic torsional springs (k = G·J_p/L per element); parts count at their station as J·ratio², and ${rigid}.`,
    shaftInertia ? "The shaft's own inertia is lumped half onto each end of every element." : "The shaft's own inertia is left out (analysis.shaft_inertia: false).",
    `Damping is stiffness-proportional, ${(100 * c.analysis.dampingRatio).toPrecision(2)} % of critical in each side's lowest mode${c.analysis.dampingRatio === DEFAULT_DAMPING_RATIO ? ' (the default, a small value typical of steel shafting: material damping of steel is a fraction of a percent, and it is taken low so that the peak and the ringing are not understated)' : ''}${ownDamping(c)}; the dashpots take energy but the torques reported are the elastic ones. Each dashpot follows its element's tangent stiffness, so a section that flows plastically is damped as little as it is stiff.`,
    c.stop.duration > 0
      ? `The stop station's speed falls linearly to zero over ${(c.stop.duration * 1000).toPrecision(3)} ms, then stays at zero.`
      : "The stop station's speed drops to zero at once and stays there.",
    ...(c.stop.torqueCapacity !== undefined ? [`The jam holds up to ${c.stop.torqueCapacity.toPrecision(4)} N·m and slips with that torque above it (Coulomb).`] : []),
    'Belts, torque limiters and a soft jam stick rigidly until their slip torque is reached, then slip with that torque (Coulomb friction, no difference between static and sliding friction).',
    ...(c.stations.some((s) => s.drive)
      ? [
          "A drive's motor gives the torque of its speed–torque curve (or its constant torque) at its momentary speed, held at the curve's end values beyond it; the motor's electrical transients and its protection trip are not modelled.",
        ]
      : []),
    ...drives,
  ];
}
