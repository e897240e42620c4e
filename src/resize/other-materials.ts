import type { Case } from '../case/case.ts';
import { MATERIAL_LIBRARY } from '../materials/library.ts';
import type { Material } from '../materials/material.ts';
import { designCheck, type DesignCheck } from './design-run.ts';
import { withShaftMaterial } from './change-case.ts';

/** A library material for the whole shaft, same geometry, against a repeat of the incident. */
export interface MaterialOption {
  material: Material;
  /** Highest stress / shear yield over every side in the rerun. */
  yieldRatio: number;
  keepsFactor: boolean;
  rerun: DesignCheck;
}

/** Elongation below which a material is brittle and not offered for a shaft that must take a jam. */
const BRITTLE_ELONGATION = 0.05;

/**
 * Each library material with a shear modulus and a yield strength (brittle ones left out), put in
 * for every segment and rerun through the engine: stiffness matters as well as strength, since a
 * lower G makes the shaft more compliant and lowers the torque a jam produces. Best first.
 */
export function otherMaterials(c: Case, designFactor: number): MaterialOption[] {
  const present = new Set(c.shaft.segments.map((s) => s.material));
  return MATERIAL_LIBRARY.filter(
    (m) => m.shearModulus !== undefined && m.yieldStrength !== undefined && (m.elongation === undefined || m.elongation >= BRITTLE_ELONGATION) && !(present.size === 1 && present.has(m.key)),
  )
    .map((material) => {
      const rerun = designCheck(withShaftMaterial(c, material));
      return { material, yieldRatio: rerun.yieldRatio, keepsFactor: rerun.yieldRatio * designFactor <= 1 + 1e-12, rerun };
    })
    .sort((a, b) => a.yieldRatio - b.yieldRatio);
}
