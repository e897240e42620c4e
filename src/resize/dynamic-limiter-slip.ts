import type { Case } from '../case/case.ts';
import type { SideName } from '../model/shaft-model.ts';
import { analyseCase } from '../results/analyse-case.ts';
import type { Results } from '../results/results.ts';
import { limiterSegment, withLimiter } from './limiter-segment.ts';

/** What the dynamic model says a limiter does in a repeat incident of the changed case. */
export interface DynamicLimiterSlip {
  /** Index into `shaft.segments` of the segment the limiter was put in. */
  segment: number;
  peakTorque: number;
  slipEnergy: number;
  slipAngle: number;
  /** Energy left in the model (kinetic and elastic) at the end of the simulated window, J. */
  energyLeft: number;
  /** Energy the model's damping took, J. */
  dampingWork: number;
  /** Highest yield ratio of the limited side in the rerun. */
  yieldRatio: number;
  /** The rerun's result. */
  rerun: Results;
}

/**
 * The limiter put into the case as a slip element (`slip_torque` on the segment that
 * `limiterSegment` picks) and the changed case rerun through the engine; the slip energy and angle
 * are those of that element in `results.dynamic.slips`, the peak torque the dynamic model's largest
 * over the pieces from the limiter's station to the stop. Undefined when no segment can hold it.
 */
export function dynamicLimiterSlip(c: Case, station: string, side: SideName, setting: number): DynamicLimiterSlip | undefined {
  const seg = limiterSegment(c, station);
  if (!seg) return undefined;
  const rerun = analyseCase(withLimiter(c, seg.index, setting), { readBack: false });
  const d = rerun.dynamic;
  const name = seg.label ? `"${seg.label}"` : `segment ${seg.index + 1}`;
  const slip = d.slips.find((s) => s.kind === 'torque limiter' && s.element === `the torque limiter in ${name}`);
  if (!slip) return undefined;
  const stop = c.stations.find((s) => s.name === c.stop.at)!.at;
  const reach = Math.abs(c.stations.find((s) => s.name === station)!.at - stop) + 1e-9;
  const run = d.pieces.filter((p) => p.side === side && Math.max(Math.abs(p.piece.start - stop), Math.abs(p.piece.end - stop)) <= reach);
  return {
    segment: seg.index,
    peakTorque: Math.max(0, ...run.map((p) => p.peakTorque)),
    slipEnergy: slip.energy,
    slipAngle: slip.angle,
    energyLeft: d.energy.final,
    dampingWork: d.energy.dampingWork,
    yieldRatio: d.sides.find((s) => s.side === side)?.dynamicYieldRatio ?? d.yieldRatio,
    rerun,
  };
}
