import { plasticTorque, rigidity, tangentRigidity, torqueAtTwistRate, yieldTorque, yieldTwistRate, type TorsionLaw } from './plastic-torsion.ts';

/** A length of round shaft with its torque–twist law, in an element of the chain. */
export interface SeriesPiece {
  law: TorsionLaw;
  /** m. */
  length: number;
  /** Twist per length at which the piece breaks on first loading, rad/m (γ_f/c₂); Infinity or absent when unknown. */
  fractureTwistRate?: number;
}

/**
 * The first-loading torque–twist curve T₀(θ) of one element made of pieces in series under one
 * torque: θ = Σ Lᵢ·φᵢ(T) (Beer & Johnston, Mechanics of Materials, Sec. 3.5, shafts in series;
 * from memory, confident), each φᵢ from its section's law (`plastic-torsion.ts`). One piece is read
 * straight off its law; several are solved for T by a bracketed Newton iteration. θ ≥ 0 here; the
 * other sense is the mirror image.
 */
export class SeriesBackbone {
  /** Elastic stiffness 1/Σ(Lᵢ/GJᵢ), N·m/rad. */
  readonly stiffness: number;
  /** Torque at which the first piece yields, N·m. */
  readonly yieldTorque: number;
  /** Twist of the element at that torque, rad: the end of the straight part. */
  readonly yieldTwist: number;
  /** Highest torque the element can carry (the least fully plastic torque of perfectly plastic pieces), N·m; Infinity with hardening everywhere. */
  readonly limitTorque: number;
  /**
   * Element twist on first loading at which its first piece reaches its fracture strain, rad;
   * Infinity when no piece has a fracture estimate. Under one torque each piece's twist rate grows
   * with the torque, so the first to break is the one whose fracture torque T(φ_f) is lowest.
   */
  readonly fractureTwist: number;
  /** Index of the piece that breaks first, or -1. */
  readonly firstToBreak: number;
  private lastTheta = NaN;
  private lastTorque = 0;

  /** `stiffness`: the element's stiffness where the caller already has it (the same value to rounding, kept so an element that never yields steps exactly as an elastic one). */
  constructor(
    readonly pieces: readonly SeriesPiece[],
    stiffness?: number,
  ) {
    this.stiffness = stiffness ?? 1 / pieces.reduce((s, p) => s + p.length / rigidity(p.law), 0);
    this.yieldTorque = Math.min(...pieces.map((p) => yieldTorque(p.law)));
    this.yieldTwist = this.yieldTorque / this.stiffness;
    this.limitTorque = Math.min(...pieces.map((p) => (p.law.hardeningModulus > 0 ? Infinity : plasticTorque(p.law))));
    const breakTorque = pieces.map((p) => (p.fractureTwistRate !== undefined && Number.isFinite(p.fractureTwistRate) ? torqueAtTwistRate(p.law, p.fractureTwistRate) : Infinity));
    const Tf = Math.min(...breakTorque);
    this.firstToBreak = Number.isFinite(Tf) ? breakTorque.indexOf(Tf) : -1;
    // A piece that breaks at the same torque is at its own fracture rate, read straight (the
    // inverse of a nearly flat curve would lose digits there).
    this.fractureTwist = Number.isFinite(Tf) ? pieces.reduce((s, p, i) => s + p.length * (breakTorque[i] <= Tf * (1 + 1e-12) ? p.fractureTwistRate! : sectionTwistRate(p.law, Tf)), 0) : Infinity;
  }

  /** T₀(θ), N·m, θ ≥ 0. */
  torque(theta: number): number {
    if (theta <= this.yieldTwist) return this.stiffness * theta;
    if (this.pieces.length === 1) return torqueAtTwistRate(this.pieces[0].law, theta / this.pieces[0].length);
    return this.solve(theta);
  }

  /** dT₀/dθ, N·m/rad, θ ≥ 0: 1/Σ(Lᵢ/(dT/dφ)ᵢ). */
  tangent(theta: number): number {
    if (theta <= this.yieldTwist) return this.stiffness;
    if (this.pieces.length === 1) return tangentRigidity(this.pieces[0].law, theta / this.pieces[0].length) / this.pieces[0].length;
    const T = this.solve(theta);
    return 1 / this.pieces.reduce((s, p) => s + p.length / tangentRigidity(p.law, sectionTwistRate(p.law, T)), 0);
  }

  /** Each piece's twist per length at torque T ≥ 0, rad/m. */
  twistRates(torque: number): number[] {
    return this.pieces.map((p) => sectionTwistRate(p.law, torque));
  }

  /**
   * Each piece's twist per length at element twist θ ≥ 0 on first loading, rad/m. The piece that
   * yields most (the least fully plastic torque) takes what the others leave, θ − Σ Lᵢφᵢ: near its
   * fully plastic torque its own curve is nearly flat, and inverting it there loses digits.
   */
  pieceTwistRates(theta: number): number[] {
    if (this.pieces.length === 1) return [theta / this.pieces[0].length];
    const rates = this.twistRates(this.torque(theta));
    let soft = 0;
    this.pieces.forEach((p, i) => {
      if (plasticTorque(p.law) < plasticTorque(this.pieces[soft].law)) soft = i;
    });
    const others = this.pieces.reduce((s, p, i) => (i === soft ? s : s + p.length * rates[i]), 0);
    rates[soft] = Math.max(0, theta - others) / this.pieces[soft].length;
    return rates;
  }

  private solve(theta: number): number {
    if (theta === this.lastTheta) return this.lastTorque;
    const g = (T: number) => this.pieces.reduce((s, p) => s + p.length * sectionTwistRate(p.law, T), 0) - theta;
    const dg = (T: number) => this.pieces.reduce((s, p) => s + p.length / tangentRigidity(p.law, sectionTwistRate(p.law, T)), 0);
    // The secant stiffness never exceeds k, so T ≤ kθ; it never falls below the yield torque here.
    let lo = this.yieldTorque;
    let hi = Math.min(this.stiffness * theta, this.limitTorque);
    let T = lo;
    for (let it = 0; it < 100 && hi - lo > 1e-14 * hi; it++) {
      const f = g(T);
      if (f === 0) break;
      if (f < 0) lo = T;
      else hi = T;
      let next = T - f / dg(T);
      if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
      if (Math.abs(next - T) <= 1e-15 * hi) break;
      T = next;
    }
    this.lastTheta = theta;
    this.lastTorque = T;
    return T;
  }
}

/**
 * Twist per length of a section at torque T ≥ 0, rad/m: elastic below yield; past it Newton's
 * iteration from the yield point, which climbs monotonically to the root because T(φ) is concave
 * there. Infinity at or above a perfectly plastic section's fully plastic torque.
 */
export function sectionTwistRate(l: TorsionLaw, T: number): number {
  if (T <= yieldTorque(l)) return T / rigidity(l);
  if (l.hardeningModulus === 0 && T >= plasticTorque(l)) return Infinity;
  let phi = yieldTwistRate(l);
  for (let it = 0; it < 200; it++) {
    const step = (T - torqueAtTwistRate(l, phi)) / tangentRigidity(l, phi);
    phi += step;
    if (step <= 1e-14 * phi) break;
  }
  return phi;
}
