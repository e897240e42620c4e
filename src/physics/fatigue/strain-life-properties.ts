/**
 * The fatigue of a notch, pure: the cyclic stress–strain curve (Ramberg–Osgood), Neuber's rule,
 * the strain–life relation (Coffin–Manson–Basquin), rainflow counting (ASTM E1049-85) and the
 * Palmgren–Miner sum. This file holds the material's constants and the published estimate used
 * where a case gives none.
 *
 * Sources: N. E. Dowling, Mechanical Behavior of Materials, 4th ed., 2013, Ch. 12 (cyclic
 * stress–strain), Ch. 14 (strain-based approach; Neuber's rule Sec. 14.5) — chapter and section
 * numbers from memory.
 */

/** The constants of the cyclic stress–strain curve and the strain–life relation, SI. */
export interface StrainLifeProperties {
  /** Young's modulus E, Pa. */
  elasticModulus: number;
  /** Cyclic strength coefficient K′, Pa (σ_a = K′·ε_pa^n′). */
  cyclicStrengthCoefficient: number;
  /** Cyclic strain-hardening exponent n′. */
  cyclicHardeningExponent: number;
  /** Fatigue strength coefficient σ′_f, Pa. */
  fatigueStrengthCoefficient: number;
  /** Fatigue strength exponent b (negative). */
  fatigueStrengthExponent: number;
  /** Fatigue ductility coefficient ε′_f. */
  fatigueDuctilityCoefficient: number;
  /** Fatigue ductility exponent c (negative). */
  fatigueDuctilityExponent: number;
}

/** The two material groups of the uniform material law. */
export type UniformLawGroup = 'steel' | 'aluminium or titanium';

/**
 * Strain–life and cyclic constants estimated from the tensile strength by the uniform material
 * law of K. Bäumel Jr. and T. Seeger, Materials Data for Cyclic Loading, Supplement 1, Elsevier
 * 1990 (from memory, confident in the constants): unalloyed and low-alloy steels σ′_f = 1.5·S_u,
 * b = −0.087, ε′_f = 0.59·ψ (ψ = 1 for S_u/E ≤ 0.003, else 1.375 − 125·S_u/E), c = −0.58,
 * K′ = 1.65·S_u, n′ = 0.15; aluminium and titanium alloys σ′_f = 1.67·S_u, b = −0.095,
 * ε′_f = 0.35, c = −0.69, K′ = 1.61·S_u, n′ = 0.11. An estimate: life from it scatters by a factor
 * of several against tests.
 */
export function uniformMaterialLaw(tensileStrength: number, elasticModulus: number, group: UniformLawGroup): StrainLifeProperties {
  const Su = tensileStrength;
  if (group === 'aluminium or titanium') {
    return {
      elasticModulus,
      cyclicStrengthCoefficient: 1.61 * Su,
      cyclicHardeningExponent: 0.11,
      fatigueStrengthCoefficient: 1.67 * Su,
      fatigueStrengthExponent: -0.095,
      fatigueDuctilityCoefficient: 0.35,
      fatigueDuctilityExponent: -0.69,
    };
  }
  const ratio = Su / elasticModulus;
  const psi = ratio <= 0.003 ? 1 : 1.375 - 125 * ratio;
  return {
    elasticModulus,
    cyclicStrengthCoefficient: 1.65 * Su,
    cyclicHardeningExponent: 0.15,
    fatigueStrengthCoefficient: 1.5 * Su,
    fatigueStrengthExponent: -0.087,
    fatigueDuctilityCoefficient: 0.59 * psi,
    fatigueDuctilityExponent: -0.58,
  };
}
