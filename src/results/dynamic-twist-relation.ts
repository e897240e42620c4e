import type { Case } from '../case/case.ts';
import type { ShaftModel } from '../model/shaft-model.ts';
import { bracketedRoot } from '../physics/root-find.ts';
import { dynamicPieceDamage } from './dynamic-piece-damage.ts';
import { solveDynamics } from './dynamic-solve.ts';
import { sideBalance } from './side-balance.ts';
import { balanceTwistRelation, type TwistRelation } from './twist-findings.ts';

/** Points of the figure's curve: each is one run of the dynamic model. */
const CURVE_POINTS = 12;
/** Relative width in speed to which the inversions are carried. */
const SPEED_TOLERANCE = 1e-5;
/** The onset of yield is found to this share of its speed (it sets the figure's range and the zero-twist reading, shown to 4 figures). */
const ONSET_TOLERANCE = 1e-3;
/** Permanent twist below this is taken as none, rad (about 0.00006°, far below any measurement). */
const NONE = 1e-6;
/** Speed steps upward when looking for a speed that leaves a twist: ×1.5, this many times. */
const MAX_GROWTH = 24;
/** Steps from the energy balance's onset when bracketing the dynamic model's: ×(1 ± this), a few times. */
const ONSET_STEP = 0.1;
const ONSET_STEPS = 4;
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
export function dynamicTwistRelation(c: Case, model: ShaftModel, sideInertia: readonly number[], elementTarget: number, x1: number, x2: number): TwistRelation | undefined {
  const inside = (p: { start: number; end: number }) => p.start >= x1 - EPS && p.end <= x2 + EPS;
  const involved = model.sides.flatMap((s, i) => (s.pieces.some(inside) ? [sideInertia[i]] : []));
  if (involved.length === 0) return undefined;
  const inertia = involved.reduce((a, b) => a + b, 0);
  const fixed: Case = { ...c, analysis: { ...c.analysis, elements: elementTarget, dynamicPlasticity: true } };
  const runs = new Map<number, { twist: number; broken: boolean }>();
  const run = (w: number) => {
    const hit = runs.get(w);
    if (hit) return hit;
    let out = { twist: 0, broken: false };
    if (w > 0) {
      const sol = solveDynamics({ ...fixed, speed: w }, model).final;
      const damage = dynamicPieceDamage(sol.chain, sol.run.laws);
      let twist = 0;
      sol.chain.pieces.forEach((p, i) => {
        if (inside(p.piece)) twist += damage[i].permanentTwist;
      });
      out = { twist, broken: damage.some((d) => d.broken) };
    }
    runs.set(w, out);
    return out;
  };
  const permanentAt = (w: number) => run(w).twist;
  /** A bracket [lo, hi] with twist(lo) ≤ t < twist(hi) from the runs so far, growing upward from the recorded speed. */
  const bracket = (t: number): [number, number] | undefined => {
    let w = c.speed;
    for (let k = 0; permanentAt(w) <= t; k++) {
      if (k >= MAX_GROWTH) return undefined;
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
    onsetSpeed = b === undefined ? Infinity : bisect((w) => permanentAt(w) > NONE, b[0], b[1], ONSET_TOLERANCE);
    return onsetSpeed;
  };
  /**
   * A narrow bracket of the dynamic model's onset around the energy balance's (closed form, the
   * same laws with all of a side's energy into its shaft), which it lies near where little else
   * takes energy: steps of 10 % from there, a few each way; undefined when that does not bracket it.
   */
  const onsetBracket = (): [number, number] | undefined => {
    const guess = balanceTwistRelation(
      model.sides,
      model.sides.map((side, i) => sideBalance(side, c, sideInertia[i])),
      x1,
      x2,
    )?.onset();
    if (guess === undefined || !Number.isFinite(guess) || !(guess > 0)) return undefined;
    const yields = permanentAt(guess) > NONE;
    let w = guess;
    for (let k = 0; k < ONSET_STEPS; k++) {
      const next = yields ? w / (1 + ONSET_STEP) : w * (1 + ONSET_STEP);
      if (yields !== permanentAt(next) > NONE) return yields ? [next, w] : [w, next];
      w = next;
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
  };
}

/** The edge of `yes` between lo (no) and hi (yes) to a relative width `tol`, by bisection. */
function bisect(yes: (w: number) => boolean, lo: number, hi: number, tol: number): number {
  while (hi - lo > tol * hi) {
    const mid = 0.5 * (lo + hi);
    if (yes(mid)) hi = mid;
    else lo = mid;
  }
  return lo;
}
