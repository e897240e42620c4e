import type { Case, Segment } from '../case/case.ts';
import type { Chain } from '../model/chain.ts';
import type { SideMode } from '../model/chain-modes.ts';
import type { IntegrationResult } from '../physics/integrator/integrate-chain.ts';
import { dampingShares, springDampingRatio } from './element-damping.ts';

/** One damper of the dynamic model and the energy it took over the window. */
export interface DamperEnergy {
  kind: 'coupling' | 'shaft';
  /**
   * A coupling's segment; for the shaft, the segment with its own `damping_ratio`. Undefined: the
   * shaft's material damping of every segment without one (`analysis.damping_ratio`).
   */
  segment?: Segment;
  /** Its damping ratio, fraction of critical. */
  dampingRatio: number;
  /** Energy it dissipated over the window, J. */
  energy: number;
  /** Its share of what all the dampers dissipated (0 where they took nothing). */
  share: number;
}

/**
 * Whether the response still rings at the end of the window: the half-swing of the most loaded
 * piece's torque over the first period of its side's lowest mode after its peak, and over the
 * last period of the window.
 */
export interface Ringing {
  /** Index into `DynamicResult.pieces`. */
  piece: number;
  /** Half-swings, N·m. */
  firstCycle: number;
  lastCycle: number;
  /** lastCycle / firstCycle. */
  ratio: number;
  /** The last cycle keeps at least `RINGS_ON_RATIO` of the first and more than 2 % of the peak: it rings on at about constant amplitude. */
  ringsOn: boolean;
}

export interface DynamicDamping {
  /** Largest energy first. */
  dampers: DamperEnergy[];
  /** Energy all the dampers dissipated, J (the energy books' `dampingWork`). */
  total: number;
  /** Undefined where the window holds less than two lowest periods after the peak. */
  ringing?: Ringing;
}

/**
 * The last cycle keeps this share of the first after the peak: "about constant amplitude". Over
 * the default window of eight lowest periods the default 0.5 % of critical keeps e^(−2π·0.005·7)
 * ≈ 0.80 and rings on; 2 % keeps 0.41 and does not.
 */
export const RINGS_ON_RATIO = 0.7;

/**
 * Which damper took the energy the dynamic model dissipated, from the integrator's own books
 * (each element's dashpot work, shared among its springs as `dampingShares` says), and whether the
 * most loaded piece still rings at the end of the window.
 */
export function dynamicDamping(c: Case, chain: Chain, run: IntegrationResult, modes: readonly SideMode[], piecePeak: readonly number[], pieceElement: readonly number[]): DynamicDamping {
  const byKey = new Map<string, DamperEnergy>();
  chain.elements.forEach((el, e) => {
    const shares = dampingShares(c, el);
    el.springs.forEach((s, i) => {
      const own = s.kind === 'coupling' || s.segment.dampingRatio !== undefined;
      const key = own ? `${s.kind}:${s.segment.index}` : 'shaft';
      const d = byKey.get(key) ?? { kind: s.kind, ...(own ? { segment: s.segment } : {}), dampingRatio: springDampingRatio(c, s), energy: 0, share: 0 };
      d.energy += shares[i] * run.elementDampingWork[e];
      byKey.set(key, d);
    });
  });
  const total = run.energy.dampingWork;
  const dampers = [...byKey.values()].map((d) => ({ ...d, share: total > 0 ? d.energy / total : 0 })).sort((a, b) => b.energy - a.energy);
  const ringing = ringingOf(chain, run, modes, piecePeak, pieceElement);
  return { dampers, total, ...(ringing ? { ringing } : {}) };
}

function ringingOf(chain: Chain, run: IntegrationResult, modes: readonly SideMode[], piecePeak: readonly number[], pieceElement: readonly number[]): Ringing | undefined {
  if (piecePeak.length === 0) return undefined;
  const piece = piecePeak.reduce((best, p, i) => (p > piecePeak[best] ? i : best), 0);
  const e = pieceElement[piece];
  const omega = modes.find((m) => m.side === chain.pieces[piece].side)?.omega;
  if (e < 0 || !omega) return undefined;
  const time = run.history.time;
  const values = run.history.elementTorque[e];
  const period = (2 * Math.PI) / omega;
  let at = 0;
  for (let i = 0; i < values.length; i++) if (Math.abs(values[i]) > Math.abs(values[at])) at = i;
  const tPeak = time[at];
  const tEnd = time[time.length - 1];
  if (tEnd - tPeak < 2 * period) return undefined;
  const swing = (from: number, to: number) => {
    let lo = Infinity;
    let hi = -Infinity;
    for (let i = 0; i < time.length; i++) {
      if (time[i] < from || time[i] > to) continue;
      lo = Math.min(lo, values[i]);
      hi = Math.max(hi, values[i]);
    }
    return hi > lo ? (hi - lo) / 2 : 0;
  };
  const firstCycle = swing(tPeak, tPeak + period);
  const lastCycle = swing(tEnd - period, tEnd);
  const ratio = firstCycle > 0 ? lastCycle / firstCycle : 0;
  return { piece, firstCycle, lastCycle, ratio, ringsOn: ratio >= RINGS_ON_RATIO && lastCycle > 0.02 * Math.abs(values[at]) };
}
