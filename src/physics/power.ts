/**
 * Torque from power at a speed, T = P/ω (N·m, W, rad/s): power is torque times angular speed,
 * H = T·ω (Shigley 9th ed. Sec. 3-12, Eqs. 3-40 to 3-44; equation number from memory, verify).
 */
export function torqueFromPower(power: number, speed: number): number {
  return power / speed;
}
