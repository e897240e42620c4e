import type { Chain } from '../model/chain.ts';
import { PlasticElementLaw } from '../physics/plastic/plastic-element-law.ts';
import type { ChainSolution } from './dynamic-solve.ts';

/** The torque–twist path of one piece over the window, sampled as the histories are. */
export interface YieldPath {
  /** Index into `DynamicResult.pieces`. */
  piece: number;
  /** Twist of the piece, rad, and its torque, N·m, both in the sense that resists the stop. */
  twist: Float64Array;
  torque: Float64Array;
  /** Work of plastic flow in the piece's elements over the window, J. */
  plasticWork: number;
}

/**
 * The path of the piece with the largest permanent twist: its twist is the sum of its elements'
 * (an element that spans several pieces, with shaft inertia off, gives the piece the share of its
 * twist the piece had at the element's largest twist), its torque the torque of its element that
 * twisted most. Undefined when no piece took a permanent twist.
 */
export function yieldPath(chain: Chain, sol: ChainSolution, permanent: readonly number[]): YieldPath | undefined {
  const piece = permanent.reduce((best, p, i) => (p > permanent[best] ? i : best), 0);
  if (!(permanent[piece] > 0)) return undefined;
  const h = sol.run.history;
  const sense = chain.pieces[piece].side === 'A' ? -1 : 1;
  const twist = new Float64Array(h.time.length);
  let most = -1;
  let mostTwist = -1;
  let plasticWork = 0;
  chain.elements.forEach((el, e) => {
    if (!el.pieces.includes(piece)) return;
    const law = sol.run.laws[e];
    const peak = law instanceof PlasticElementLaw ? law.peakTwist : 0;
    let share = 1;
    if (el.pieces.length > 1 && law instanceof PlasticElementLaw && peak > 0) {
      const k = el.pieces.indexOf(piece);
      share = (law.backbone.pieceTwistRates(peak)[k] * law.backbone.pieces[k].length) / peak;
    }
    for (let s = 0; s < twist.length; s++) twist[s] += sense * share * h.elementTwist[e][s];
    if (law instanceof PlasticElementLaw && el.pieces.length === 1) plasticWork += law.dissipated - law.released;
    if (peak > mostTwist) {
      mostTwist = peak;
      most = e;
    }
  });
  return { piece, twist, torque: h.elementTorque[most].map((t) => sense * t), plasticWork };
}
