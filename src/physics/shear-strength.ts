import type { YieldCriterion } from '../case/case.ts';

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
