import type { Material } from '../../materials/material.ts';

/**
 * The slope dτ/dγ of a linear strain-hardening line in shear, Pa, from tensile data: the tensile
 * flow stress rises linearly from S_y to S_ut over a plastic strain equal to the elongation at
 * break, E_p = (S_ut − S_y)/elongation. A shear criterion τ = k·σ with equal plastic work
 * (τ·γ_p = σ·ε_p) gives γ_p = ε_p/k, so the plastic slope in shear is H_p = k²·E_p (k = 1/√3 for
 * distortion energy gives E_p/3, Dieter, Mechanical Metallurgy, 3rd ed., Sec. 3-9 effective
 * stress and strain; from memory, verify the section). Elastic and plastic parts in series give
 * the tangent H = G·H_p/(G + H_p).
 *
 * An assumption, used only where the case asks for it: elongation at break includes necking, and
 * the line carries on past the ultimate strength at large twist. Undefined when the material lacks
 * S_ut or elongation, or does not harden.
 */
export function linearHardeningModulus(m: Material, shearOverTensile: number): number | undefined {
  const { yieldStrength: sy, tensileStrength: sut, elongation, shearModulus: g } = m;
  if (sy === undefined || sut === undefined || elongation === undefined || g === undefined) return undefined;
  if (!(sut > sy) || !(elongation > 0)) return undefined;
  const hp = shearOverTensile ** 2 * ((sut - sy) / elongation);
  return (g * hp) / (g + hp);
}
