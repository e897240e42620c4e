import type { Case } from '../case/case.ts';
import type { ShaftModel } from '../model/shaft-model.ts';
import type { ShaftPiece } from '../model/shaft-model.ts';
import { yieldTorque } from '../physics/plastic/plastic-torsion.ts';
import { bracketedRoot } from '../physics/root-find.ts';
import { dynamicPieceDamage } from './dynamic-piece-damage.ts';
import { solveDynamics } from './dynamic-solve.ts';
import { pieceLaw, sideBalance } from './side-balance.ts';
import { balanceTwistRelation, type TwistRelation } from './twist-findings.ts';

/** What a piece of shaft carried and kept in one run of the dynamic model. */
export interface RecordedPiece {
  piece: ShaftPiece;
  permanentTwist: number;
  broken: boolean;
  /** Largest |torque| over the window, N·m. */
  peakTorque: number;
}

interface Run {
  twist: number;
  broken: boolean;
  /** Largest peak torque over first-yield torque among the pieces between the positions (net section, a keyed seat's own, no kt). */
  margin: number;
}

/**
 * The figure's curve goes through the runs the read-back made and adds one wherever two lie more
 * than a ninth of its top speed apart (each is one run of the dynamic model; `curveSpeeds`).
 */
const CURVE_POINTS = 9;
/** Relative width in speed to which the inversions are carried (speeds are shown to 4 figures). */
const SPEED_TOLERANCE = 1e-5;
/** The onset of yield is found to this share of its speed (it sets the figure's range and the zero-twist reading, shown to 4 figures). */
const ONSET_TOLERANCE = 1e-3;
/** Trial speeds while bracketing the onset: a run below it predicts the onset from its yield margin (linear in speed), aimed this share beyond. */
const ONSET_AIM = 0.02;
/** Permanent twist below this is taken as none, rad (about 0.00006°, far below any measurement). */
const NONE = 1e-6;
/** Speed steps upward when looking for a speed that leaves a twist: ×1.5, this many times. */
const MAX_GROWTH = 24;
/** A step ×1.5 in speed that raises the yield margin of the pieces by less than this share finds their torque capped. */
const SATURATED = 1e-3;
/** A run far below the onset predicts it at most this many times its own speed. */
const MAX_ONSET_JUMP = 4;
/** Steps down from a run past the onset when bracketing it: ÷(1 + this); and the most trial runs the bracketing makes. */
const ONSET_STEP = 0.25;
const ONSET_STEPS = 5;
const EPS = 1e-9;

/**
 * The dynamic model's speed → permanent-twist relation between two positions: the case rerun at
 * each trial speed (everything else, including the element count of the first solution, kept),
 * its shaft elements elastic–plastic, and the permanent twists of the pieces between the positions
 * summed. Inverted by a bracketed root (Brent) on the runs, kept in a cache. The relation is
 * monotone wherever what absorbs the energy is (the shaft, a slipping belt or limiter); it is not
 * assumed, the root is bracketed. The energy named beside a speed is the parts' ½·J·ω² on the
 * sides that load the positions (`sideInertia`, per side of `model`), as the energy balance names
 * it. Undefined when no piece lies between the positions.
 */
