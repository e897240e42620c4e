import type { SideName } from '../model/shaft-model.ts';
import type { Results } from '../results/results.ts';

/** What an option does to a side's stiffness and, with it, to the torque and the natural frequency. */
export interface StiffnessChange {
  /** New torsional stiffness over the present, k = 1/C of the side's run. */
  stiffness: number;
  /** New natural frequency over the present. */
  frequency: number;
  /** New repeat-incident peak torque over the present. */
  peakTorque: number;
  /** How the frequency was found, for the output. */
  method: string;
}

/**
 * The change of one side between the present case and an option's rerun. The frequency is the
 * energy method's single-mass estimate ω_n = √(k/J) with the parts' inertia unchanged (Den Hartog,
 * Mechanical Vibrations; from memory, confident), so it scales as √(k_new/k_old). This is the seam
 * where the dynamics model's natural frequencies replace the estimate when Results carries them.
 */
export function stiffnessChange(present: Results, option: Results, side: SideName): StiffnessChange {
  const before = present.sides.find((s) => s.side === side)!;
  const after = option.sides.find((s) => s.side === side)!;
  const stiffness = before.compliance / after.compliance;
  return {
    stiffness,
    frequency: Math.sqrt(stiffness),
    peakTorque: after.peakTorque / before.peakTorque,
    method: 'energy method, single-mass estimate √(k/J)',
  };
}
