import { chainModes } from '../physics/modes.ts';
import type { Chain } from './chain.ts';
import type { SideName } from './shaft-model.ts';

/** A natural mode of one side of the chain, with the stop held. */
export interface SideMode {
  side: SideName;
  /** rad/s. */
  omega: number;
  /** Hz. */
  frequency: number;
  /** Amplitude at every chain node (0 at the stop and on the other side), largest +1. */
  shape: Float64Array;
  /** Share of that side's running kinetic energy the mode carries after an instantaneous stop. */
  participation: number;
}

/**
 * The natural modes of the chain with the stop held, belts and limiters sticking and pins intact:
 * the sides are then separate chains, each grounded at the stop, so each side's generalised
 * eigenproblem K·φ = ω²·M·φ is solved on its own (tridiagonal K, diagonal M; see `chainModes`).
 * Returns up to `perSide` modes of each side, all sorted by frequency.
 */
export function sideModes(chain: Chain, perSide: number): SideMode[] {
  const P = chain.stopNode;
  const N = chain.nodes.length;
  const k = chain.elements.map((e) => e.stiffness);
  const mass = chain.nodes.map((n) => n.inertia);
  for (const d of chain.drives) if (d.belt) mass[d.node] += d.rotorInertia;
  const out: SideMode[] = [];
  const solve = (side: SideName, idx: number[]) => {
    if (idx.length === 0) return;
    const kd = idx.map((i) => (i > 0 ? k[i - 1] : 0) + (i < N - 1 ? k[i] : 0));
    const ko = idx.slice(0, -1).map((i) => -k[i]);
    for (const mode of chainModes(
      kd,
      ko,
      idx.map((i) => mass[i]),
      perSide,
    )) {
      const shape = new Float64Array(N);
      idx.forEach((i, j) => (shape[i] = mode.shape[j]));
      out.push({ side, omega: mode.omega, frequency: mode.frequency, shape, participation: mode.participation });
    }
  };
  solve(
    'A',
    Array.from({ length: P }, (_, i) => i),
  );
  solve(
    'B',
    Array.from({ length: N - P - 1 }, (_, i) => P + 1 + i),
  );
  return out.sort((a, b) => a.omega - b.omega);
}
