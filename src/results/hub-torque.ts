import type { Case, Station } from '../case/case.ts';
import { cutAtStations } from '../model/shaft-model.ts';
import type { SideResult } from '../physics/energy-method.ts';
import { verdictShearStrength } from '../physics/shear-strength.ts';
import { shearStress } from '../physics/torsion.ts';
import type { DynamicResult } from './dynamic-result.ts';
import type { VerdictBasis } from './verdict-basis.ts';

const EPS = 1e-9;

/** The torque a station's hub passed to the shaft in the incident, and how it was taken. */
export interface HubTorque {
  /** N·m at shaft speed. */
  torque: number;
  /** Whether it is an upper bound (loaded stations beyond the hub, or the stop taking both sides). */
  upperBound: boolean;
}

/**
 * The peak torque through a station's hub, by the verdict's model: the peak of the shaft next to
 * the station on the stop's side (the dynamic model's piece, or the energy method's side). The hub
 * carries only its own parts' torque; with loaded stations beyond it that shaft carries theirs too,
 * so the figure is then an upper bound. A hub at the stop takes both sides' peaks together (an
 * upper bound: they need not peak at once).
 */
export function hubTorque(c: Case, s: Station, basis: VerdictBasis, sides: readonly SideResult[], dynamic: DynamicResult): HubTorque {
  const stopAt = c.stations.find((x) => x.name === c.stop.at)!.at;
  const sideOf = (x: number) => (x < stopAt - EPS ? 'A' : 'B');
  if (Math.abs(s.at - stopAt) <= EPS) {
    const torque =
      basis === 'energy method'
        ? sides.reduce((sum, x) => sum + x.peakTorque, 0)
        : ['A', 'B'].reduce(
            (sum, side) =>
              sum + Math.max(0, ...dynamic.pieces.filter((p) => p.side === side && (Math.abs(p.piece.start - stopAt) <= EPS || Math.abs(p.piece.end - stopAt) <= EPS)).map((p) => p.peakTorque)),
            0,
          );
    return { torque, upperBound: sides.length > 1 };
  }
  const side = sideOf(s.at);
  const loaded = c.stations.filter((x) => x !== s && x.parts.length > 0 && sideOf(x.at) === side);
  const far = Math.max(s.parts.length > 0 ? Math.abs(s.at - stopAt) : 0, ...loaded.map((x) => Math.abs(x.at - stopAt)));
  // A hub beyond the farthest loaded station carries nothing.
  if (Math.abs(s.at - stopAt) > far + EPS) return { torque: 0, upperBound: false };
  const beyond = loaded.some((x) => Math.abs(x.at - stopAt) > Math.abs(s.at - stopAt) + EPS);
  if (basis === 'energy method') return { torque: sides.find((x) => x.side === side)?.peakTorque ?? 0, upperBound: beyond };
  const next = dynamic.pieces.find((p) => p.side === side && (side === 'A' ? Math.abs(p.piece.start - s.at) <= EPS : Math.abs(p.piece.end - s.at) <= EPS));
  return { torque: next?.peakTorque ?? 0, upperBound: beyond };
}

/**
 * The lowest torque at which the shaft between a station and the stop first yields, N·m: the
 * piece with the lowest τ_y·J_p/(c·kt) (the verdict's shear strength by the case's criterion, kt
 * applied; Shigley 9th ed. Sec. 3-12; from memory, confident). Infinity where no shaft lies between.
 */
export function shaftYieldTorqueToStop(c: Case, s: Station): number {
  const stopAt = c.stations.find((x) => x.name === c.stop.at)!.at;
  // A hub at the stop holds the shaft of both sides: the whole loaded run.
  const loaded = c.stations.filter((x) => x.parts.length > 0 && Math.abs(x.at - stopAt) > EPS).map((x) => x.at);
  const atStop = Math.abs(s.at - stopAt) <= EPS;
  const lo = atStop ? Math.min(stopAt, ...loaded) : Math.min(s.at, stopAt);
  const hi = atStop ? Math.max(stopAt, ...loaded) : Math.max(s.at, stopAt);
  let least = Infinity;
  for (const p of cutAtStations(c.shaft.segments, c.stations)) {
    if (p.start < lo - EPS || p.end > hi + EPS || p.end - p.start <= EPS) continue;
    const seg = p.segment;
    const tauY = verdictShearStrength(c.materials[seg.material], c.analysis.criterion);
    least = Math.min(least, tauY / (seg.kt * shearStress(1, seg.diameter, seg.bore)));
  }
  return least;
}
