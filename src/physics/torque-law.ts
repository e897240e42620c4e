/**
 * The torque–twist law of one element of the torsional chain, replaceable per element: elastic for
 * plain shaft, a slipping limiter, a shear pin, and later a plastic law, all through this one
 * interface, so the integrator never changes shape when a law is added.
 *
 * A law may have branches (sticking / slipping, intact / parted, elastic / yielding). Within a
 * time step it stays on one branch; the integrator asks `leave` at the end of each trial step and,
 * where the state has left the branch, finds the instant it did and calls `enter` there. Twist θ is
 * the element's end-to-end twist, rad (positive when the node toward the shaft's end is ahead);
 * torque is N·m in the same sense.
 */
export interface TorqueLaw {
  /** What the element is, for the event log: "shaft", "torque limiter", "shear pin". */
  readonly kind: string;
  /** Elastic stiffness k, N·m/rad: the tangent at rest. */
  readonly stiffness: number;
  /** True when torque is affine in θ on every branch, so one linear solve per step is exact (no Newton iteration). */
  readonly affine: boolean;
  /** Torque at twist θ on the current branch, from the committed state. Does not change state. */
  torque(theta: number): number;
  /** dT/dθ on the current branch at θ. */
  tangent(theta: number): number;
  /** Whether the shaft's stiffness-proportional dashpot acts across the element on this branch (not across a slipping or parted device). */
  damped(): boolean;
  /**
   * Event function: ≤ 0 while (θ, θ̇) stays on the current branch, > 0 once it has left it. Any
   * positive scale will do; the integrator locates its zero crossing within the step.
   */
  leave(theta: number, rate: number): number;
  /** Moves to the branch that (θ, θ̇) enters at a located event; returns what happened, in words. */
  enter(theta: number, rate: number): string;
  /** Accepts θ as the committed twist; books dissipated work. */
  commit(theta: number): void;
  /** Strain energy stored at θ on the current branch, J. */
  energy(theta: number): number;
  /** Work dissipated in the element so far (slip, plastic flow, energy released at parting), J. */
  readonly dissipated: number;
  /** Work of a dashpot that the law books itself (a slipping limiter's spring relaxing), J; absent: 0. It counts with the damping, not in `dissipated`. */
  readonly dampingWork?: number;
  /** Twist taken up by slip or flow so far, rad (signed). */
  readonly offset: number;
  /**
   * True while the law is T = k·θ and needs no `commit` until its next `enter` (a yielding shaft
   * element that has not yet yielded: it catches up at `enter`). The stepper then handles it
   * inline like a plain elastic element, which most elements of a long shaft stay.
   */
  readonly elasticUntilEvent?: boolean;
  /** Most torque any section of the element can carry, N·m (a perfectly plastic element's fully plastic torque); absent: no limit. */
  readonly torqueLimit?: number;
}

/** Linear elastic shaft: T = k·θ (Shigley 9th ed. Sec. 3-12, θ = TL/GJ; from memory, confident). */
export class ElasticLaw implements TorqueLaw {
  readonly kind = 'shaft';
  readonly affine = true;
  readonly dissipated = 0;
  readonly offset = 0;

  constructor(readonly stiffness: number) {}

  torque(theta: number): number {
    return this.stiffness * theta;
  }
  tangent(): number {
    return this.stiffness;
  }
  damped(): boolean {
    return true;
  }
  leave(): number {
    return -1;
  }
  enter(): string {
    return 'no change';
  }
  commit(): void {}
  energy(theta: number): number {
    return 0.5 * this.stiffness * theta * theta;
  }
}
