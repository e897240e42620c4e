import type { Case } from '../case/case.ts';
import type { RunningTorque } from '../results/running-torque.ts';
import { runToStop, type RunPiece } from './shaft-run.ts';

/** The shaft in normal running: the design factor it keeps under the running torque. */
export interface RunningCheck {
  /** Undefined when the case gives no drive power or running torque. */
  running?: RunningTorque;
  /** Smallest shear yield / nominal stress over the run from the drive to the stop. */
  factorStatic?: number;
  /** The same with each segment's kt applied. */
  factorWithKt?: number;
  /** The piece that sets `factorWithKt`. */
  weakest?: RunPiece;
  /** Whether `factorWithKt` reaches the design factor; undefined without a running torque. */
  keeps?: boolean;
}

/**
 * The running torque carried from the drive's station to the stop (the working part), checked
 * static (nominal stress, as for a ductile shaft under steady load, Shigley 9th ed. Sec. 3-13 and
 * 7-4; from memory, confident) and with kt (first local yield). `c` is the option's case.
 */
export function runningCheck(c: Case, running: RunningTorque | undefined, designFactor: number): RunningCheck {
  if (!running) return {};
  const run = runToStop(c, running.station);
  if (run.length === 0) return { running };
  let factorStatic = Infinity;
  let weakest = run[0];
  for (const p of run) {
    factorStatic = Math.min(factorStatic, p.shearYield / (p.nominalPerTorque * running.torque));
    if (p.yieldTorque < weakest.yieldTorque) weakest = p;
  }
  const factorWithKt = weakest.yieldTorque / running.torque;
  return { running, factorStatic, factorWithKt, weakest, keeps: factorWithKt >= designFactor * (1 - 1e-12) };
}
