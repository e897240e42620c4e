import type { Case } from '../case/case.ts';
import type { SideName } from '../model/shaft-model.ts';
import type { SideResult } from '../physics/energy-method.ts';
import type { Results } from '../results/results.ts';
import type { RunningTorque } from '../results/running-torque.ts';
import { limiterSlip, type LimiterSlip } from './limiter-slip.ts';
import { runToStop, weakestPiece, type RunPiece } from './shaft-run.ts';

/** A torque limiter (or slip coupling): where it sits and the window of settings. */
export interface LimiterOption {
  station: string;
  side: SideName;
  /** How the place was chosen, in words. */
  placement: string;
  runningTorque?: RunningTorque;
  serviceFactor: number;
  designFactor: number;
  /** Lowest setting: running torque × service factor, N·m; undefined when the running torque is unknown. */
  min?: number;
  /** Highest setting: the shaft's allowable torque, the weakest piece's yield torque (with kt) / N, N·m. */
  max: number;
  /** The piece that sets `max`. */
  weakest: RunPiece;
  /** The lowest setting exceeds the highest: no setting both runs the machine and protects the shaft. */
  windowEmpty: boolean;
  /** Slip in a repeat incident at the highest setting. */
  slip: LimiterSlip;
  /** The limited side's highest stress / shear yield in a repeat incident at the highest setting. */
  yieldRatio: number;
  /** Stations between the limiter and the stop whose parts still drive the shaft unlimited. */
  unlimitedStations: string[];
  /** Sides of the stop the limiter does not protect, with their present stress / shear yield. */
  otherSides: { side: SideName; yieldRatio: number }[];
  /** Repeat-incident peak torque against the setting, for the report's figure. */
  sweep: LimiterSlip[];
}

const SWEEP_POINTS = 60;

/**
 * The torque-limiter option. Place: `analysis.limiter_at`, or else the loaded station farthest
 * from the stop on the governing side (between the drive and the shaft, so the whole run of that
 * side is protected). Window: from the running torque × service factor up to the allowable torque,
 * the smallest over the pieces between the limiter and the stop of the torque at which the stress
 * with kt reaches shear yield, divided by N.
 */
export function torqueLimiter(c: Case, r: Results, running: RunningTorque | undefined, designFactor: number, serviceFactor: number): LimiterOption {
  const chosen = c.analysis.limiterAt;
  const station = chosen ?? r.governing.side.stations[r.governing.side.stations.length - 1];
  const stop = c.stations.find((s) => s.name === c.stop.at)!;
  const at = c.stations.find((s) => s.name === station)!;
  const side: SideName = at.at < stop.at ? 'A' : 'B';
  const placement = chosen
    ? `at "${station}", as the case's analysis.limiter_at says`
    : `at "${station}", the loaded station farthest from the stop on the governing side ${side} (between that side's driving parts and the shaft), so the whole run of shaft from there to the stop is protected`;

  const weakest = weakestPiece(runToStop(c, station))!;
  const max = weakest.yieldTorque / designFactor;
  const min = running ? running.torque * serviceFactor : undefined;
  const place = { station, side };
  const sideResult = r.sides.find((s) => s.side === side)!;
  const unlimitedStations = sideResult.stations.filter((name) => {
    const s = c.stations.find((x) => x.name === name)!;
    return Math.abs(s.at - stop.at) < Math.abs(at.at - stop.at) - 1e-9;
  });
  const otherSides = r.sides.filter((s) => s.side !== side).map((s) => ({ side: s.side, yieldRatio: Math.max(...s.pieces.map((p) => p.yieldRatio)) }));

  const slip = limiterSlip(r, place, max);
  const energyYieldRatio = limitedYieldRatio(c, sideResult, station, slip.peakTorque);
  const yieldRatio = slip.yieldRatio ?? energyYieldRatio;
  // Settings spaced evenly on a log scale, from well below the window to past the unlimited peak.
  const low = Math.min(max, min ?? max) / 6;
  const top = Math.max(sideResult.peakTorque, max, min ?? 0) * 1.3;
  // The sweep is the energy method's (a dynamic rerun at each of its points would be too slow).
  const sweep = Array.from({ length: SWEEP_POINTS + 1 }, (_, i) => limiterSlip(r, place, low * (top / low) ** (i / SWEEP_POINTS), true));
  return {
    station,
    side,
    placement,
    runningTorque: running,
    serviceFactor,
    designFactor,
    min,
    max,
    weakest,
    windowEmpty: min !== undefined && min > max,
    slip,
    yieldRatio,
    unlimitedStations,
    otherSides,
    sweep,
  };
}

/**
 * The energy method's highest stress / shear yield on a side with a limiter at `station` holding
 * the run from there to the stop to `heldTorque`: the pieces of that run scale with the held
 * torque, any others keep the incident's.
 */
export function limitedYieldRatio(c: Case, side: SideResult, station: string, heldTorque: number): number {
  const stop = c.stations.find((s) => s.name === c.stop.at)!;
  const reach = Math.abs(c.stations.find((s) => s.name === station)!.at - stop.at) + 1e-9;
  return Math.max(
    ...side.pieces.map((p) => {
      const inRun = Math.max(Math.abs(p.piece.start - stop.at), Math.abs(p.piece.end - stop.at)) <= reach;
      return inRun ? (p.yieldRatio * heldTorque) / side.peakTorque : p.yieldRatio;
    }),
  );
}
