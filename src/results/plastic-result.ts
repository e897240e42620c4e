import type { ShaftPiece, SideName } from '../model/shaft-model.ts';
import type { PieceState } from '../physics/plastic/plastic-balance.ts';
import type { PieceMaterialFacts } from './side-balance.ts';

/** Net-section verdict of the energy balance past yield. */
export type PlasticVerdict = 'elastic' | 'yielded' | 'fracture predicted';

/** One piece of shaft at the end of the stop, elastic–plastic. */
export interface PlasticPieceResult extends PieceMaterialFacts {
  piece: ShaftPiece;
  /** Net-section torque at first yield, N·m (no K_t); Infinity for a brittle piece. */
  yieldTorque: number;
  /** Fully plastic torque, N·m; Infinity for a brittle piece. */
  plasticTorque: number;
  /** Twist at first yield, rad. */
  yieldTwist: number;
  /** Twist at which it breaks, rad (Infinity when unknown). */
  fractureTwist: number;
  /** Energy this piece alone can absorb before it breaks, J (Infinity when unknown). */
  fractureEnergy: number;
  /** The piece went past yield. */
  yielded: boolean;
  /**
   * How the permanent twist shows on the surface: the circumferential offset c·θ_p between the
   * piece's ends, m, and the helix angle atan(c·θ_p/L) an originally axial line (keyway wall,
   * grinding mark, paint line) now makes, rad (shared REFERENCE.md 13.6–13.7).
   */
  surfaceOffset: number;
  helixAngle: number;
  /** Peak state: twist, permanent twist (0 for a piece that breaks), outer-fibre shear strain, energy, fractured. */
  state: PieceState;
}

export interface PlasticSideResult {
  side: SideName;
  /** The side's kinetic energy at the stop, J. */
  energy: number;
  /** Peak torque, capped by plasticity, N·m. Where fracture is predicted, all these are at the break. */
  peakTorque: number;
  /** Peak twist of the side's run, rad. */
  totalTwist: number;
  /** Twist left in the side's run after unloading, rad; 0 where the side breaks (its run has parted; the pieces that did not break keep theirs in `pieces`). */
  permanentTwist: number;
  /** Highest outer-fibre shear strain in the run, rad. */
  maxShearStrain: number;
  /** Energy the side can absorb before its first piece breaks, J; Infinity when none can break. */
  fractureEnergy: number;
  /** Index in `pieces` of the first piece to break as energy grows, if any can. */
  firstToBreak: number | undefined;
  verdict: PlasticVerdict;
  pieces: PlasticPieceResult[];
}

/** A point of a torque–twist curve: twist rad, torque N·m. */
export interface TorqueTwistPoint {
  twist: number;
  torque: number;
}

/** The most strained piece and its loading path, for the torque–twist figure. */
export interface MostStrained {
  side: SideName;
  /** Index in that side's `pieces`. */
  index: number;
  /** Loading path from zero to the peak, rad and N·m. */
  curve: TorqueTwistPoint[];
}

export interface PlasticResult {
  verdict: PlasticVerdict;
  /** Highest peak torque of the sides, N·m. */
  peakTorque: number;
  sides: PlasticSideResult[];
  mostStrained: MostStrained;
  /** The model's assumptions, as plain sentences for the summary and report. */
  assumptions: string[];
  /** Statements about brittle pieces (gray iron): they break near their ultimate strength without plastic twist. */
  brittleNotes: string[];
}

/**
 * The energy balance's piece and side for a piece of shaft (the same span of the same side), so
 * that the dynamic model's results can be named with the balance's facts (fracture strain,
 * brittleness). Undefined when the balance has no such piece.
 */
export function balancePieceOf(plastic: PlasticResult, p: { side: SideName; piece: ShaftPiece }): { side: PlasticSideResult; piece: PlasticPieceResult } | undefined {
  const side = plastic.sides.find((s) => s.side === p.side);
  const piece = side?.pieces.find((x) => x.piece.start === p.piece.start && x.piece.end === p.piece.end);
  return side && piece ? { side, piece } : undefined;
}
