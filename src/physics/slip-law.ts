import type { TorqueLaw } from './torque-law.ts';

/**
 * A friction torque limiter (slip coupling) in series with the shaft element that holds it: the
 * element's spring k, with the shaft's dashpot c in parallel, carries the torque up to the slip
 * torque T_s; beyond, the friction faces slide with torque T_s (Coulomb) and all further relative
 * turning is slip. The series spring-and-slider is the elastic–perfectly-plastic element (same law
 * as 3.1 of the shared reference with T_s in place of the yield torque). It sticks again when the
 * relative turning reverses.
 *
 * The dashpot (a Kelvin–Voigt shaft in series with the slider): while the faces stick it acts across
 * the element (`damped`), and the faces feel spring and dashpot together, so slip starts when
 * |k·(θ − s) + c·θ̇| reaches T_s. While they slide, the element carries T_s and the spring relaxes
 * from its twist x₀ at the start to T_s/k by kx + cẋ = T_s, with the time constant c/k (2ζ/ω₁, a
 * small fraction of the lowest period). The law takes the relaxation as done at once, and books it
 * as its end state gives it, whatever c: the slider's work over it is −T_s·Δx and the dashpot's
 * ½k·Δx² (Δx = T_s/k − x₀; from ∫(kx + cẋ)ẋ dt = T_s·Δx; derived), so the energy books close and
 * the slip work and angle are the slider's alone (work = T_s × angle). It ends with the relative turning, φ̇ = 0, where the series
 * pair ends at φ̇ = ẋ, which is 0 once the spring has relaxed.
 */
export class SlipLaw implements TorqueLaw {
  readonly kind = 'torque limiter';
  readonly affine = true;
  private slip = 0;
  /** 0 sticking, +1 / −1 slipping in that sense. */
  private branch: -1 | 0 | 1 = 0;
  private committed: number;
  private work = 0;
  private relaxation = 0;
  /** Number of times the limiter started to slip. */
  slipStarts = 0;
  /** Total angle slipped, rad (both senses counted). */
  slipAngle = 0;

  constructor(
    readonly stiffness: number,
    readonly slipTorque: number,
    initialTwist = 0,
    /** The shaft's dashpot across the element, N·m·s/rad (0: undamped). */
    readonly dashpot = 0,
  ) {
    this.committed = initialTwist;
  }

  get dissipated(): number {
    return this.work;
  }
  /** Work of the dashpot in the spring's relaxation at each slip start, J (booked with the damping, not the slip). */
  get dampingWork(): number {
    return this.relaxation;
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
    return this.branch === 0;
  }
  leave(theta: number, rate: number): number {
    if (this.branch === 0) return Math.abs(this.stiffness * (theta - this.slip) + this.dashpot * rate) - this.slipTorque;
    // Slipping while the faces keep turning in the slip's sense; it sticks when they stop.
    return -this.branch * rate;
  }
  enter(theta: number, rate = 0): string {
    if (this.branch === 0) {
      const t = this.stiffness * (theta - this.slip) + this.dashpot * rate;
      this.branch = t >= 0 ? 1 : -1;
      // Start the slide from exactly T_s. Undamped, the sliver of strain energy above it is friction
      // work; damped, the spring relaxes to T_s/k through the dashpot (see above).
      const newSlip = theta - (this.branch * this.slipTorque) / this.stiffness;
      if (this.dashpot > 0) {
        const dx = this.slip - newSlip;
        this.work -= this.branch * this.slipTorque * dx;
        this.slipAngle -= this.branch * dx;
        this.relaxation += 0.5 * this.stiffness * dx * dx;
      } else {
        this.work += this.energyAt(theta) - (0.5 * this.slipTorque ** 2) / this.stiffness;
      }
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
