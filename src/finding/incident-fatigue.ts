/**
 * The fatigue of one incident at the finding's governing stress raiser: the jam and the ring-down
 * after it as counted cycles of the notch's local strain, each with its life to crack initiation,
 * and the incident's damage, the Miner sum of count/N. Decided here once, beside the finding; the
 * views and `shaftcase log` render it.
 */
import type { Material } from '../materials/material.ts';
import { isBrittle } from '../physics/fracture.ts';
import { minerSum } from '../physics/fatigue/miner.ts';
import { notchCycles, type NotchCycle } from '../physics/fatigue/notch-damage.ts';
import { rainflow } from '../physics/fatigue/rainflow.ts';
import { equivalentNormalStress } from '../physics/fatigue/shear-equivalent.ts';
import { uniformMaterialLaw, type StrainLifeProperties } from '../physics/fatigue/strain-life-properties.ts';

/** Poisson's ratio used to estimate E from G where a material gives no E (steels 0.27–0.30; common practice). */
const POISSON_ESTIMATE = 0.3;

export interface IncidentFatigue {
  /** The stress raiser's factor (the governing segment's kt, 1 for a plain section). */
  kt: number;
  /** Nominal (net-section, kt removed) peak shear stress of the jam, Pa. */
  nominalShearStress: number;
  /** Where the constants come from: the case's material, or the uniform material law's estimate. */
  propertiesSource: 'case material' | 'uniform material law (estimate)';
  properties: StrainLifeProperties;
  /** The cycles counted (the jam and the ring-down), largest first. */
  cycles: NotchCycle[];
  /** The jam's own cycle, rest → peak → rest, as one full cycle ("jams like this one" count in these). */
  jamCycle: NotchCycle;
  /** The incident's damage: the Miner sum of its cycles (1 is crack initiation expected). */
  damage: number;
  /** Whether the torque history of the dynamic model gave the ring-down (else the jam cycle alone). */
  ringDown: boolean;
  /** What the estimate assumes, in plain words, for the report. */
  notes: string[];
}

/**
 * The incident's fatigue. `elasticStress` is the finding's kt stress at the governing piece and
 * `elasticPeakTorque` the torque it stands on, `history` the dynamic model's torque history of the governing piece (undefined: the jam's cycle alone).
 */
export function incidentFatigue(material: Material, kt: number, elasticStress: number, elasticPeakTorque: number, history: Float64Array | undefined): IncidentFatigue {
  const notes: string[] = [];
  const E = material.elasticModulus ?? (material.shearModulus ?? 0) * 2 * (1 + POISSON_ESTIMATE);
  if (material.elasticModulus === undefined) notes.push(`The material gives no elastic modulus; E = 2G(1 + ν) with ν = ${POISSON_ESTIMATE} stands in.`);
  let properties: StrainLifeProperties;
  let propertiesSource: IncidentFatigue['propertiesSource'];
  if (material.cyclic) {
    properties = { elasticModulus: E, ...material.cyclic };
    propertiesSource = 'case material';
  } else {
    const group = E >= 150e9 ? 'steel' : 'aluminium or titanium';
    const Su = material.tensileStrength ?? (material.yieldStrength ?? 0) * 1.2;
    if (material.tensileStrength === undefined) notes.push('The material gives no tensile strength; 1.2 × its yield strength stands in for the estimate.');
    properties = uniformMaterialLaw(Su, E, group);
    propertiesSource = 'uniform material law (estimate)';
    notes.push(
      `The cyclic and strain–life constants are estimated from the tensile strength by the uniform material law for ${group === 'steel' ? 'unalloyed and low-alloy steels' : 'aluminium and titanium alloys'} (Bäumel and Seeger 1990); measured constants (the material's cyclic_strength_coefficient … fatigue_ductility_exponent) replace the estimate.`,
    );
  }
  if (isBrittle(material)) notes.push("The material is brittle: the strain–life relation and Neuber's rule are for ductile metals, so this life is a rough guess.");
  const nominalShearStress = elasticStress / kt;
  const peakEq = equivalentNormalStress(nominalShearStress);
  const series = history;
  const ringDown = series !== undefined && series.some((v) => v !== 0) && elasticPeakTorque > 0;
  const nominal = ringDown ? nominalHistory(series, peakEq, elasticPeakTorque) : [0, peakEq, 0];
  const cycles = notchCycles(rainflow(nominal), kt, properties).sort((a, b) => b.nominalRange - a.nominalRange);
  const jamCycle = notchCycles([{ range: peakEq, mean: peakEq / 2, count: 1 }], kt, properties)[0];
  notes.push("Torsion enters the strain–life relation as the von Mises equivalent (√3·τ), Neuber's rule on the equivalent stress with the segment's kt; mean stress is left out.");
  if (ringDown)
    notes.push(
      "The ring-down is the dynamic model's torque history of the governing piece, in its nominal stress per torque, its largest sample put at the elastic peak (Neuber's rule takes the stress an elastic analysis gives), counted by rainflow (ASTM E1049); the history is kept at a few hundred samples, so small late cycles may be missed. The model holds the stop in both senses, so a rebound that would lift a one-sided jam off is counted in full, and the count ends with the model's window: an upper estimate where the ring-down dominates.",
    );
  return { kt, nominalShearStress, propertiesSource, properties, cycles, jamCycle, damage: minerSum(cycles.map((c) => c.damage)), ringDown, notes };
}

/**
 * The nominal equivalent stress history, Pa: each torque in the governing piece's nominal stress
 * per N·m, the largest sample replaced by the elastic peak (where the shaft yields, the history is
 * capped by plasticity, but Neuber's rule takes the stress an elastic analysis gives), between rest
 * before and rest after (the shaft unloaded for the inspection).
 */
function nominalHistory(series: Float64Array, peakEq: number, elasticPeakTorque: number): number[] {
  const perTorque = peakEq / elasticPeakTorque;
  let top = 0;
  for (let i = 1; i < series.length; i++) if (Math.abs(series[i]) > Math.abs(series[top])) top = i;
  const out = Array.from(series, (v) => v * perTorque);
  out[top] = Math.sign(series[top]) * peakEq;
  return [0, ...out, 0];
}
