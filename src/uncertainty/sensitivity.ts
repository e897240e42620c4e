import type { Case } from '../case/case.ts';
import type { UncertainInput } from './inputs.ts';
import type { Engine } from './monte-carlo.ts';

/** How far one input, swung across its band with the others at their nominal, moves stress / shear yield. */
export interface Swing {
  /** Field path of the input. */
  input: string;
  /** The input's value at the low end (mean − 2σ, floored at 1 % of nominal), SI. */
  inputLow: number;
  /** The input's value at the high end (mean + 2σ), SI. */
  inputHigh: number;
  /** Stress / shear yield with the input at mean − 2σ (the low end of a stated band). */
  low: number;
  /** Stress / shear yield with the input at mean + 2σ. */
  high: number;
  /** Same for the permanent twist, rad, where the engine gives one. */
  twistLow?: number;
  twistHigh?: number;
}

/**
 * One-at-a-time swings, largest effect first (a "tornado" ranking: each input across its band,
 * the others held at the single run's values).
 */
export function sensitivity(c: Case, inputs: readonly UncertainInput[], engine: Engine): Swing[] {
  const swings = inputs.map((input): Swing => {
    const inputLow = Math.max(input.spread.mean - 2 * input.spread.sd, 0.01 * input.nominal);
    const inputHigh = input.spread.mean + 2 * input.spread.sd;
    const lo = engine(input.apply(c, inputLow));
    const hi = engine(input.apply(c, inputHigh));
    const s: Swing = { input: input.path, inputLow, inputHigh, low: lo.yieldRatio, high: hi.yieldRatio };
    if (lo.permanentTwist !== undefined && hi.permanentTwist !== undefined) {
      s.twistLow = lo.permanentTwist;
      s.twistHigh = hi.permanentTwist;
    }
    return s;
  });
  return swings.sort((a, b) => Math.abs(b.high - b.low) - Math.abs(a.high - a.low));
}
