import type { Case } from '../case/case.ts';
import type { SideName } from '../model/shaft-model.ts';
import { stopWaveTorque } from '../physics/stop-wave.ts';
import { designRun } from './design-run.ts';
import type { DynamicPiece } from '../results/dynamic-result.ts';
import type { Results } from '../results/results.ts';
import { limiterPlace, withLimiter } from './limiter-segment.ts';

/** What the dynamic model says a limiter does in a repeat incident of the changed case. */
export interface DynamicLimiterSlip {
  /** Index into the case's `shaft.segments` of the segment the limiter was put in (cut at its station where the station lies inside it). */
  segment: number;
  /** The ends of the piece of that segment that holds the limiter in the rerun, m. */
  from: number;
  to: number;
  /** The case already had a limiter on that run, and the option resets it there. */
  existing: boolean;
  peakTorque: number;
  slipEnergy: number;
  slipAngle: number;
  /** Energy left in the model (kinetic and elastic) at the end of the simulated window, J. */
  energyLeft: number;
  /** Energy the model's damping took, J. */
  dampingWork: number;
  /** Highest stress / shear yield of the limited side in the rerun. */
  yieldRatio: number;
  /** The rerun's result. */
  rerun: Results;
  /** Where the stop is instantaneous and the peak stands well above the setting: the stop's own stress wave in the piece that carries the peak (see `stopWaveAbove`). */
  stopWave?: StopWave;
}

/** The torsional stress wave of an instantaneous stop in one piece of shaft. */
export interface StopWave {
  /** ω·J_p·√(G·ρ), N·m. */
  torque: number;
  /** The piece, in words: '"rotor body"' or 'segment 4'. */
  piece: string;
}

/** A peak above the setting by more than this share is explained by the stop's wave, where the stop is instantaneous. */
const ABOVE_SETTING = 0.1;

/**
 * The limiter put into the case as a slip element (`slip_torque` on the piece of shaft beside its
 * station that `limiterPlace` cuts) and the changed case rerun through the engine; the slip energy and angle
 * are those of that element in `results.dynamic.slips`, the peak torque the dynamic model's largest
 * over the pieces from the limiter's station to the stop. Undefined when no segment can hold it.
 */
export function dynamicLimiterSlip(c: Case, station: string, side: SideName, setting: number): DynamicLimiterSlip | undefined {
  const place = limiterPlace(c, station);
  if (!place) return undefined;
  const rerun = designRun(withLimiter(place.case, place.segment, setting));
  const d = rerun.dynamic;
  const seg = place.case.shaft.segments[place.segment];
  const name = seg.label ? `"${seg.label}"` : `segment ${seg.index + 1}`;
  const slip = d.slips.find((s) => s.kind === 'torque limiter' && s.element === `the torque limiter in ${name}`);
  if (!slip) return undefined;
  const stop = c.stations.find((s) => s.name === c.stop.at)!.at;
  const reach = Math.abs(c.stations.find((s) => s.name === station)!.at - stop) + 1e-9;
  const run = d.pieces.filter((p) => p.side === side && Math.max(Math.abs(p.piece.start - stop), Math.abs(p.piece.end - stop)) <= reach);
  const peakTorque = Math.max(0, ...run.map((p) => p.peakTorque));
  const wave = stopWaveAbove(c, run, setting, peakTorque);
  return {
    segment: place.original.index,
    from: place.start,
    to: place.end,
    existing: place.existing,
    peakTorque,
    slipEnergy: slip.energy,
    slipAngle: slip.angle,
    energyLeft: d.energy.final,
    dampingWork: d.energy.dampingWork,
    yieldRatio: d.sides.find((s) => s.side === side)?.dynamicYieldRatio ?? d.yieldRatio,
    rerun,
    ...(wave ? { stopWave: wave } : {}),
  };
}

/**
 * Why the run between a slipping limiter and the stop can peak far above the setting: an
 * instantaneous stop sends its stress wave, ω·J_p·√(G·ρ) on top of the running torque, into the
 * shaft next to the stop at once, before the limiter farther along feels anything (the wave needs
 * the run's length over √(G/ρ) to reach it), so no limiter cuts it. Given for the piece that carries
 * the peak, where the stop is instantaneous, the peak exceeds the setting by more than 10 % and the
 * shaft's density is known (without it the model leaves the shaft's inertia, and the wave, out).
 */
function stopWaveAbove(c: Case, run: readonly DynamicPiece[], setting: number, peakTorque: number): StopWave | undefined {
  if (c.stop.duration > 0 || peakTorque <= (1 + ABOVE_SETTING) * setting || run.length === 0) return undefined;
  const top = run.reduce((best, p) => (p.peakTorque > best.peakTorque ? p : best));
  const seg = top.piece.segment;
  const m = c.materials[seg.material];
  if (m.density === undefined || m.shearModulus === undefined) return undefined;
  return { torque: stopWaveTorque(c.speed, m.shearModulus, m.density, seg.diameter, seg.bore), piece: seg.label ? `"${seg.label}"` : `segment ${seg.index + 1}` };
}
