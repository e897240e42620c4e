import type { Case } from '../case/case.ts';
import { buildChain, type Chain } from '../model/chain.ts';
import { sideModes, type SideMode } from '../model/chain-modes.ts';
import type { ShaftModel, SideName } from '../model/shaft-model.ts';

/** A natural frequency counts as converged when its estimated error is within this share. */
export const MODE_TOLERANCE = 0.01;
/** Modes per side the chain and its refinement are solved for. */
const PER_SIDE = 12;

/** A natural frequency of the chain with its side and whether the element count resolves it. */
export interface ModeFrequency {
  side: SideName;
  /** Hz, at the chain's element count. */
  frequency: number;
  /** Share of its side's running kinetic energy the mode carries after an instantaneous stop. */
  participation: number;
  /** The same mode (same side, same order) in the chain with twice the elements, Hz. */
  refinedFrequency: number;
  /**
   * Whether the frequency is within MODE_TOLERANCE (1 %) of its limit for ever finer elements,
   * as estimated from the run at twice the elements (see `modeFrequencies`).
   */
  converged: boolean;
}

/**
 * The chain's natural frequencies, each with its side and a convergence flag. A lumped chain's
 * frequencies fall short of the continuous shaft's, by an error that shrinks as 1/n² with the
 * element count n for a smooth mode (lumped-mass finite differences of the wave equation; e.g.
 * Meirovitch, Elements of Vibration Analysis, on lumped-parameter models; from memory, verify), so
 * the limit is estimated by Richardson extrapolation from this chain and one with twice the
 * elements, f∞ ≈ f₂ + (f₂ − f)/3, and a mode is converged where |f/f∞ − 1| ≤ 1 %. The k-th mode
 * of a side is matched with the k-th of the same side in the refined chain. Without the shaft's
 * inertia the chain is exact for its lumped masses: every mode is converged.
 */
export function modeFrequencies(c: Case, model: ShaftModel, chain: Chain, modes: readonly SideMode[], target: number): ModeFrequency[] {
  const refined = chain.shaftInertia ? sideModes(buildChain(c, model, { elements: 2 * target, shaftInertia: true }), PER_SIDE) : modes;
  const order = (list: readonly SideMode[], m: SideMode) => list.filter((x) => x.side === m.side).indexOf(m);
  return modes.map((m) => {
    const k = order(modes, m);
    const twin = refined.filter((x) => x.side === m.side)[k];
    if (!twin) return { side: m.side, frequency: m.frequency, participation: m.participation, refinedFrequency: m.frequency, converged: false };
    const limit = twin.frequency + (twin.frequency - m.frequency) / 3;
    return { side: m.side, frequency: m.frequency, participation: m.participation, refinedFrequency: twin.frequency, converged: Math.abs(m.frequency / limit - 1) <= MODE_TOLERANCE };
  });
}
