import type { StrainLifeProperties } from './strain-life-properties.ts';

/**
 * The cyclic stress–strain curve of Ramberg and Osgood: ε_a = σ_a/E + (σ_a/K′)^(1/n′)
 * (Dowling, 4th ed., Eq. 12.54; equation number from memory).
 */
export function cyclicStrainAmplitude(stressAmplitude: number, p: StrainLifeProperties): number {
  return stressAmplitude / p.elasticModulus + (stressAmplitude / p.cyclicStrengthCoefficient) ** (1 / p.cyclicHardeningExponent);
}

/**
 * The hysteresis loop's branch by Masing's rule, the cyclic curve doubled: Δε = Δσ/E + 2(Δσ/2K′)^(1/n′)
 * (Dowling, 4th ed., Eq. 12.58; from memory).
 */
export function cyclicStrainRange(stressRange: number, p: StrainLifeProperties): number {
  return 2 * cyclicStrainAmplitude(stressRange / 2, p);
}
