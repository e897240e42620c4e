import type { SeriesBackbone } from './series-backbone.ts';
import type { TorqueLaw } from '../torque-law.ts';

/** A reversal point of the element: twist rad, torque N·m. */
interface Turn {
  theta: number;
  torque: number;
}

/**
 * A shaft element that yields: first loading on the element's backbone T₀(θ) (its sections'
 * elastic–plastic law, `SeriesBackbone`), and after each reversal Masing's rule,
 * T = T_r + 2·s·T₀(|θ − θ_r|/2), with the memory of earlier reversals: a branch that reaches the
 * reversal before its own start rejoins the path it left there, and the first branch from θ₁
 * rejoins first loading in the other sense at −θ₁ (Masing 1926; Iwan, J. Appl. Mech. 33 (1966)
 * 893–900; from memory, confident; see `reversal-branch.ts`). Pieces in series obey the rule too,
 * each piece's twist being its own Masing curve under the one torque.
 *
 * Branches, for the integrator: a straight part (first 2θ_Y after a reversal, or ±θ_Y on first
 * loading), on which T is affine in θ and one linear solve is exact; and a yielding part in one
 * sense, left when the twist turns back (a new reversal) or meets the remembered point. Strain
 * energy is the recoverable part T²/2k (elastic unloading); the rest of the work done on the
 * element, booked by the trapezoidal rule the integrator itself uses, is plastic work.
 *
 * Fracture: when the twist reaches the backbone's fracture twist (its first piece at its fracture
 * shear strain, `SeriesBackbone.fractureTwist`) the element breaks and carries nothing for the rest
 * of the incident; its stored strain energy is released at that instant (booked as dissipated). By
 * Masing's rule the largest twist is always on first loading, where the outer-fibre strain of each
 * piece is known, so the check is made on |θ| in either sense. Damage from repeated reversals
 * (low-cycle fatigue) is not counted.
 */
export class PlasticElementLaw implements TorqueLaw {
  readonly kind = 'shaft';
  readonly stiffness: number;
  private readonly turns: Turn[] = [];
  /** True on a straight part. */
  private straight = true;
  /** Sense of yielding (on the yielding part) or of travel away from the last turn (on a straight part). */
  private sense: 1 | -1 = 1;
  private lo: number;
  private hi: number;
  private committed: number;
  private committedTorque: number;
  private work: number;
  private initialStored: number;
  /** Largest |torque| the element has carried, N·m (always on first loading, by Masing's rule). */
  peakTorque: number;
  /** Largest |twist| the element has reached, rad (on first loading, by Masing's rule). */
  peakTwist: number;
  /** Times the element started to yield. */
  yieldStarts = 0;
  /** Whether the element has broken. */
  broken = false;
  /** Strain energy let go at the break, J (part of `dissipated`; the rest of it is plastic work). */
  released = 0;

  constructor(
    readonly backbone: SeriesBackbone,
    initialTwist = 0,
  ) {
    this.stiffness = backbone.stiffness;
    this.lo = -backbone.yieldTwist;
    this.hi = backbone.yieldTwist;
    this.committed = NaN;
    if (Math.abs(initialTwist) > backbone.yieldTwist) {
      this.straight = false;
      this.sense = initialTwist > 0 ? 1 : -1;
    }
    this.committedTorque = this.torque(initialTwist);
    this.committed = initialTwist;
    this.initialStored = this.recoverable(this.committedTorque);
    this.work = 0;
    this.peakTorque = Math.abs(this.committedTorque);
    this.peakTwist = Math.abs(initialTwist);
  }

  /**
   * Not yet yielded, from an untwisted start: T = k·θ, and the stepper need not commit it step by
   * step (`enter` catches up, see `catchUp`). A start past yield or with a running twist is left out.
   */
  get elasticUntilEvent(): boolean {
    return this.straight && this.turns.length === 0 && !this.broken && this.yieldStarts === 0 && this.initialStored === 0;
  }

  get torqueLimit(): number {
    return this.backbone.limitTorque;
  }

  get affine(): boolean {
    return this.straight || this.broken;
  }
  get dissipated(): number {
    return this.initialStored + this.work - this.recoverable(this.committedTorque);
  }
  /** Twist that stays on unloading to zero torque from the committed state, rad. */
  get offset(): number {
    return this.broken ? 0 : this.committed - this.committedTorque / this.stiffness;
  }
  /** Whether the element has yielded at all. */
  get yielded(): boolean {
    return this.peakTorque > this.backbone.yieldTorque * (1 + 1e-9);
  }

