import { bracketedRoot } from '../root-find.ts';
import { cyclicStrainRange } from './ramberg-osgood.ts';
import type { StrainLifeProperties } from './strain-life-properties.ts';

/** The local stress and strain range at a notch, Pa and strain. */
export interface NotchRange {
  stressRange: number;
  strainRange: number;
}

/**
 * The local stress and strain range at a notch from the nominal elastic stress range by Neuber's
 * rule, Δσ·Δε = (K_t·ΔS)²/E, on the Masing branch of the cyclic curve (H. Neuber, J. Appl. Mech.
 * 28, 1961; in range form as Dowling, 4th ed., Sec. 14.5, Eq. 14.27; equation number from memory).
 * The nominal section is taken as elastic. Solved by a bracketed root: since Δε ≥ Δσ/E, the
 * local stress range lies between 0 and K_t·ΔS.
 */
export function neuberRange(nominalStressRange: number, kt: number, p: StrainLifeProperties): NotchRange {
  const elastic = kt * nominalStressRange;
  if (elastic <= 0) return { stressRange: 0, strainRange: 0 };
  const target = (elastic * elastic) / p.elasticModulus;
  const g = (ds: number) => ds * cyclicStrainRange(ds, p) - target;
  const stressRange = bracketedRoot(g, 0, elastic, elastic * 1e-12);
  return { stressRange, strainRange: cyclicStrainRange(stressRange, p) };
}
