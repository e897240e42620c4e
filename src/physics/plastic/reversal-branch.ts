import { torqueAtTwistRate, type TorsionLaw } from './plastic-torsion.ts';

/** A point where the twist rate changed direction: twist per length rad/m and torque N·m. */
export interface Reversal {
  twistRate: number;
  torque: number;
}

/**
 * Torque on the branch that leaves a reversal point, for a round section whose fibres are each
 * elastic–perfectly plastic (or linearly kinematic-hardening) with equal yield in both senses:
 * Masing's rule, T = T_r + 2·s·T₀(|φ − φ_r|/2) with T₀ the first-loading curve and s the sign of
 * φ − φ_r (G. Masing, 1926; for a parallel assembly of such elements it is exact, W. D. Iwan,
 * J. Appl. Mech. 33 (1966) 893–900; from memory, confident). A circular section in torsion is such
 * an assembly of rings, so the rule holds for solid and hollow sections. It applies from the most
 * recent reversal until the branch meets an earlier loading path, where that path resumes: after
 * the first reversal from φ_r, at −φ_r, where the first-loading curve of the other sense,
 * −T₀(|φ|), takes over (the rings that were still elastic at the reversal yield there).
 *
 * For the dynamics model: first loading follows `torqueAtTwistRate`; each reversal starts a branch.
 */
export function branchTorque(l: TorsionLaw, from: Reversal, phi: number): number {
  const d = phi - from.twistRate;
  return from.torque + 2 * Math.sign(d) * torqueAtTwistRate(l, Math.abs(d) / 2);
}
