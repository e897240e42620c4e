import type { Chain } from '../model/chain.ts';
import { PlasticElementLaw } from '../physics/plastic-element-law.ts';
import type { ChainSolution } from './dynamic-solve.ts';
import type { SlipOutcome } from './dynamic-slips.ts';

/** A named time series, sampled at `DynamicHistories.time`. */
export interface Series {
  name: string;
  values: Float64Array;
}

/**
 * The time histories the report plots, kept compact (a few hundred samples): station speeds, and
 * torques in the most loaded piece and in every slip element.
 */
export interface DynamicHistories {
  /** s from the stop's start. */
  time: Float64Array;
  /** Station speeds at shaft speed, rad/s; a rotor behind a belt too. */
  speeds: Series[];
  /** Torques, N·m, positive in the sense that resists the stop: the governing piece first, then each slip element. */
  torques: Series[];
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
  const peaks = sol.piecePeak;
  const top = peaks.reduce((best, p, i) => (p > peaks[best] ? i : best), 0);
  const gov = sol.pieceElement[top];
  if (gov >= 0) {
    const p = chain.pieces[top].piece;
    const label = p.segment.label ? ` "${p.segment.label}"` : ` segment ${p.segment.index + 1}`;
    torques.push({ name: `shaft${label} (most loaded)`, values: elementSeries(gov) });
  }
  for (const s of slips) {
    if (s.kind === 'torque limiter') torques.push({ name: s.element, values: elementSeries(s.elementIndex!) });
    else if (s.kind === 'belt') {
      const i = chain.drives.findIndex((d) => `the belt at "${d.station}"` === s.element);
      torques.push({ name: s.element, values: h.beltTorque[i] });
    } else torques.push({ name: s.element, values: h.jamTorque });
  }
  return { time: h.time, speeds, torques };
}

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
