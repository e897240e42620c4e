// Shrink and press fits of a hub on a shaft, by the thick-walled cylinder (Lamé) relations.
// Shigley's Mechanical Engineering Design, 9th ed. (Budynas & Nisbett, 2011), Sec. 3-16 "Press
// and Shrink Fits", Eq. (3-56) for members of different materials and (3-57) for one material;
// the torque a fit holds, Sec. 7-8 "Limits and Fits" (from memory, confident on the relations;
// the section and equation numbers from memory, verify). Diameters are full diameters; the
// interference here is diametral (what a fit table and a micrometer give), so the radial
// interference of Shigley's equations is half of it.

/** One member of a fit: Young's modulus E, Pa, and Poisson's ratio ν. */
export interface FitMember {
  elasticModulus: number;
  poissonRatio: number;
}

/** The geometry of a fit, m: the nominal seat diameter d, the hub's outer diameter, the shaft's bore (0: solid). */
export interface FitGeometry {
  seatDiameter: number;
  hubOuterDiameter: number;
  shaftBore: number;
  /** Diametral interference, m (shaft diameter less hub bore before assembly). */
  interference: number;
}

/**
 * Contact pressure at the seat, Pa (Shigley Eq. 3-56, with R = d/2, r_o the hub's outer radius,
 * r_i the shaft's bore radius and δ = interference/2):
 *
 *   p = δ / [ (R/E_o)·((r_o² + R²)/(r_o² − R²) + ν_o) + (R/E_i)·((R² + r_i²)/(R² − r_i²) − ν_i) ]
 */
export function contactPressure(g: FitGeometry, hub: FitMember, shaft: FitMember): number {
  const R = g.seatDiameter / 2;
  const ro = g.hubOuterDiameter / 2;
  const ri = g.shaftBore / 2;
  const delta = g.interference / 2;
  const hubTerm = (R / hub.elasticModulus) * ((ro * ro + R * R) / (ro * ro - R * R) + hub.poissonRatio);
  const shaftTerm = (R / shaft.elasticModulus) * ((R * R + ri * ri) / (R * R - ri * ri) - shaft.poissonRatio);
  return delta / (hubTerm + shaftTerm);
}

/**
 * Torque a fit of length L holds before it slips, N·m: the friction force μ·p·(π·d·L) at radius
 * d/2, T = π·μ·p·d²·L/2 (Shigley 9th ed. Sec. 7-8; from memory, confident).
 */
export function fitSlipTorque(pressure: number, friction: number, seatDiameter: number, length: number): number {
  return (Math.PI * friction * pressure * seatDiameter ** 2 * length) / 2;
}

/**
 * Tangential (hoop) stress at the hub's bore under the contact pressure, Pa, the largest stress
 * in the hub (Shigley 9th ed. Eq. 3-58; from memory, verify): σ_t = p·(r_o² + R²)/(r_o² − R²).
 */
export function hubBoreHoopStress(pressure: number, seatDiameter: number, hubOuterDiameter: number): number {
  const R2 = (seatDiameter / 2) ** 2;
  const ro2 = (hubOuterDiameter / 2) ** 2;
  return (pressure * (ro2 + R2)) / (ro2 - R2);
}
