import { plasticTorque, energyPerLength, residualTwistRate, rigidity, torqueAtTwistRate, twistRateAtTorque, yieldTorque, yieldTwistRate, type TorsionLaw } from './plastic-torsion.ts';
import { bracketedRoot, growUntil } from '../root-find.ts';

/** One piece of shaft in a side's run, for the energy balance. */
export interface BalancePiece {
  /** Length, m. */
  length: number;
  law: TorsionLaw;
  /** Twist per length at which the piece breaks, rad/m (ductile: γ_f/c₂; brittle: the elastic twist rate at its fracture torque); Infinity when unknown. */
  fractureTwistRate: number;
}

/** A piece under the side's torque. */
export interface PieceState {
  /** Twist per length, rad/m. */
  twistRate: number;
  /** Peak twist of the piece, rad. */
  twist: number;
  /** Twist left after elastic unloading, rad. */
  permanentTwist: number;
  /** Outer-fibre engineering shear strain at the peak, rad. */
  maxShearStrain: number;
  /** Strain energy the piece absorbed, J. */
  energy: number;
  /** The twist reached the piece's fracture twist rate. */
  fractured: boolean;
}

export interface BalanceState {
  /** Torque carried by every piece (they are in series), N·m. */
  torque: number;
  /** Energy absorbed by all pieces, J. */
  energy: number;
  pieces: PieceState[];
}

/**
 * The energy balance of a side past yield: the pieces are in series, so they carry one torque; the
 * state is parametrised by the twist rate φ of the weakest piece (lowest fully plastic torque).
 * Pieces with the same law as it share its twist rate; every other piece takes the twist rate
 * its own law needs for that torque. The side's energy is monotone in φ, so a bracketed root
 * finds the state that absorbs a given energy. For one elastic–perfectly plastic solid piece this
 * is REFERENCE 3.1.9 solved for u (EP5).
 */
export class PlasticBalance {
  readonly weakest: number;
  private readonly sameAsWeakest: boolean[];

  constructor(readonly pieces: readonly BalancePiece[]) {
    if (pieces.length === 0) throw new RangeError('PlasticBalance: a side needs at least one piece');
    // Each piece's fully plastic torque once (the Monte Carlo builds a balance per sample).
    let w = 0;
    let weakestTorque = plasticTorque(pieces[0].law);
    for (let i = 1; i < pieces.length; i++) {
      const t = plasticTorque(pieces[i].law);
      if (t < weakestTorque) [w, weakestTorque] = [i, t];
    }
    this.weakest = w;
    this.weakestPlasticTorque = weakestTorque;
    this.sameAsWeakest = pieces.map((p) => sameLaw(p.law, pieces[w].law));
  }
  private readonly weakestPlasticTorque: number;

  /** The state when the weakest piece twists at rate φ (rad/m). */
  stateAt(phi: number): BalanceState {
    const torque = torqueAtTwistRate(this.pieces[this.weakest].law, phi);
    const pieces = this.pieces.map((p, i) => pieceState(p, this.sameAsWeakest[i] ? phi : twistRateAtTorque(p.law, torque)));
    return { torque, energy: pieces.reduce((s, p) => s + p.energy, 0), pieces };
  }

  /** The energy the side has absorbed when the weakest piece twists at rate φ, J: `stateAt(φ).energy` without building the state (the root's inner loop). */
  energyAt(phi: number): number {
    const torque = torqueAtTwistRate(this.pieces[this.weakest].law, phi);
    let energy = 0;
    for (let i = 0; i < this.pieces.length; i++) {
      const p = this.pieces[i];
      energy += energyPerLength(p.law, this.sameAsWeakest[i] ? phi : twistRateAtTorque(p.law, torque)) * p.length;
    }
    return energy;
  }

  /**
   * The weakest piece's twist rate at which the side has absorbed `energy` (J ≥ 0). While every
   * piece is elastic the side is a chain of linear springs in series, E = T²/2·Σ L/(G·J_p), so the
   * torque is √(2E/Σ L/(G·J_p)) in closed form (the root would find the same to its tolerance; the
   * Monte Carlo, most of whose samples stay elastic, runs this).
   */
  twistRateForEnergy(energy: number): number {
    if (energy <= 0) return 0;
    const elastic = this.elasticLimit();
    if (energy <= elastic.energy) return Math.sqrt((2 * energy) / elastic.compliance) / rigidity(this.pieces[this.weakest].law);
    const f = (phi: number) => this.energyAt(phi);
    const w = this.pieces[this.weakest].law;
    // Past the elastic limit the root lies between the weakest piece's twist rate there and the
    // rate at which the weakest pieces alone, carrying at least their first-yield torque over the
    // twist past their own first yield, have taken all the energy: a bracket without a search.
    const lo = Math.sqrt((2 * elastic.energy) / elastic.compliance) / rigidity(w);
    const sameLength = this.pieces.reduce((sum, p, i) => (this.sameAsWeakest[i] ? sum + p.length : sum), 0);
    const bound = yieldTwistRate(w) + energy / (yieldTorque(w) * sameLength);
    // Within rounding of the elastic limit the limit is the state.
    if (f(lo) >= energy) return lo;
    const hi = Number.isFinite(bound) && bound > lo && f(bound) >= energy ? bound : growUntil(f, energy, Math.max(1e-12, Math.min(w.shearYield, 1e12) / w.shearModulus / w.outerRadius))!;
    return bracketedRoot((phi) => f(phi) - energy, hi === bound ? lo : 0, hi, 1e-14 * hi);
  }

