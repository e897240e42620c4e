import type { Material } from '../materials/material.ts';
import { SCHEMA_VERSION } from './schema-version.ts';

/**
 * The material library as `materials --json` prints it, in the results' style: snake_case keys with
 * their SI unit in the name, fractions as fractions, null for a value the library does not give.
 */
export function materialsToJson(list: readonly Material[]): Record<string, unknown> {
  return {
    schema_version: SCHEMA_VERSION,
    materials: list.map((m) => ({
      key: m.key,
      name: m.name,
      shear_modulus_Pa: m.shearModulus ?? null,
      elastic_modulus_Pa: m.elasticModulus ?? null,
      poisson_ratio: m.poissonRatio ?? null,
      density_kg_m3: m.density ?? null,
      yield_strength_Pa: m.yieldStrength ?? null,
      tensile_strength_Pa: m.tensileStrength ?? null,
      elongation: m.elongation ?? null,
      reduction_of_area: m.reductionOfArea ?? null,
      fracture_strain: m.fractureStrain ?? null,
      strength_basis: m.strengthBasis ?? null,
      source: m.source,
    })),
  };
}