  torque(theta: number): number {
    if (this.broken) return 0;
    // The stepper asks again for the torque it has just committed.
    if (theta === this.committed) return this.committedTorque;
    const top = this.lastTurn();
    if (this.straight) return top ? top.torque + this.stiffness * (theta - top.theta) : this.stiffness * theta;
    if (!top) return Math.sign(theta) * this.backbone.torque(Math.abs(theta));
    const d = theta - top.theta;
    return top.torque + 2 * Math.sign(d) * this.backbone.torque(Math.abs(d) / 2);
  }
  tangent(theta: number): number {
    if (this.broken) return 0;
    if (this.straight) return this.stiffness;
    const top = this.lastTurn();
    return this.backbone.tangent(top ? Math.abs(theta - top.theta) / 2 : Math.abs(theta));
  }
  damped(): boolean {
    return !this.broken;
  }
  leave(theta: number, rate: number): number {
    if (this.broken) return -1;
    const breaks = Math.abs(theta) - this.backbone.fractureTwist;
    if (this.straight) return Math.max(this.lo - theta, theta - this.hi, breaks);
    const mem = this.memory();
    return Math.max(-this.sense * rate, mem === undefined ? -Infinity : this.sense * (theta - mem), breaks);
  }
  enter(theta: number): string {
    if (this.broken) return 'no change';
    if (this.elasticUntilEvent) this.catchUp(theta);
    if (Math.abs(theta) >= this.backbone.fractureTwist * (1 - 1e-9)) {
      // The integrator has committed θ already. The stored energy goes with the break: the
      // committed torque drops to zero, so the dissipated total takes up T²/2k.
      this.broken = true;
      this.released = this.recoverable(this.committedTorque);
      this.committedTorque = 0;
      return 'breaks';
    }
    if (this.straight) {
      const top = this.lastTurn();
      const far = top ? (this.sense > 0 ? this.hi : this.lo) : theta >= 0 ? this.hi : this.lo;
      const atFar = top ? Math.abs(theta - far) <= Math.abs(theta - (this.sense > 0 ? this.lo : this.hi)) : true;
      this.straight = false;
      if (!top) {
        this.sense = theta >= 0 ? 1 : -1;
        this.yieldStarts++;
        return 'starts to yield';
      }
      if (atFar) {
        this.yieldStarts++;
        return 'yields in reverse';
      }
      // Back at the turn it left: the path it was on resumes.
      this.turns.pop();
      this.sense = this.sense > 0 ? -1 : 1;
      return 'yields on';
    }
    const mem = this.memory();
    const tol = 1e-9 * (Math.abs(theta) + this.backbone.yieldTwist);
    if (mem !== undefined && this.sense * (theta - mem) >= -tol) {
      this.turns.splice(this.turns.length >= 2 ? -2 : -1);
      return 'rejoins an earlier loading path';
    }
    // Turns back: a straight part of 2θ_Y from here, with a sliver of slack at the turn itself so
    // a turn located a hair early does not chatter.
    const T = this.torque(theta);
    this.turns.push({ theta, torque: T });
    const span = 2 * this.backbone.yieldTwist;
    const slack = 1e-6 * span;
    this.sense = this.sense > 0 ? -1 : 1;
    if (this.sense < 0) {
      this.lo = theta - span;
      this.hi = theta + slack;
    } else {
      this.lo = theta - slack;
      this.hi = theta + span;
    }
    this.straight = true;
    return 'turns back';
  }
  commit(theta: number): void {
    if (this.broken) {
      this.committed = theta;
      return;
    }
    if (Math.abs(theta) > this.peakTwist) this.peakTwist = Math.abs(theta);
    const T = this.torque(theta);
    this.work += 0.5 * (this.committedTorque + T) * (theta - this.committed);
    this.committed = theta;
    this.committedTorque = T;
    if (Math.abs(T) > this.peakTorque) this.peakTorque = Math.abs(T);
  }
  energy(theta: number): number {
    return this.recoverable(this.torque(theta));
  }

  /**
   * The state an elastic element committed step by step would have at θ: the work done on it is
   * its strain energy (the trapezoidal book is exact for T = k·θ), and its largest twist is taken
   * as θ (the event that calls this is the first one, on the way to yield).
   */
  private catchUp(theta: number): void {
    const T = this.stiffness * theta;
    this.work = this.recoverable(T);
    this.committed = theta;
    this.committedTorque = T;
    this.peakTorque = Math.max(this.peakTorque, Math.abs(T));
    this.peakTwist = Math.max(this.peakTwist, Math.abs(theta));
  }

  /** The twist where the yielding branch meets its remembered path, or undefined on first loading. */
  /**
   * The latest reversal, or undefined before the first. Read with the length checked first: on an
   * empty array \`turns[length - 1]\` is \`turns[-1]\`, a property name, not an element, which V8
   * looks up through the prototype chain on every call (some 250 ns a step for each element, the
   * largest single cost of the time integration before it was guarded).
   */
  private lastTurn(): Turn | undefined {
    const n = this.turns.length;
    return n > 0 ? this.turns[n - 1] : undefined;
  }
  private memory(): number | undefined {
    const n = this.turns.length;
    if (n === 0) return undefined;
    return n >= 2 ? this.turns[n - 2].theta : -this.turns[0].theta;
  }
  private recoverable(T: number): number {
    return (T * T) / (2 * this.stiffness);
  }
}
