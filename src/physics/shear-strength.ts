import type { YieldCriterion } from '../case/case.ts';
import type { Material } from '../materials/material.ts';
import { brittleFractureShear, isBrittle } from './fracture.ts';

/**
 * Shear yield strength from the tensile yield strength. Distortion energy (von Mises):
 * S_sy = S_y/√3 ≈ 0.577·S_y; maximum shear (Tresca): 0.5·S_y. Shigley 9th ed. Sec. 5-4 and 5-5
 * (from memory, confident).
 */
export function shearYield(yieldStrength: number, criterion: YieldCriterion): number {
  return criterion === 'max-shear' ? 0.5 * yieldStrength : yieldStrength / Math.sqrt(3);
}

/**
 * Ultimate shear strength estimate of steels, S_su ≈ 0.67·S_ut (Shigley 9th ed. Sec. 6-15;
 * from memory, confident). Used for the comparison table only, not for a verdict.
 */
export function shearUltimate(tensileStrength: number): number {
  return 0.67 * tensileStrength;
}

/**
 * The shear strength a piece's K_t·τ is judged against for the verdict ratio: the criterion's
 * shear yield for ductile material; for brittle material (`isBrittle`) its fracture shear, S_ut,
 * by the maximum-normal-stress rule (in pure shear the principal tensile stress equals τ, so the
 * bar breaks when K_t·τ reaches S_ut; Shigley 9th ed. Sec. 5-8 and 5-9; from memory, confident).
 * That is the one criterion for brittle material: the fracture check (`brittleFractureShear`, the
 * energy balance and the dynamic model's brittle element) uses it too, so a ratio of 1 is the break.
 */
export function verdictShearStrength(m: Material, criterion: YieldCriterion): number {
  return isBrittle(m) ? brittleFractureShear(m, 1) : shearYield(m.yieldStrength!, criterion);
}
