import type { StrainLifeProperties } from '../physics/fatigue/strain-life-properties.ts';

/** A material's cyclic stress–strain and strain–life constants (E is the material's own). */
export type CyclicProperties = Omit<StrainLifeProperties, 'elasticModulus'>;

/** A material's properties, SI. Optional fields are those some uses do not need. */
export interface Material {
  /** Key used in case files, e.g. `aisi-1045-cd`. */
  key: string;
  /** Name in the trade's words, e.g. "AISI 1045 steel, cold drawn". */
  name: string;
  /** Shear modulus G, Pa. Shaft segments need it. */
  shearModulus?: number;
  /** Young's modulus E, Pa. */
  elasticModulus?: number;
  /** Density, kg/m³. Parts given by shape need it; the shaft's own inertia uses it. */
  density?: number;
  /** Tensile yield strength S_y, Pa. Shaft segments need it. */
  yieldStrength?: number;
  /** Ultimate tensile strength S_ut, Pa. */
  tensileStrength?: number;
  /** Poisson's ratio ν (a shrink or press fit's contact pressure needs it). */
  poissonRatio?: number;
  /** Elongation at break, fraction (0.12 = 12 %). */
  elongation?: number;
  /** Reduction of area at break, fraction. */
  reductionOfArea?: number;
  /** Outer-fibre shear strain at which a round bar breaks in torsion, rad (dimensionless); overrides the estimate from reduction of area. */
  fractureStrain?: number;
  /**
   * Cyclic and strain–life constants (K′, n′, σ′_f, b, ε′_f, c) from the case, all six or none;
   * without them the fatigue of a jam estimates them from the tensile strength.
   */
  cyclic?: CyclicProperties;
  /** Whether the strengths are published minima or typical (mean) values. */
  strengthBasis?: 'minimum' | 'typical';
  /** Where each value comes from, with "from memory" where it is recalled rather than read. */
  source: string;
}

/** The properties a use of a material needs, by the field name a case file uses. */
export const MATERIAL_FIELDS = {
  shear_modulus: 'shearModulus',
  elastic_modulus: 'elasticModulus',
  poisson_ratio: 'poissonRatio',
  density: 'density',
  yield_strength: 'yieldStrength',
  tensile_strength: 'tensileStrength',
  elongation: 'elongation',
  reduction_of_area: 'reductionOfArea',
  fracture_strain: 'fractureStrain',
} as const satisfies Record<string, keyof Material>;

export type MaterialField = keyof typeof MATERIAL_FIELDS;
