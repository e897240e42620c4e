import type { Case } from '../case/case.ts';
import type { InputWarning } from '../case/plausibility.ts';
import type { PieceResult, SideResult } from '../physics/energy-method.ts';
import type { Uncertainty } from '../uncertainty/uncertainty.ts';
import type { FractureFinding } from './fracture-reading.ts';
import type { PlasticResult } from './plastic-result.ts';
import type { TwistFinding } from './twist-findings.ts';
import type { DynamicResult } from './dynamic-result.ts';
import type { VerdictBasis } from './verdict-basis.ts';
import type { FitCheck } from './hub-fits.ts';
import type { KeyCheck } from './key-checks.ts';
import type { CouplingCheck } from './coupling-checks.ts';
import type { DriveTrainElement } from './drive-train.ts';
import type { GearboxCheck } from './gearbox-checks.ts';
import type { BackstopCheck } from './backstop-checks.ts';

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
  /**
   * The piece of shaft with the highest stress / shear yield, and its side, by the elastic energy method.
   */
  governing: { side: SideResult; piece: PieceResult };
  /** Highest shear stress over all sides, Pa, by the energy method. */
  maxShearStress: number;
  /** Highest stress / shear yield over all sides, by the energy method. */
  yieldRatio: number;
  /** Overall verdict: the worse of the plastic balance's and the elastic method's. */
  verdict: Verdict;
  /** The elastic energy method's verdict (stress / shear yield with kt below 1 or not). */
  elasticVerdict: ElasticVerdict;
  /** The energy balance past yield: peak torque capped by plasticity, permanent twist, fracture. */
  plastic: PlasticResult;
  /**
   * Which model the verdict past yield (permanent twist, fracture, the twist read-back) stands on:
   * the dynamic model where the verdict's basis is the dynamic model and its shaft elements carry
   * the elastic–plastic law; the energy balance otherwise.
   */
  pastYieldBasis: 'energy balance' | 'dynamic model';
  /** The damage recorded in the case read back to the incident. */
  observedFindings: ObservedFindings;
  /** Which result the verdict's elastic check stands on. */
  verdictBasis: VerdictBasis;
  /**
   * The governing piece and its stress / shear yield by the verdict's basis: the energy method's `governing`,
   * or the dynamic model's piece with the highest peak stress / shear yield over the window.
   */
  verdictGoverning: { side: SideResult; piece: PieceResult };
  verdictYieldRatio: number;
  /** Why that result, one sentence. */
  verdictReason: string;
  /** The lumped torsional chain solved in time, beside the energy method. */
  dynamic: DynamicResult;
  /** Each station's key at the incident torque (empty without keys). */
  keys: KeyCheck[];
  /** Each station's shrink or press fit at the incident torque (empty without fits). */
  fits: FitCheck[];
  /** Each segment's coupling against the incident torque (empty without couplings). */
  couplings: CouplingCheck[];
  /** Each station's gearbox against its rating × service factor at the incident torque (empty without gearboxes). */
  gearboxes: GearboxCheck[];
  /** Each station's backstop with the rebound torque it held (empty without backstops). */
  backstops: BackstopCheck[];
  /** Every element of the drive train with its capacity and the torque it carried (unordered: the finding orders them). */
  driveTrain: DriveTrainElement[];
  /** Warnings about the model's fit to the case, in plain words; the case file's plausibility warnings first, where the CLI carries them in. */
  warnings: string[];
  /** The case file's plausibility warnings (`checkPlausibility`), where the CLI carried them in (`withInputWarnings`). */
  inputWarnings?: InputWarning[];
  cautions: readonly string[];
  /** How sure the finding is; present when the case states tolerances. */
  uncertainty?: Uncertainty;
}