  /**
   * What the Monte Carlo reads of the state that has absorbed `energy`: its torque, the permanent
   * twist summed over the pieces, and whether any piece reached its fracture twist rate.
   * `stateForEnergy(energy)` without building the state: the same functions in the same order, so
   * the same numbers (test/physics/plastic/plastic-balance.test.ts holds them to the state's).
   */
  summaryForEnergy(energy: number): { torque: number; permanentTwist: number; fractured: boolean } {
    const phi = this.twistRateForEnergy(energy);
    const torque = torqueAtTwistRate(this.pieces[this.weakest].law, phi);
    let permanentTwist = 0;
    let fractured = false;
    for (let i = 0; i < this.pieces.length; i++) {
      const p = this.pieces[i];
      const rate = this.sameAsWeakest[i] ? phi : twistRateAtTorque(p.law, torque);
      permanentTwist += residualTwistRate(p.law, rate) * p.length;
      if (rate >= p.fractureTwistRate) fractured = true;
    }
    return { torque, permanentTwist, fractured };
  }

  /**
   * The permanent twist of the pieces `among` (indices) when the weakest piece twists at rate φ,
   * added to `start` one piece at a time in their order, rad: `stateAt(φ)`'s pieces read without
   * building the state (the read-back's root asks for it at every step).
   */
  permanentTwistAt(phi: number, among: readonly number[], start = 0): number {
    const torque = torqueAtTwistRate(this.pieces[this.weakest].law, phi);
    let sum = start;
    for (const i of among) {
      const p = this.pieces[i];
      sum += residualTwistRate(p.law, this.sameAsWeakest[i] ? phi : twistRateAtTorque(p.law, torque)) * p.length;
    }
    return sum;
  }

  /** The state that has absorbed `energy`, J. */
  stateForEnergy(energy: number): BalanceState {
    return this.stateAt(this.twistRateForEnergy(energy));
  }

  /** The torque the side carries when the weakest piece twists at rate φ, N·m (`stateAt(φ).torque`). */
  torqueAt(phi: number): number {
    return torqueAtTwistRate(this.pieces[this.weakest].law, phi);
  }

  /** The weakest piece's twist rate at which the side carries torque T; Infinity if it never does. */
  twistRateAtTorque(torque: number): number {
    return twistRateAtTorque(this.pieces[this.weakest].law, torque);
  }

  /**
   * Where the side first breaks as its energy grows: the energy it can absorb before then, J
   * (Infinity when no piece can break: a stronger piece is shielded once the weakest is fully
   * plastic, or no fracture limit is known), the piece that breaks, and the weakest piece's twist
   * rate at that moment.
   */
  fractureLimit(): { energy: number; piece: number | undefined; twistRate: number } {
    const tpWeak = this.torqueLimit();
    let best = { phi: Infinity, piece: undefined as number | undefined };
    this.pieces.forEach((p, i) => {
      if (!Number.isFinite(p.fractureTwistRate)) return;
      let phi: number;
      if (this.sameAsWeakest[i]) phi = p.fractureTwistRate;
      else {
        const t = torqueAtTwistRate(p.law, p.fractureTwistRate);
        phi = t >= tpWeak ? Infinity : this.twistRateAtTorque(t);
      }
      if (phi < best.phi) best = { phi, piece: i };
    });
    // The energy alone (`energyAt`, the state's energy to the last digit), not a whole state: a sample past yield asks for it.
    return { energy: Number.isFinite(best.phi) ? this.energyAt(best.phi) : Infinity, piece: best.piece, twistRate: best.phi };
  }

  /** Energy at which the first of the pieces `among` (indices) starts to yield, J; Infinity if none ever does. */
  yieldOnsetEnergy(among: readonly number[]): number {
    const ty = Math.min(...among.map((i) => yieldTorque(this.pieces[i].law)));
    if (!(ty < this.torqueLimit())) return Infinity;
    return this.energyAt(this.twistRateAtTorque(ty));
  }

  /** The side's compliance Σ L/(G·J_p), rad/(N·m), and the strain energy at which its first piece yields, J (kept: the Monte Carlo asks per sample). */
  /** Strain energy at which the side's first piece yields, J (Infinity where none can). */
  elasticLimitEnergy(): number {
    return this.elasticLimit().energy;
  }

  private elasticLimit(): { compliance: number; energy: number } {
    if (this.elastic) return this.elastic;
    let compliance = 0;
    let ty = Infinity;
    for (const p of this.pieces) {
      compliance += p.length / rigidity(p.law);
      ty = Math.min(ty, yieldTorque(p.law));
    }
    this.elastic = { compliance, energy: Number.isFinite(ty) ? 0.5 * ty * ty * compliance : Infinity };
    return this.elastic;
  }
  private elastic?: { compliance: number; energy: number };

  /** The most torque the side can carry, N·m: the weakest piece's fully plastic torque, or Infinity when it hardens. */
  torqueLimit(): number {
    const w = this.pieces[this.weakest].law;
    return w.hardeningModulus === 0 ? this.weakestPlasticTorque : Infinity;
  }
}

function pieceState(p: BalancePiece, phi: number): PieceState {
  return {
    twistRate: phi,
    twist: phi * p.length,
    permanentTwist: residualTwistRate(p.law, phi) * p.length,
    maxShearStrain: phi * p.law.outerRadius,
    energy: energyPerLength(p.law, phi) * p.length,
    fractured: phi >= p.fractureTwistRate,
  };
}

function sameLaw(a: TorsionLaw, b: TorsionLaw): boolean {
  return a.outerRadius === b.outerRadius && a.innerRadius === b.innerRadius && a.shearModulus === b.shearModulus && a.shearYield === b.shearYield && a.hardeningModulus === b.hardeningModulus;
}
