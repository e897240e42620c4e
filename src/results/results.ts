import type { Case } from '../case/case.ts';
import type { PieceResult, SideResult } from '../physics/energy-method.ts';
import type { Uncertainty } from '../uncertainty/uncertainty.ts';
import type { FractureFinding } from './fracture-reading.ts';
import type { PlasticResult } from './plastic-result.ts';
import type { TwistFinding } from './twist-findings.ts';

/**
 * The case's verdict. `elastic`: no yield anywhere; `yielded`: the net section yields and takes a
 * permanent twist, or (elastic method) the stress at a stress raiser passes yield; `fracture
 * predicted`: a piece reaches its fracture strain (ductile) or stress (brittle).
 */
export type Verdict = 'elastic' | 'yielded' | 'fracture predicted';

/** The elastic energy method's own verdict, kept alongside the overall one. */
export type ElasticVerdict = 'elastic' | 'yielded';

/** The damage read back: each measured twist, and the fracture if one is recorded. */
export interface ObservedFindings {
  twist: TwistFinding[];
  fracture: FractureFinding | undefined;
}

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
  /** Overall verdict: the worse of the plastic balance's and the elastic method's. */
  verdict: Verdict;
  /** The elastic energy method's verdict (yield ratio with kt below 1 or not). */
  elasticVerdict: ElasticVerdict;
  /** The energy balance past yield: peak torque capped by plasticity, permanent twist, fracture. */
  plastic: PlasticResult;
  /** The damage recorded in the case read back to the incident. */
  observedFindings: ObservedFindings;
  /** Warnings about the model's fit to the case, in plain words. */
  warnings: string[];
  cautions: readonly string[];
  /** How sure the finding is; present when the case states tolerances. */
  uncertainty?: Uncertainty;
}
