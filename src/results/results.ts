import type { Case } from '../case/case.ts';
import type { PieceResult, SideResult } from '../physics/energy-method.ts';
import type { Uncertainty } from '../uncertainty/uncertainty.ts';

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
  /** The piece of shaft with the highest yield ratio, and its side. */
  governing: { side: SideResult; piece: PieceResult };
  /** Highest shear stress over all sides, Pa. */
  maxShearStress: number;
  /** Highest yield ratio over all sides. */
  yieldRatio: number;
  verdict: Verdict;
  /** Warnings about the model's fit to the case, in plain words. */
  warnings: string[];
  cautions: readonly string[];
  /** How sure the finding is; present when the case states tolerances. */
  uncertainty?: Uncertainty;
}
