import { neuberRange } from './neuber.ts';
import type { RainflowCycle } from './rainflow.ts';
import { lifeAtStrainAmplitude, type StrainLife } from './strain-life.ts';
import type { StrainLifeProperties } from './strain-life-properties.ts';

/** One counted cycle at the notch. */
export interface NotchCycle {
  /** Nominal (equivalent normal) stress range, Pa. */
  nominalRange: number;
  count: 0.5 | 1;
  /** Local strain amplitude Δε/2 at the notch by Neuber's rule. */
  strainAmplitude: number;
  life: StrainLife;
  /** count / N; 0 where the life is beyond the relation's reach. */
  damage: number;
}

/** Counted cycles smaller than this share of the largest range are left out: their damage is nil at any count a jam sees. */
export const NEGLIGIBLE_RANGE = 0.02;

/**
 * The damage of counted nominal cycles at a notch: each range through Neuber's rule to a local
 * strain amplitude, its life from the strain–life relation, its damage count/N. Mean stress is
 * left out: at a notch that yields, the local mean relaxes under the first cycles (Dowling, 4th ed.,
 * Sec. 14.4; from memory), and the jam's first cycle dominates.
 */
export function notchCycles(cycles: readonly RainflowCycle[], kt: number, p: StrainLifeProperties): NotchCycle[] {
  const largest = cycles.reduce((m, c) => Math.max(m, c.range), 0);
  return cycles
    .filter((c) => c.range > NEGLIGIBLE_RANGE * largest)
    .map((c) => {
      const local = neuberRange(c.range, kt, p);
      const strainAmplitude = local.strainRange / 2;
      const life = lifeAtStrainAmplitude(strainAmplitude, p);
      return { nominalRange: c.range, count: c.count, strainAmplitude, life, damage: life.cycles === undefined ? 0 : c.count / life.cycles };
    });
}
