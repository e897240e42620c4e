/**
 * Torsion into the uniaxial strain–life relation by the von Mises equivalent: a shear stress τ is
 * the normal stress √3·τ, and a shear strain γ the normal strain γ/√3 (the equivalent-strain
 * approach; D. F. Socie and G. B. Marquis, Multiaxial Fatigue, SAE 2000, Ch. 4; Dowling, 4th ed.,
 * Ch. 14 on multiaxial strain–life; chapters from memory). Neuber's rule is applied to the
 * equivalent quantities with the torsional factor K_ts (the generalised form of Hoffmann and
 * Seeger, 1985; from memory). Under pure torsion it tends to overestimate life somewhat against
 * the shear form of the relation; with the uniform material law both are estimates.
 */
export function equivalentNormalStress(shearStress: number): number {
  return Math.sqrt(3) * shearStress;
}
