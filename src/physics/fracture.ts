import type { Material } from '../materials/material.ts';

/** Elongation at break below which a material is treated as brittle: it breaks without plastic twist. */
export const BRITTLE_ELONGATION = 0.05;

/**
 * Whether a material is brittle: elongation at break below 5 % (the usual dividing line between
 * brittle and ductile behaviour, Shigley 9th ed. Sec. 5-1; from memory, confident). Gray cast
 * iron is the common case. A material with no elongation given is taken as ductile.
 */
export function isBrittle(m: Material): boolean {
  return m.elongation !== undefined && m.elongation < BRITTLE_ELONGATION;
}

/** A fracture shear-strain estimate and where it came from. */
export interface FractureStrain {
  /** Outer-fibre engineering shear strain at fracture, rad. */
  value: number;
  /** How it was found, in plain words, for the report. */
  basis: string;
}

/**
 * True tensile fracture strain from reduction of area, ε_f = ln(1/(1 − RA)), turned into a shear
 * strain by the von Mises equivalence γ = √3·ε (Dieter, Mechanical Metallurgy, 3rd ed., Sec. 8-3
 * true fracture strain and Sec. 3-9 effective strain; from memory, verify the sections).
 */
export function fractureStrainFromReductionOfArea(ra: number): number {
  return Math.sqrt(3) * Math.log(1 / (1 - ra));
}

/**
 * The fracture shear strain of a ductile material: the case's `fracture_strain` if given, else
 * from its reduction of area, else (a low estimate) from its elongation at break as √3·ln(1 + e),
 * which leaves out the necking strain. Undefined for a material with none of these.
 */
export function fractureShearStrain(m: Material): FractureStrain | undefined {
  const value = fractureShearStrainValue(m);
  if (value === undefined) return undefined;
  if (m.fractureStrain !== undefined) return { value, basis: `fracture shear strain given for ${m.key}` };
  if (m.reductionOfArea !== undefined) return { value, basis: `√3·ln(1/(1 − RA)) from reduction of area ${(100 * m.reductionOfArea).toPrecision(3)} % (${m.source})` };
  return { value, basis: `√3·ln(1 + e) from elongation ${(100 * m.elongation!).toPrecision(3)} %, a low estimate because it leaves out necking (no reduction of area known)` };
}

/** The value of `fractureShearStrain` without its basis (the Monte Carlo's samples need no words). */
export function fractureShearStrainValue(m: Material): number | undefined {
  if (m.fractureStrain !== undefined) return m.fractureStrain;
  if (m.reductionOfArea !== undefined) return fractureStrainFromReductionOfArea(m.reductionOfArea);
  if (m.elongation !== undefined) return Math.sqrt(3) * Math.log(1 + m.elongation);
  return undefined;
}

/**
 * Outer-fibre shear stress at which a brittle round bar breaks in torsion: pure shear has a
 * principal tensile stress equal to τ, so by the maximum-normal-stress rule it breaks when
 * K_t·τ reaches S_ut (Shigley 9th ed. Sec. 5-8 and 5-9, brittle materials; Sec. 3-13: K_t applies
 * to brittle material under static load; from memory, confident). The tensile strength stands in
 * for the torsional strength, which for gray iron is higher (REFERENCE 4.6), so this is cautious.
 */
export function brittleFractureShear(m: Material, kt: number): number {
  return (m.tensileStrength ?? m.yieldStrength!) / kt;
}
