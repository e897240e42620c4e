// Elastic torsion of round shafts, solid and hollow. Shigley's Mechanical Engineering Design
// 9th ed., Sec. 3-12 and 4-7; Gere & Goodno, Mechanics of Materials 7th ed., Ch. 3 (from memory,
// confident). d is the outer diameter, di the bore (0 for a solid shaft).

/** Polar second moment of area J_p = π(d⁴ − di⁴)/32, m⁴. */
export function polarMoment(d: number, di = 0): number {
  return (Math.PI * (d ** 4 - di ** 4)) / 32;
}

/** Outer-fibre shear stress τ = T·(d/2)/J_p, Pa. */
export function shearStress(torque: number, d: number, di = 0): number {
  return (torque * d) / 2 / polarMoment(d, di);
}

/** Torsional compliance of a length L: L/(G·J_p), rad/(N·m). */
export function compliance(length: number, shearModulus: number, d: number, di = 0): number {
  return length / (shearModulus * polarMoment(d, di));
}

/** Angle of twist θ = T·L/(G·J_p), rad. */
export function twist(torque: number, length: number, shearModulus: number, d: number, di = 0): number {
  return torque * compliance(length, shearModulus, d, di);
}

/** Elastic strain energy U = T²·C/2 for a compliance C = Σ L/(G·J_p), J. */
export function strainEnergy(torque: number, totalCompliance: number): number {
  return 0.5 * torque ** 2 * totalCompliance;
}

/**
 * The torque at which a spring of compliance C stores `energy`: from U = T²C/2, T = √(2U/C).
 * This is the energy method's peak torque when all of a side's kinetic energy goes into the shaft.
 */
export function torqueForEnergy(energy: number, totalCompliance: number): number {
  return Math.sqrt((2 * energy) / totalCompliance);
}

/** The shaft's own polar mass moment of inertia ρ·J_p·L, kg·m². */
export function shaftInertia(density: number, length: number, d: number, di = 0): number {
  return density * polarMoment(d, di) * length;
}
