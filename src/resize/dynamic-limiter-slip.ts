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
  /** The peak torque of each piece from the limiter to the stop in the rerun (ends in m, N·m). */
  runPeaks: RunPeak[];
  /** The rerun's result. */
  rerun: Results;
  /** Where the stop is instantaneous and the peak stands well above the setting: the stop's own stress wave in the piece that carries the peak (see `stopWaveAbove`). */
  stopWave?: StopWave;
}

/** A piece's peak torque in a rerun: its ends, m, and the peak, N·m. */
export interface RunPeak {
  start: number;
  end: number;
  peakTorque: number;
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
  return dynamicLimitersSlip(c, [{ station, side, setting }])?.[0];
}

/** A limiter to put into a case: its station, the side whose parts drive through it and its slip torque, N·m. */
export interface LimiterAt {
  station: string;
  side: SideName;
  setting: number;
}

/**
 * Several limiters (one a side of the stop, say) put into the case together, each as
 * `dynamicLimiterSlip` puts one, and the changed case rerun once: one time integration for all of
 * them, since each side's slip changes what the stop takes from the other. One result per limiter,
 * in the order given; undefined when a limiter's place cannot hold one.
 */
export function dynamicLimitersSlip(c: Case, limiters: readonly LimiterAt[]): DynamicLimiterSlip[] | undefined {
  let changed = c;
  const placed: { from: number; to: number; existing: boolean }[] = [];
  for (const l of limiters) {
    const place = limiterPlace(changed, l.station);
    if (!place) return undefined;
    changed = withLimiter(place.case, place.segment, l.setting);
    placed.push({ from: place.start, to: place.end, existing: place.existing });
  }
  const rerun = designRun(changed);
  const d = rerun.dynamic;
  const stop = c.stations.find((s) => s.name === c.stop.at)!.at;
  const nameAt = (from: number, to: number) => {
    const seg = changed.shaft.segments.find((g) => g.slipTorque !== undefined && Math.abs(g.start - from) <= 1e-9 && Math.abs(g.end - to) <= 1e-9)!;
    return seg.label ? `"${seg.label}"` : `segment ${seg.index + 1}`;
  };
  const out: DynamicLimiterSlip[] = [];
  for (const [i, l] of limiters.entries()) {
    const { from, to, existing } = placed[i];
    // Limiters in pieces of one segment share its name: they are told apart by their order along the shaft.
    const element = `the torque limiter in ${nameAt(from, to)}`;
    const rank = placed.filter((p) => nameAt(p.from, p.to) === nameAt(from, to) && p.from < from - 1e-9).length;
    const slip = d.slips.filter((s) => s.kind === 'torque limiter' && s.element === element).sort((a, b) => (a.elementIndex ?? 0) - (b.elementIndex ?? 0))[rank];
    if (!slip) return undefined;
    const reach = Math.abs(c.stations.find((s) => s.name === l.station)!.at - stop) + 1e-9;
    const run = d.pieces.filter((p) => p.side === l.side && Math.max(Math.abs(p.piece.start - stop), Math.abs(p.piece.end - stop)) <= reach);
    const peakTorque = Math.max(0, ...run.map((p) => p.peakTorque));
    const wave = stopWaveAbove(c, run, l.setting, peakTorque);
    out.push({
      segment: c.shaft.segments.find((g) => g.start <= from + 1e-9 && to <= g.end + 1e-9)!.index,
      from,
      to,
      existing,
      peakTorque,
      slipEnergy: slip.energy,
      slipAngle: slip.angle,
      energyLeft: d.energy.final,
      dampingWork: d.energy.dampingWork,
      yieldRatio: d.sides.find((s) => s.side === l.side)?.dynamicYieldRatio ?? d.yieldRatio,
      runPeaks: run.map((p) => ({ start: p.piece.start, end: p.piece.end, peakTorque: p.peakTorque })),
      rerun,
      ...(wave ? { stopWave: wave } : {}),
    });
  }
  return out;
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
