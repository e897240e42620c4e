import type { Chain } from '../model/chain.ts';
import type { ChainSolution } from './dynamic-solve.ts';
import type { SlipOutcome } from './dynamic-slips.ts';

/** A named time series, sampled at `DynamicHistories.time`. */
export interface Series {
  name: string;
  values: Float64Array;
}

/**
 * The time histories the report plots, kept compact (a few hundred samples): station speeds, and
 * torques in every piece of shaft and in every slip element.
 */
export interface DynamicHistories {
  /** s from the stop's start. */
  time: Float64Array;
  /** Station speeds at shaft speed, rad/s; a rotor behind a belt too. */
  speeds: Series[];
  /** Torques, N·m, positive in the sense that resists the stop, in each slip element. */
  torques: Series[];
  /**
   * Torque in each piece of shaft (index as `DynamicResult.pieces`), N·m, in the same sense: its
   * element of highest peak. The views plot the finding's governing piece from these (one place
   * decides which piece governs), never a piece picked here.
   */
  pieceTorques: Series[];
}

export function dynamicHistories(chain: Chain, sol: ChainSolution, slips: readonly SlipOutcome[]): DynamicHistories {
  const h = sol.run.history;
  const speeds: Series[] = [];
  chain.nodes.forEach((n, i) => {
    if (n.stations.length > 0) speeds.push({ name: n.stations.join(' / '), values: h.nodeSpeed[i] });
  });
  chain.drives.forEach((d, i) => {
    if (d.belt) speeds.push({ name: `motor rotor behind the belt at "${d.station}" (at shaft speed)`, values: h.rotorSpeed[i] });
  });
  // Side A's elements carry negative torque when the parts run ahead toward the stop; flip them.
  const sense = (e: number) => (chain.elements[e].side === 'A' ? -1 : 1);
  const elementSeries = (e: number) => h.elementTorque[e].map((t) => sense(e) * t);
  const torques: Series[] = [];
  const pieceTorques = chain.pieces.map((c, i) => {
    const p = c.piece;
    const e = sol.pieceElement[i];
    return { name: `shaft ${p.segment.label ? `"${p.segment.label}"` : `segment ${p.segment.index + 1}`}`, values: e >= 0 ? elementSeries(e) : new Float64Array(h.time.length) };
  });
  for (const s of slips) {
    if (s.kind === 'torque limiter') torques.push({ name: s.element, values: elementSeries(s.elementIndex!) });
    else if (s.kind === 'belt') {
      const i = chain.drives.findIndex((d) => `the belt at "${d.station}"` === s.element);
      torques.push({ name: s.element, values: h.beltTorque[i] });
    } else torques.push({ name: s.element, values: h.jamTorque });
  }
  return { time: h.time, speeds, torques, pieceTorques };
}