export function dynamicTwistRelation(
  c: Case,
  model: ShaftModel,
  sideInertia: readonly number[],
  elementTarget: number,
  x1: number,
  x2: number,
  recorded?: readonly RecordedPiece[],
): TwistRelation | undefined {
  const inside = (p: { start: number; end: number }) => p.start >= x1 - EPS && p.end <= x2 + EPS;
  const involved = model.sides.flatMap((s, i) => (s.pieces.some(inside) ? [sideInertia[i]] : []));
  if (involved.length === 0) return undefined;
  const inertia = involved.reduce((a, b) => a + b, 0);
  const fixed: Case = { ...c, analysis: { ...c.analysis, elements: elementTarget, dynamicPlasticity: true } };
  // Each piece's own first yield, as its elements' law has it: a keyed seat's net section yields
  // below its segment's gross one (`pieceLaw`). With the gross one the margin would stay short of 1
  // where the seat already yields, and the onset's root would be a step, not a crossing.
  // Each run builds its own chain: pieces are known by where they lie.
  const yieldTorqueOf = new Map<string, number>();
  const pieceYield = (p: ShaftPiece) => {
    const key = `${p.start} ${p.end}`;
    let t = yieldTorqueOf.get(key);
    if (t === undefined) {
      const law = pieceLaw(c, p);
      t = law ? yieldTorque(law) : Infinity;
      yieldTorqueOf.set(key, t);
    }
    return t;
  };
  /** What one run left between the positions: permanent twist, a break anywhere, and the largest peak torque / first-yield torque of the pieces there. */
  const summary = (pieces: readonly RecordedPiece[]): Run => {
    let twist = 0;
    let margin = 0;
    for (const p of pieces) {
      if (!inside(p.piece)) continue;
      twist += p.permanentTwist;
      margin = Math.max(margin, p.peakTorque / pieceYield(p.piece));
    }
    return { twist, broken: pieces.some((p) => p.broken), margin };
  };
  const runs = new Map<number, Run>();
  // The case's own run at the recorded speed is the same chain and laws: it is not run again.
  if (recorded) runs.set(c.speed, summary(recorded));
  const run = (w: number) => {
    const hit = runs.get(w);
    if (hit) return hit;
    let out: Run = { twist: 0, broken: false, margin: 0 };
    if (w > 0) {
      const sol = solveDynamics({ ...fixed, speed: w }, model, { histories: false }).final;
      const damage = dynamicPieceDamage(sol.chain, sol.run.laws);
      out = summary(sol.chain.pieces.map((p, i) => ({ piece: p.piece, permanentTwist: damage[i].permanentTwist, broken: damage[i].broken, peakTorque: sol.piecePeak[i] })));
    }
    runs.set(w, out);
    return out;
  };
  const permanentAt = (w: number) => run(w).twist;
  /** A bracket [lo, hi] with twist(lo) ≤ t < twist(hi) from the runs so far, growing upward from the recorded speed. */
  const bracket = (t: number): [number, number] | undefined => {
    let w = c.speed;
    let margin = -Infinity;
    for (let k = 0; permanentAt(w) <= t; k++) {
      // The pieces there stay short of yield while the speed grows half as much again and their
      // torque does not grow with it: something else caps it (a weaker piece fully plastic, a slip).
      const m = run(w).margin;
      if (k >= MAX_GROWTH || (m < 1 && m <= margin * (1 + SATURATED))) return undefined;
      margin = m;
      w *= 1.5;
    }
    const known = [...runs.entries()].sort((a, b) => a[0] - b[0]);
    const lo = known
      .filter(([, r]) => r.twist <= t)
      .map(([x]) => x)
      .filter((x) => x < w);
    const hi = known.filter(([x, r]) => r.twist > t && x > Math.max(0, ...lo)).map(([x]) => x);
    return [Math.max(0, ...lo), Math.min(w, ...hi)];
  };
  let onsetSpeed: number | undefined;
  const onset = (): number => {
    if (onsetSpeed !== undefined) return onsetSpeed;
    const b = onsetBracket() ?? bracket(NONE);
    onsetSpeed = b === undefined ? Infinity : onsetIn(b[0], b[1]);
    return onsetSpeed;
  };
  /**
   * Where permanent twist starts, between a speed that leaves none and one that leaves some: the
   * root of the pieces' yield margin less one (largest peak torque over first-yield torque; it
   * rises smoothly through 1 at the onset and on towards the fully plastic torque past it), by
   * Brent's method, which needs far fewer runs than halving the bracket.
   */
  const onsetIn = (lo: number, hi: number): number => {
    const g = (w: number) => {
      const r = run(w);
      return r.twist > NONE ? Math.max(r.margin - 1, Number.MIN_VALUE) : Math.min(r.margin - 1, 0);
    };
    return bracketedRoot(g, lo, hi, ONSET_TOLERANCE * hi);
  };
  /**
   * A bracket of the dynamic model's onset, starting from the energy balance's (closed form, the
   * same laws with all of a side's energy into its shaft): a run that leaves no twist predicts the
   * onset from its yield margin (the torques grow about in proportion to the speed), aimed a little
   * beyond; a run that leaves some steps down. Undefined when a few runs do not bracket it.
   */
  const onsetBracket = (): [number, number] | undefined => {
    const guess = balanceTwistRelation(
      model.sides,
      model.sides.map((side, i) => sideBalance(side, c, sideInertia[i])),
      x1,
      x2,
    )?.onset();
    if (guess === undefined || !Number.isFinite(guess) || !(guess > 0)) return undefined;
    let lo = 0;
    let hi = Infinity;
    for (const [w, r] of runs) {
      if (r.twist > NONE) hi = Math.min(hi, w);
      else lo = Math.max(lo, w);
    }
    let w = guess;
    for (let k = 0; k < ONSET_STEPS; k++) {
      const r = run(w);
      if (r.twist > NONE) hi = Math.min(hi, w);
      else lo = Math.max(lo, w);
      if (lo > 0 && hi < Infinity) return [lo, hi];
      if (r.twist > NONE) w = w / (1 + ONSET_STEP);
      else w = r.margin > 0 ? Math.min((w / r.margin) * (1 + ONSET_AIM), MAX_ONSET_JUMP * w) : MAX_ONSET_JUMP * w;
    }
    return undefined;
  };
  return {
    model: 'dynamic model',
    permanentAt,
    speedFor: (t) => {
      if (t <= 0) {
        const o = onset();
        return Number.isFinite(o) ? o : undefined;
      }
      const b = bracket(t);
      if (b === undefined) return undefined;
      return bracketedRoot((w) => permanentAt(w) - t, b[0], b[1], SPEED_TOLERANCE * b[1]);
    },
    onset,
    energyAt: (w) => 0.5 * inertia * w * w,
    breaksAt: (w) => run(w).broken,
    // Asked where no speed was found: the runs made while looking went as far as the search does.
    breaksBefore: (t) => bracket(t) === undefined && [...runs.values()].some((r) => r.broken),
    curvePoints: CURVE_POINTS,
    knownSpeeds: () => [...runs.keys()],
  };
}
