import type { TorqueLaw } from './torque-law.ts';

/**
 * A shear pin or breakaway element in series with the shaft element that holds it: elastic until
 * the torque reaches the parting torque, then it carries nothing for the rest of the incident. The
 * strain energy in the element at that instant is released (booked as dissipated). The same law
 * stands for a shaft element of brittle material (`kind` "shaft"), which breaks near its ultimate
 * strength without yielding.
 */
export class ShearPinLaw implements TorqueLaw {
  readonly affine = true;
  private parted = false;
  private released = 0;
  private partedAt = 0;

  constructor(
    readonly stiffness: number,
    readonly shearTorque: number,
    readonly kind: 'shear pin' | 'shaft' = 'shear pin',
  ) {}

  get dissipated(): number {
    return this.released;
  }
  get offset(): number {
    return this.partedAt;
  }
  get isParted(): boolean {
    return this.parted;
  }

  torque(theta: number): number {
    return this.parted ? 0 : this.stiffness * theta;
  }
  tangent(): number {
    return this.parted ? 0 : this.stiffness;
  }
  damped(): boolean {
    return !this.parted;
  }
  leave(theta: number): number {
    return this.parted ? -this.shearTorque : Math.abs(this.stiffness * theta) - this.shearTorque;
  }
  enter(theta: number): string {
    if (this.parted) return 'no change';
    this.parted = true;
    this.partedAt = theta;
    this.released = 0.5 * this.stiffness * theta * theta;
    return this.kind === 'shaft' ? 'breaks' : 'parts';
  }
  commit(): void {}
  energy(theta: number): number {
    return this.parted ? 0 : 0.5 * this.stiffness * theta * theta;
  }
}
