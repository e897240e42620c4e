// Stresses in a parallel key that drives a hub. Shigley's Mechanical Engineering Design 9th ed.,
// Sec. 7-7 (from memory, confident): the torque acts as a force F = T/(d/2) at the shaft's surface;
// the key shears across its width and bears on its side faces.

/** Force at the shaft's surface, F = 2T/d, N. */
export function keyForce(torque: number, shaftDiameter: number): number {
  return (2 * torque) / shaftDiameter;
}

/** Shear stress across the key, τ = F/(w·l) = 2T/(d·w·l), Pa. */
export function keyShearStress(torque: number, shaftDiameter: number, width: number, length: number): number {
  return keyForce(torque, shaftDiameter) / (width * length);
}

/**
 * Bearing (crushing) stress on the key's side face, σ = F/(h_c·l). With no contact height given,
 * half the key's height bears on each member (the h/2 rule), σ = 4T/(d·h·l); with the height that
 * bears on the hub (h − t1 for a DIN 6885 keyway), σ = 2T/(d·h_c·l). Pa.
 */
export function keyBearingStress(torque: number, shaftDiameter: number, height: number, length: number, bearingHeight = height / 2): number {
  return keyForce(torque, shaftDiameter) / (bearingHeight * length);
}
