import type { TorqueLaw } from './torque-law.ts';

/**
 * A friction torque limiter (slip coupling) in series with the shaft element that holds it: the
 * element's spring k carries the torque up to the slip torque T_s; beyond, the friction faces slide
 * with torque T_s (Coulomb) and all further relative turning is slip. The series spring-and-slider
 * is the elastic–perfectly-plastic element (same law as 3.1 of the shared reference with T_s in
 * place of the yield torque). It sticks again when the relative turning reverses.
 */
export class SlipLaw implements TorqueLaw {
  readonly kind = 'torque limiter';
  readonly affine = true;
  private slip = 0;
  /** 0 sticking, +1 / −1 slipping in that sense. */
  private branch: -1 | 0 | 1 = 0;
  private committed: number;
  private work = 0;
  /** Number of times the limiter started to slip. */
  slipStarts = 0;
  /** Total angle slipped, rad (both senses counted). */
  slipAngle = 0;

  constructor(
    readonly stiffness: number,
    readonly slipTorque: number,
    initialTwist = 0,
  ) {
    this.committed = initialTwist;
  }

  get dissipated(): number {
    return this.work;
  }
  get offset(): number {
    return this.slip;
  }
  get slipping(): boolean {
    return this.branch !== 0;
  }

  torque(theta: number): number {
    return this.branch === 0 ? this.stiffness * (theta - this.slip) : this.branch * this.slipTorque;
  }
  tangent(): number {
    return this.branch === 0 ? this.stiffness : 0;
  }
  damped(): boolean {
    return false;
  }
  leave(theta: number, rate: number): number {
    if (this.branch === 0) return Math.abs(this.stiffness * (theta - this.slip)) - this.slipTorque;
    // Slipping while the faces keep turning in the slip's sense; it sticks when they stop.
    return -this.branch * rate;
  }
  enter(theta: number): string {
    if (this.branch === 0) {
      const t = this.stiffness * (theta - this.slip);
      this.branch = t >= 0 ? 1 : -1;
      // Start the slide from exactly T_s; the sliver of strain energy above it is friction work.
      const newSlip = theta - (this.branch * this.slipTorque) / this.stiffness;
      this.work += this.energyAt(theta) - (0.5 * this.slipTorque ** 2) / this.stiffness;
      this.slip = newSlip;
      this.slipStarts++;
      return 'starts to slip';
    }
    this.branch = 0;
    return 'stops slipping';
  }
  commit(theta: number): void {
    if (this.branch !== 0) {
      const d = theta - this.committed;
      this.slip += d;
      this.slipAngle += Math.abs(d);
      this.work += this.branch * this.slipTorque * d;
    }
    this.committed = theta;
  }
  energy(theta: number): number {
    return this.branch === 0 ? this.energyAt(theta) : (0.5 * this.slipTorque ** 2) / this.stiffness;
  }
  private energyAt(theta: number): number {
    return 0.5 * this.stiffness * (theta - this.slip) ** 2;
  }
}
