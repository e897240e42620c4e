import type { IncidentFatigue } from '../finding/incident-fatigue.ts';
import type { AssetHistory } from '../log/asset-history.ts';
import type { NotchCycle } from '../physics/fatigue/notch-damage.ts';

/**
 * The `fatigue` object of every JSON output: the incident's fatigue at the finding's governing
 * stress raiser, SI. `damage` is the Miner fraction of the crack-initiation life this incident used
 * (jam and ring-down); `jam_cycle` is the jam alone, rest → peak → rest.
 */
export function fatigueToJson(z: IncidentFatigue): Record<string, unknown> {
  const p = z.properties;
  return {
    kt: z.kt,
    nominal_shear_stress_Pa: z.nominalShearStress,
    properties_source: z.propertiesSource,
    properties: {
      elastic_modulus_Pa: p.elasticModulus,
      cyclic_strength_coefficient_Pa: p.cyclicStrengthCoefficient,
      cyclic_hardening_exponent: p.cyclicHardeningExponent,
      fatigue_strength_coefficient_Pa: p.fatigueStrengthCoefficient,
      fatigue_strength_exponent: p.fatigueStrengthExponent,
      fatigue_ductility_coefficient: p.fatigueDuctilityCoefficient,
      fatigue_ductility_exponent: p.fatigueDuctilityExponent,
    },
    jam_cycle: cycleJson(z.jamCycle),
    ring_down: z.ringDown,
    cycles: z.cycles.map(cycleJson),
    damage: z.damage,
    notes: z.notes,
  };
}

function cycleJson(c: NotchCycle): Record<string, unknown> {
  return {
    nominal_equivalent_stress_range_Pa: c.nominalRange,
    count: c.count,
    strain_amplitude: c.strainAmplitude,
    life_cycles: c.life.cycles ?? null,
    beyond: c.life.beyond ?? null,
    damage: c.damage,
  };
}

/** `asset_history`: the case's place in its asset's history where the CLI looked (check, report). */
export function assetHistoryToJson(h: AssetHistory): Record<string, unknown> {
  return {
    asset: h.asset,
    position: h.position,
    incidents: h.incidents,
    damage: h.incidentDamage,
    asset_damage: h.assetDamage,
    jams_left: h.finding.jamsLeft ?? null,
    inspect: h.finding.inspect,
    finding: h.finding.sentence,
    searched: h.searched,
    others: h.others.map((o) => ({ id: o.id, occurred: o.occurred, damage: o.damage })),
  };
}
