import type { TorqueLaw } from './torque-law.ts';

/**
 * A gap in the drive (gear backlash, a worn coupling's play) in series with the element's shaft:
 * no torque while the twist lies inside the gap [lo, hi], an elastic stop of the element's
 * stiffness k beyond either end: T = k·(θ − hi) above hi, k·(θ − lo) below lo (the dead-band spring
 * of vibro-impact models; Den Hartog, Mechanical Vibrations, the section on non-linear springs;
 * from memory, verify). Affine on each branch, so the integrator steps it exactly; the shaft's
 * dashpot acts only in contact. Elastic: it dissipates nothing of its own.
 */
export class BacklashLaw implements TorqueLaw {
  readonly kind = 'backlash';
  readonly affine = true;
  readonly dissipated = 0;
  readonly offset = 0;
  /** +1 in contact above hi, −1 below lo, 0 inside the gap. */
  private branch: -1 | 0 | 1;
  /** Number of times the gap closed (a contact began). */
  contacts = 0;

  constructor(
    readonly stiffness: number,
    /** The gap's ends in the element's twist, rad (hi − lo is the backlash). */
    readonly lo: number,
    readonly hi: number,
    initialTwist: number,
  ) {
    this.branch = initialTwist > hi ? 1 : initialTwist < lo ? -1 : 0;
  }

  get inContact(): boolean {
    return this.branch !== 0;
  }
  torque(theta: number): number {
    return this.branch === 0 ? 0 : this.stiffness * (theta - (this.branch > 0 ? this.hi : this.lo));
  }
  tangent(): number {
    return this.branch === 0 ? 0 : this.stiffness;
  }
  damped(): boolean {
    return this.branch !== 0;
  }
  leave(theta: number): number {
    if (this.branch > 0) return this.hi - theta;
    if (this.branch < 0) return theta - this.lo;
    return Math.max(theta - this.hi, this.lo - theta);
  }
  enter(theta: number): string {
    if (this.branch !== 0) {
      this.branch = 0;
      return 'opens its gap';
    }
    this.branch = theta >= 0.5 * (this.lo + this.hi) ? 1 : -1;
    this.contacts++;
    return 'closes its gap';
  }
  commit(): void {}
  energy(theta: number): number {
    const t = this.torque(theta);
    return this.branch === 0 ? 0 : (0.5 * t * t) / this.stiffness;
  }
}
