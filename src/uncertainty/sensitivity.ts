import type { Case } from '../case/case.ts';
import type { UncertainInput } from './inputs.ts';
import type { Engine } from './monte-carlo.ts';

/** How far one input, swung across its band with the others at their nominal, moves stress / shear yield. */
export interface Swing {
  /** Field path of the input. */
  input: string;
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
    const lo = engine(input.apply(c, Math.max(input.spread.mean - 2 * input.spread.sd, 0.01 * input.nominal)));
    const hi = engine(input.apply(c, input.spread.mean + 2 * input.spread.sd));
    const s: Swing = { input: input.path, low: lo.yieldRatio, high: hi.yieldRatio };
    if (lo.permanentTwist !== undefined && hi.permanentTwist !== undefined) {
      s.twistLow = lo.permanentTwist;
      s.twistHigh = hi.permanentTwist;
    }
    return s;
  });
  return swings.sort((a, b) => Math.abs(b.high - b.low) - Math.abs(a.high - a.low));
}
