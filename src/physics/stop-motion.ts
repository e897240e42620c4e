/**
 * The prescribed motion of the point that stops: speed ω0 until t = 0, then falling linearly to
 * zero over the stop's duration t_r (constant deceleration ω0/t_r), then held. t_r = 0 is the
 * instantaneous stop. Angles are measured from the stop's start.
 */
export class StopMotion {
  constructor(
    readonly speed: number,
    readonly duration: number,
  ) {}

  /** Speed at t ≥ 0, rad/s (after the instantaneous drop when t_r = 0). */
  speedAt(t: number): number {
    if (this.duration <= 0 || t >= this.duration) return 0;
    return this.speed * (1 - t / this.duration);
  }

  /** Angle turned since t = 0, rad. */
  angleAt(t: number): number {
    const tr = this.duration;
    if (tr <= 0) return 0;
    const u = Math.min(t, tr);
    return this.speed * (u - (u * u) / (2 * tr));
  }

  /** Angular acceleration at t, rad/s² (the ramp's side for t inside it). */
  accelerationAt(t: number): number {
    return this.duration > 0 && t < this.duration ? -this.speed / this.duration : 0;
  }
}
