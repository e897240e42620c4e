import { bracketedRoot } from '../root-find.ts';
import type { StrainLifeProperties } from './strain-life-properties.ts';

/**
 * The strain–life relation of Coffin, Manson and Basquin: ε_a = (σ′_f/E)(2N)^b + ε′_f(2N)^c, with
 * N the cycles to crack initiation (Dowling, 4th ed., Eq. 14.5; from memory). Mean stress is not
 * in it.
 */
export function strainAmplitudeAtLife(cycles: number, p: StrainLifeProperties): number {
  const reversals = 2 * cycles;
  return (p.fatigueStrengthCoefficient / p.elasticModulus) * reversals ** p.fatigueStrengthExponent + p.fatigueDuctilityCoefficient * reversals ** p.fatigueDuctilityExponent;
}

/** The reach of the life solve: 1 to 1e20 reversals. */
export const LIFE_REVERSALS = { min: 1, max: 1e20 } as const;

/**
 * Cycles to crack initiation at a strain amplitude. `beyond` says where the amplitude lies outside
 * the relation's reach: `first reversal` — more than the strain at one reversal, the life is given
 * as half a cycle; `endurance` — less than at 1e20 reversals, no life is given (the damage is nil
 * at any count a machine sees).
 */
export interface StrainLife {
  cycles: number | undefined;
  beyond?: 'first reversal' | 'endurance';
}

/**
 * The life solved from the strain–life relation by a bracketed root on log₁₀(2N), on which the
 * relation is monotone (both exponents are negative).
 */
export function lifeAtStrainAmplitude(strainAmplitude: number, p: StrainLifeProperties): StrainLife {
  const f = (x: number) => strainAmplitudeAtLife(10 ** x / 2, p) - strainAmplitude;
  const lo = Math.log10(LIFE_REVERSALS.min);
  const hi = Math.log10(LIFE_REVERSALS.max);
  if (f(lo) <= 0) return { cycles: LIFE_REVERSALS.min / 2, beyond: 'first reversal' };
  if (f(hi) >= 0) return { cycles: undefined, beyond: 'endurance' };
  const x = bracketedRoot(f, lo, hi, 1e-12);
  return { cycles: 10 ** x / 2 };
}
