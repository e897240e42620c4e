import { stringify } from 'yaml';
import type { Material } from '../materials/material.ts';

/** A number to six significant figures, without exponent or float noise. */
const six = (x: number) => String(Number(x.toPrecision(6)));

/**
 * The library in the case file's form (`materials:`, the keys and units a case or a site file
 * reads), to start a site's own catalogue or a case's materials from. `materials --yaml`. Pure.
 */
export function materialsToYaml(list: readonly Material[]): string {
  const out: Record<string, Record<string, string | number>> = {};
  for (const m of list) {
    const e: Record<string, string | number> = { name: m.name };
    if (m.shearModulus !== undefined) e.shear_modulus = `${six(m.shearModulus / 1e9)} GPa`;
    if (m.elasticModulus !== undefined) e.elastic_modulus = `${six(m.elasticModulus / 1e9)} GPa`;
    if (m.poissonRatio !== undefined) e.poisson_ratio = Number(six(m.poissonRatio));
    if (m.density !== undefined) e.density = `${six(m.density)} kg/m^3`;
    if (m.yieldStrength !== undefined) e.yield_strength = `${six(m.yieldStrength / 1e6)} MPa`;
    if (m.tensileStrength !== undefined) e.tensile_strength = `${six(m.tensileStrength / 1e6)} MPa`;
    if (m.elongation !== undefined) e.elongation = `${six(m.elongation * 100)} %`;
    if (m.reductionOfArea !== undefined) e.reduction_of_area = `${six(m.reductionOfArea * 100)} %`;
    if (m.fractureStrain !== undefined) e.fracture_strain = Number(six(m.fractureStrain));
    if (m.cyclic) {
      const c = m.cyclic;
      e.cyclic_strength_coefficient = `${six(c.cyclicStrengthCoefficient / 1e6)} MPa`;
      e.cyclic_hardening_exponent = Number(six(c.cyclicHardeningExponent));
      e.fatigue_strength_coefficient = `${six(c.fatigueStrengthCoefficient / 1e6)} MPa`;
      e.fatigue_strength_exponent = Number(six(c.fatigueStrengthExponent));
      e.fatigue_ductility_coefficient = Number(six(c.fatigueDuctilityCoefficient));
      e.fatigue_ductility_exponent = Number(six(c.fatigueDuctilityExponent));
    }
    if (m.strengthBasis !== undefined) e.strength_basis = m.strengthBasis;
    e.source = m.source;
    out[m.key] = e;
  }
  return (
    "# The built-in materials of shaftcase in the case file's form. Copy the ones you use under a\n# case's materials: and change the values to your mill certificates.\n" +
    stringify({ materials: out }, { lineWidth: 0 })
  );
}
