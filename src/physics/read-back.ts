import type { PlasticBalance } from './plastic/plastic-balance.ts';
import { bracketedRoot, growUntil } from './root-find.ts';

/**
 * One side of the stop as seen by a twist measurement: its balance, the inertia that gives its
 * energy ½·J·ω², and which of its pieces lie between the two measured stations.
 */
export interface ReadBackSide {
  balance: PlasticBalance;
  /** Inertia felt at shaft speed, kg·m². */
  inertia: number;
  /** Indices into `balance.pieces` of the pieces between the stations. */
  between: readonly number[];
}

/** Kinetic energy of the sides at shaft speed ω, J. */
export function energyAtSpeed(sides: readonly ReadBackSide[], speed: number): number {
  return sides.reduce((sum, s) => sum + 0.5 * s.inertia * speed ** 2, 0);
}

/**
 * Permanent twist between the stations after a stop from speed ω, rad: the sum of the permanent
 * twists of the pieces between them, each side taking its own energy ½·J·ω². Non-decreasing in ω.
 */
export function permanentTwistAtSpeed(sides: readonly ReadBackSide[], speed: number): number {
  let sum = 0;
  for (const s of sides) {
    if (s.between.length === 0) continue;
    sum = s.balance.permanentTwistAt(s.balance.twistRateForEnergy(0.5 * s.inertia * speed ** 2), s.between, sum);
  }
  return sum;
}

/** The highest speed at the stop that leaves no permanent twist between the stations, rad/s; Infinity if none ever does. */
export function onsetSpeed(sides: readonly ReadBackSide[]): number {
  let onset = Infinity;
  for (const s of sides) {
    if (s.between.length === 0 || !(s.inertia > 0)) continue;
    onset = Math.min(onset, Math.sqrt((2 * s.balance.yieldOnsetEnergy(s.between)) / s.inertia));
  }
  return onset;
}

/**
 * The speed at the stop that leaves exactly `twist` (rad) between the stations, by inverting the
 * monotone speed → permanent-twist relation with a bracketed root (strictly increasing past the
 * onset of yield). A zero twist returns the onset speed, the most it can mean. Undefined when no
 * speed up to 2⁶⁴ times the onset speed leaves that much (the pieces between the stations are
 * shielded by a weaker piece elsewhere that yields first, or never yield).
 */
export function speedForPermanentTwist(sides: readonly ReadBackSide[], twist: number): number | undefined {
  const onset = onsetSpeed(sides);
  if (!Number.isFinite(onset)) return undefined;
  if (twist <= 0) return onset;
  const involved = sides.filter((s) => s.between.length > 0);
  if (involved.length === 1) return oneSideSpeed(involved[0], twist);
  const f = (w: number) => permanentTwistAtSpeed(sides, w);
  const hi = growUntil(f, twist, Math.max(onset, 1e-9), 64);
  if (hi === undefined) return undefined;
  return bracketedRoot((w) => f(w) - twist, onset, hi, 1e-13 * hi);
}

/**
 * The same inversion when one side alone loads the stations, in one root find instead of two: the
 * permanent twist between the stations is monotone in the side's twist-rate parameter, so find the
 * state that leaves `twist`, then the speed whose energy ½·J·ω² is that state's energy.
 */
function oneSideSpeed(s: ReadBackSide, twist: number): number | undefined {
  const f = (phi: number) => s.balance.permanentTwistAt(phi, s.between);
  const start = Math.sqrt((2 * s.balance.yieldOnsetEnergy(s.between)) / s.inertia);
  const phi0 = s.balance.twistRateForEnergy(0.5 * s.inertia * start ** 2);
  const hi = growUntil(f, twist, Math.max(phi0, 1e-12), 64);
  if (hi === undefined) return undefined;
  const phi = bracketedRoot((p) => f(p) - twist, phi0, hi, 1e-14 * hi);
  return Math.sqrt((2 * s.balance.energyAt(phi)) / s.inertia);
}
