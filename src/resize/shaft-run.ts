import type { Case } from '../case/case.ts';
import { cutAtStations, type ShaftPiece } from '../model/shaft-model.ts';
import { verdictShearStrength } from '../physics/shear-strength.ts';
import { shearStress } from '../physics/torsion.ts';

/** One piece of shaft on a run that carries one torque, with what a torque does to it. */
export interface RunPiece {
  piece: ShaftPiece;
  /** Outer-fibre shear stress per N·m of torque, kt applied, Pa/(N·m). */
  stressPerTorque: number;
  /** The same without kt (nominal), Pa/(N·m). */
  nominalPerTorque: number;
  /** Shear yield of the segment's material by the case's criterion, Pa. */
  shearYield: number;
  /** Torque at which the stress with kt reaches shear yield, N·m. */
  yieldTorque: number;
}

/** Positions closer than this are the same point, m (as in src/model/shaft-model.ts). */
const EPS = 1e-9;

/**
 * The pieces of shaft between two positions (m): the run a torque passes through from a station
 * to the stop. Stress per unit torque from the engine's torsion formulas (src/physics/torsion.ts).
 */
export function shaftRun(c: Case, from: number, to: number): RunPiece[] {
  const lo = Math.min(from, to);
  const hi = Math.max(from, to);
  return cutAtStations(c.shaft.segments, c.stations)
    .filter((p) => p.start >= lo - EPS && p.end <= hi + EPS && p.end - p.start > EPS)
    .map((piece) => {
      const { segment } = piece;
      const nominal = shearStress(1, segment.diameter, segment.bore);
      const tauY = verdictShearStrength(c.materials[segment.material], c.analysis.criterion);
      return { piece, stressPerTorque: segment.kt * nominal, nominalPerTorque: nominal, shearYield: tauY, yieldTorque: tauY / (segment.kt * nominal) };
    });
}

/** The run from the named station to the stop. */
export function runToStop(c: Case, station: string): RunPiece[] {
  const s = c.stations.find((x) => x.name === station)!;
  const stop = c.stations.find((x) => x.name === c.stop.at)!;
  return shaftRun(c, s.at, stop.at);
}

/** The piece of a run that yields first (lowest yield torque); undefined for an empty run. */
export function weakestPiece(run: readonly RunPiece[]): RunPiece | undefined {
  return run.reduce<RunPiece | undefined>((a, b) => (a === undefined || b.yieldTorque < a.yieldTorque ? b : a), undefined);
}
