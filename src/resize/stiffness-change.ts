import type { SideName } from '../model/shaft-model.ts';
import type { Results } from '../results/results.ts';
import type { DesignCheck } from './design-run.ts';

/** What an option does to a side's stiffness and, with it, to the torque and the natural frequency. */
export interface StiffnessChange {
  /** New torsional stiffness over the present, k = 1/C of the side's run. */
  stiffness: number;
  /** New natural frequency over the present. */
  frequency: number;
  /** New repeat-incident peak torque over the present. */
  peakTorque: number;
  /** Which method gave the frequency. */
  frequencyMethod: 'energy method' | 'dynamic model';
  /** How the frequency was found, for the output. */
  method: string;
}

/**
 * The change of one side between the present case and an option's rerun. Where the present
 * case's verdict stands on the dynamic model, the frequency is the ratio of the side's lowest
 * natural frequency with the stop held in the two dynamic models (the option's from its modes
 * alone, `designCheck`; the present's from `presentModes`, a chain cut as the option's, so an
 * option that changes nothing gives exactly 1; by default the present result's own). Where the
 * energy method is exact, it is the single-mass estimate ω_n = √(k/J) with the
 * parts' inertia unchanged (Den Hartog, Mechanical Vibrations; from memory, confident), so it
 * scales as √(k_new/k_old).
 */
export function stiffnessChange(present: Results, option: DesignCheck, side: SideName, presentModes: Pick<DesignCheck, 'dynamic'> = present): StiffnessChange {
  const before = present.sides.find((s) => s.side === side)!;
  const after = option.sides.find((s) => s.side === side)!;
  const stiffness = before.compliance / after.compliance;
  const peakTorque = after.peakTorque / before.peakTorque;
  // The modes are read only where the frequency is the dynamic model's (a design check finds them when read).
  const dynamic = present.verdictBasis === 'dynamic model';
  const f0 = dynamic ? lowestFrequency(presentModes, side) : undefined;
  const f1 = dynamic ? lowestFrequency(option, side) : undefined;
  if (f0 !== undefined && f1 !== undefined) {
    return { stiffness, frequency: f1 / f0, peakTorque, frequencyMethod: 'dynamic model', method: `dynamic model, side ${side}'s lowest natural frequency with the stop held` };
  }
  return { stiffness, frequency: Math.sqrt(stiffness), peakTorque, frequencyMethod: 'energy method', method: 'energy method, single-mass estimate √(k/J)' };
}

/** A side's lowest natural frequency in the dynamic model, Hz; undefined if the side has no mode. */
export function lowestFrequency(r: Pick<DesignCheck, 'dynamic'>, side: SideName): number | undefined {
  const f = r.dynamic.frequencies.filter((m) => m.side === side).map((m) => m.frequency);
  return f.length > 0 ? Math.min(...f) : undefined;
}
