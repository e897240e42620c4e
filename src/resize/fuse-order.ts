import type { Case } from '../case/case.ts';
import type { Finding } from '../finding/finding.ts';
import type { DriveTrainKind } from '../results/drive-train.ts';
import type { LimiterSlip } from './limiter-slip.ts';
import { runToStop, weakestPiece } from './shaft-run.ts';

/** One element on a limited run, with the torque it gives way at as a multiple of the limiter's setting. */
export interface FuseStep {
  kind: DriveTrainKind;
  /** The element in words, as the finding's drive train names it ('the key at "drive sheave"'). */
  element: string;
  /** How it gives way, in words. */
  givesWayBy: string;
  /** N·m. */
  capacity: number;
  /** capacity / the limiter's setting. */
  multiple: number;
  /** The shaft segment it sits on is made larger by the option: its capacity is the present one's, to be sized again for the new seat. */
  seatChanged: boolean;
}

/** With a limiter at a setting: what gives way in what order, and what must be stronger. */
export interface FuseOrder {
  station: string;
  setting: number;
  /** The limiter's run from its station to the stop: the shaft's weakest piece and every key, fit and coupling on it, lowest capacity first. */
  steps: FuseStep[];
  /** Keys, fits and couplings whose capacity is below N × the repeat's peak torque through them: each needs at least `needed`, N·m. */
  uprate: (FuseStep & { needed: number })[];
}

const EPS = 1e-9;

/**
 * The drive train behind a limiter, as the remedy names it ("the limiter is the fuse at T; the key
 * at 1.9 T; the shaft at 2.2 T"): the elements the finding's drive train lists (src/results/drive-train.ts,
 * their capacities as checked there) that lie on the run from the limiter's station to the stop, and
 * the option's own shaft (its weakest piece on that run, kt applied, from the option's case). A key,
 * fit or coupling below N × the repeat's peak torque through it (the dynamic rerun's piece beside
 * it, else the run's peak) must be stronger ("fit a coupling of rating X"). Pure.
 */
export function fuseOrder(present: Case, option: Case, finding: Finding, station: string, slip: LimiterSlip, designFactor: number): FuseOrder {
  const setting = slip.setting;
  const stop = option.stations.find((s) => s.name === option.stop.at)!.at;
  const at = option.stations.find((s) => s.name === station)!.at;
  const lo = Math.min(at, stop) - EPS;
  const hi = Math.max(at, stop) + EPS;
  const segName = (g: { label?: string; index: number }) => (g.label ? `"${g.label}"` : `segment ${g.index + 1}`);
  // The diameter the shaft has at a hub, toward the stop (the torque's way), in a case.
  const seatDiameter = (c: Case, x: number) => {
    const probe = x + Math.sign(stop - x) * 1e-7;
    return c.shaft.segments.find((g) => g.start <= probe && probe <= g.end)?.diameter;
  };
  // The repeat's peak through a point of the run: the dynamic rerun's piece beside it on the stop's
  // side (its middle, for a coupling), else the run's peak (the energy method does not split a run).
  const through = (x: number) => {
    const p = slip.runPeaks?.find((r) => r.start - EPS <= x + Math.sign(stop - x) * 1e-7 && x + Math.sign(stop - x) * 1e-7 <= r.end + EPS);
    return p?.peakTorque ?? slip.peakTorque;
  };
  const steps: FuseStep[] = [];
  const uprate: FuseOrder['uprate'] = [];
  const weakest = weakestPiece(runToStop(option, station));
  if (weakest) {
    steps.push({
      kind: 'shaft',
      element: `the shaft in ${segName(weakest.piece.segment)}`,
      givesWayBy: 'yields (kt stress at shear yield)',
      capacity: weakest.yieldTorque,
      multiple: weakest.yieldTorque / setting,
      seatChanged: false,
    });
  }
  for (const e of finding.driveTrain) {
    if (e.kind !== 'key' && e.kind !== 'fit' && e.kind !== 'coupling') continue;
    const g = e.kind === 'coupling' ? present.shaft.segments.find((s) => segName(s) === e.where) : undefined;
    const x = e.kind === 'coupling' ? (g && g.start >= lo && g.end <= hi ? (g.start + g.end) / 2 : undefined) : present.stations.find((s) => s.name === e.where)?.at;
    if (x === undefined || x < lo || x > hi) continue;
    const seatChanged = e.kind !== 'coupling' && seatDiameter(present, x) !== seatDiameter(option, x);
    const needed = designFactor * through(x);
    steps.push({ kind: e.kind, element: e.element, givesWayBy: e.givesWayBy, capacity: e.capacity, multiple: e.capacity / setting, seatChanged });
    // A fit at the stop is the jam's own slip (src/results/fit-at-stop.ts): it caps what it carries, so it is not one to uprate.
    const jamSlip = e.kind === 'fit' && Math.abs(x - stop) <= EPS;
    if (!jamSlip && e.capacity < needed * (1 - 1e-12)) uprate.push({ ...steps[steps.length - 1], needed });
  }
  steps.sort((a, b) => a.capacity - b.capacity);
  return { station, setting, steps, uprate };
}
