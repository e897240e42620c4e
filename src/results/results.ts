import type { Case } from '../case/case.ts';
import type { PieceResult, SideResult } from '../physics/energy-method.ts';
import type { DynamicResult } from './dynamic-result.ts';
import type { VerdictBasis } from './verdict-basis.ts';

export type Verdict = 'elastic' | 'yielded';

/**
 * Everything the tool found for one case. Every view (summary, JSON, report) reads this object
 * and computes nothing of its own.
 */
export interface Results {
  case: Case;
  /** Speed at the stop, rad/s. */
  speed: number;
  /** Energy method per loaded side. */
  sides: SideResult[];
  /** Kinetic energy of both sides, J. */
  kineticEnergy: number;
  /**
   * The piece of shaft with the highest yield ratio, and its side, by the verdict's basis (for the
   * dynamic model the piece's torque is its peak torque over the window).
   */
  governing: { side: SideResult; piece: PieceResult };
  /** Highest shear stress over all sides, Pa, by the verdict's basis. */
  maxShearStress: number;
  /** Highest yield ratio over all sides, by the verdict's basis. */
  yieldRatio: number;
  verdict: Verdict;
  /** Which result the verdict (and governing, maxShearStress, yieldRatio) stands on. */
  verdictBasis: VerdictBasis;
  /** Why that result, one sentence. */
  verdictReason: string;
  /** The lumped torsional chain solved in time, beside the energy method. */
  dynamic: DynamicResult;
  /** Warnings about the model's fit to the case, in plain words. */
  warnings: string[];
  cautions: readonly string[];
}
