import type { Case, Segment } from '../case/case.ts';
import type { Investigation } from '../finding/investigation.ts';
import { materialFamily } from '../materials/material-family.ts';
import type { Material } from '../materials/material.ts';
import type { SideName } from '../model/shaft-model.ts';
import { verdictShearStrength } from '../physics/shear-strength.ts';
import type { RunningTorque } from '../results/running-torque.ts';
import { withDiameters, withShaftMaterial } from './change-case.ts';
import { energyCheck } from './design-run.ts';
import { fuseOrder, type FuseOrder } from './fuse-order.ts';
import { limitersSlip, type LimiterSlip } from './limiter-slip.ts';
import type { MaterialOption } from './other-materials.ts';
import { runningCheck, type RunningCheck } from './running-check.ts';
import { runToStop, weakestPiece, type RunPiece } from './shaft-run.ts';
import { sideYieldRatio } from './side-ratio.ts';
import { stockSizeUp } from './stock-sizes.ts';
import { limitedYieldRatio, type LimiterOption } from './torque-limiter.ts';

/**
 * A combined option, what an engineer tries where no single option passes: a torque limiter set at
 * a stated torque (one on each side of the stop that needs one), on
 * - `limiter_setting`: the present sizes and material (a like-for-like shaft), the setting inside
 *   the window rather than at its top, so that the peak a sudden stop carries above the setting
 *   still keeps the factor;
 * - `limiter_material`: a stronger material of the present shaft's family on the same drawing,
 *   where the present shaft cannot carry the setting with its overshoot (or no setting both runs
 *   the machine and protects it);
 * - `limiter_segments`: the present material, the pieces of the limited run that cannot carry it
 *   made larger (each segment to a stock size, its bore ratio kept).
 * A stronger shaft alone or a limiter alone is already a single option; a key or a shear pin as the
 * fuse is not combined, since a key is no dependable fuse and a pin that parts leaves the stop's
 * own stress wave, which no device in the drive line cuts, as it is.
 */
export type CombinedId = 'limiter_setting' | 'limiter_material' | 'limiter_segments';

/** One limiter of a combined option: where it sits, its stated setting and what it does in a repeat. */
export interface SetLimiter {
  station: string;
  side: SideName;
  /** The stated setting, N·m. */
  setting: number;
  /** How the setting was chosen: the window's middle, its top, or its bottom. */
  settingRule: 'middle of the window' | 'top of the window' | 'lowest that runs the machine';
  /** The setting is the present shaft's (its window's middle or top), kept on a stronger shaft for margin. */
  presentWindow: boolean;
  /** Lowest setting that runs the machine (running torque × service factor), N·m; undefined where unknown or no drive torque passes this side. */
  min?: number;
  /** Highest setting the option's shaft allows (its weakest piece's yield torque with kt over N), N·m. */
  max: number;
  /** The option's weakest piece on the run from the limiter to the stop. */
  weakest: RunPiece;
  slip: LimiterSlip;
  /** The side's highest stress / shear yield in a repeat of the incident. */
  yieldRatio: number;
  /** Stations between the limiter and the stop whose parts still drive the shaft unlimited. */
  unlimitedStations: string[];
  /** What gives way in what order behind it, and what must be stronger. */
  fuses: FuseOrder;
}

/** A segment made larger for a combined option. */
export interface GrownSegment {
  segment: Segment;
  /** Diameter the run needs, m, and the stock size it is rounded up to. */
  diameter: number;
  stockDiameter: number;
  /** stockDiameter over the present diameter. */
  growth: number;
}

export interface CombinedOption {
  option: CombinedId;
  /** The stronger material (`limiter_material`). */
  material?: Material;
  /** The segments made larger (`limiter_segments`); empty otherwise. */
  segments: GrownSegment[];
  limiters: SetLimiter[];
  /** The energy method's check of the option's shaft without the limiters (its peak torques unlimited). */
  check: EnergyCheck;
  /** The highest stress / shear yield over every side in a repeat of the incident. */
  yieldRatio: number;
  /** Sides of the stop no limiter of the option protects, with their stress / shear yield on its shaft. */
  otherSides: { side: SideName; yieldRatio: number }[];
  running: RunningCheck;
}

/** The energy method's check of a changed case (`energyCheck`). */
export type EnergyCheck = ReturnType<typeof energyCheck>;

/** Relative slack on "keeps the factor", as in option-flags.ts. */
const SLACK = 1e-9;

/** What the combined options are built from: the case, its check, the single limiter and materials, the factors. */
export interface CombinedInputs {
  c: Case;
  results: Investigation;
  running: RunningTorque | undefined;
  designFactor: number;
  serviceFactor: number;
  limiter: LimiterOption;
  materials: readonly MaterialOption[];
}

/**
 * The combined options, checked as the single ones are: each changed case (its shaft with the
 * limiters put in) by the energy method, or where the verdict stands on the dynamic model by one
 * time integration with the limiters as slip elements (the limiter's slip needs its time history;
 * nothing else is integrated); the running torque by `runningCheck`. `limiter_setting` is made
 * where it differs from the single limiter; the two with a stronger shaft only where the single
 * limiter and `limiter_setting` both fail the factor, since they change more, and the larger
 * segments only where the stronger material fails too (the pick's order of change). Pure.
 */
export function combinedOptions(x: CombinedInputs): CombinedOption[] {
  const { c, designFactor: N, limiter: single } = x;
  const places = limiterPlaces(x);
  const out: CombinedOption[] = [];

  // The present shaft with each limiter at the middle of its window.
  const windows = places.map((p) => windowOf(x, c, p.station, p.side));
  const atSetting = windows.every((w) => w.min === undefined || w.min <= w.max) ? windows.map((w) => stated(w)) : undefined;
  const differs = atSetting && (atSetting.length > 1 || Math.abs(atSetting[0].setting - single.max) > 1e-9 * single.max);
  const present = atSetting && differs ? build(x, 'limiter_setting', c, places, atSetting) : undefined;
  if (present) out.push(present);
  const passes = (o: { yieldRatio: number } | undefined) => o !== undefined && o.yieldRatio * N <= 1 + SLACK;
  if (passes(single) || passes(present)) return out;

  // The settings a stronger shaft must carry, with the overshoot above the setting the last rerun showed.
  // The last rerun of each limiter: this option's where it was made, else the single limiter's (other sides: none yet).
  const last: { setting: number; settingRule: SetLimiter['settingRule']; yieldRatio?: number }[] = present?.limiters ?? [
    { setting: single.max, settingRule: 'top of the window', yieldRatio: single.yieldRatio },
    ...windows.slice(1).map((w) => stated(w)),
  ];
  const settings = last.map((l, i) => {
    const w = windows[i];
    const empty = w.min !== undefined && w.min > w.max;
    // Overshoot: the side's peak at its weakest piece over the setting in that rerun (the weakest piece's ratio × N × max / setting).
    const overshoot = l.yieldRatio !== undefined ? Math.max(1, (l.yieldRatio * N * w.max) / l.setting) : 1;
    const setting = empty ? w.min! : l.setting;
    return { setting, settingRule: empty ? ('lowest that runs the machine' as const) : l.settingRule, needed: N * setting * overshoot };
  });
  const run = places.flatMap((p, i) => runToStop(c, p.station).map((piece) => ({ piece, needed: settings[i].needed })));
  const strength = Math.max(...run.map((r) => r.needed / r.piece.yieldTorque));
  if (!(strength > 1)) return out;

  const families = new Set(c.shaft.segments.map((g) => materialFamily(c.materials[g.material])));
  const tau = (m: Material) => verdictShearStrength(m, c.analysis.criterion);
  const stronger = x.materials
    .map((m) => m.material)
    .filter((m) => families.has(materialFamily(m)))
    .sort((a, b) => tau(a) - tau(b));
  const enough = (m: Material) => run.every((r) => (r.piece.yieldTorque * tau(m)) / r.piece.shearYield >= r.needed * (1 - 1e-12));
  const material = stronger.find(enough) ?? stronger[stronger.length - 1];
  if (material && tau(material) > Math.min(...run.map((r) => r.piece.shearYield))) {
    const mc = withShaftMaterial(c, material);
    out.push({ ...build(x, 'limiter_material', mc, places, settings), material });
  }

  const grow = new Map<number, number>();
  for (const r of run) {
    if (r.piece.yieldTorque >= r.needed) continue;
    const seg = r.piece.piece.segment;
    // Yield torque goes as d³ with the bore ratio kept (J_p/c).
    grow.set(seg.index, Math.max(grow.get(seg.index) ?? 1, Math.cbrt(r.needed / r.piece.yieldTorque)));
  }
  const segments = [...grow].map(([i, g]) => {
    const segment = c.shaft.segments.find((g) => g.index === i)!;
    const diameter = segment.diameter * g;
    const stockDiameter = stockSizeUp(diameter, c.units);
    return { segment, diameter, stockDiameter, growth: stockDiameter / segment.diameter };
  });
  if (out.some((o) => o.option === 'limiter_material' && passes(o))) return out;
  const gc = withDiameters(c, new Map(segments.map((s) => [s.segment.index, s.stockDiameter])));
  out.push({ ...build(x, 'limiter_segments', gc, places, settings), segments });
  return out;
}

/** The limiters' places: the single option's, and the farthest loaded station of each other side left past the factor. */
function limiterPlaces(x: CombinedInputs): { station: string; side: SideName }[] {
  const { c, results, designFactor: N, limiter } = x;
  const stop = c.stations.find((s) => s.name === c.stop.at)!;
  const others = results.sides
    .filter((s) => s.side !== limiter.side && sideYieldRatio(results, s.side) * N > 1 + SLACK)
    .flatMap((s) => {
      const far = s.stations
        .map((n) => c.stations.find((st) => st.name === n)!)
        .filter((st) => st.name !== stop.name && Math.abs(st.at - stop.at) > 1e-9)
        .sort((a, b) => Math.abs(b.at - stop.at) - Math.abs(a.at - stop.at))[0];
      return far ? [{ station: far.name, side: s.side }] : [];
    });
  return [{ station: limiter.station, side: limiter.side }, ...others];
}

interface Window {
  station: string;
  side: SideName;
  min?: number;
  max: number;
  weakest: RunPiece;
}

/** A limiter's window on a shaft: from the running torque × service factor (where the drive's torque passes it) to its run's allowable torque. */
function windowOf(x: CombinedInputs, c: Case, station: string, side: SideName): Window {
  const weakest = weakestPiece(runToStop(c, station))!;
  const stop = c.stations.find((s) => s.name === c.stop.at)!.at;
  const drive = x.running && c.stations.find((s) => s.name === x.running!.station)!.at;
  const drivesThrough = drive !== undefined && drive < stop === c.stations.find((s) => s.name === station)!.at < stop;
  return { station, side, min: x.running && drivesThrough ? x.running.torque * x.serviceFactor : undefined, max: weakest.yieldTorque / x.designFactor, weakest };
}

/** The stated setting in a window: its middle on a log scale, √(min·max), where both ends are known; else its top. */
function stated(w: Window): { setting: number; settingRule: SetLimiter['settingRule'] } {
  return w.min !== undefined ? { setting: Math.sqrt(w.min * w.max), settingRule: 'middle of the window' } : { setting: w.max, settingRule: 'top of the window' };
}

/** A combined option checked: its shaft by the energy method, its limiters' slip, its running check. */
function build(
  x: CombinedInputs,
  option: CombinedId,
  changed: Case,
  places: readonly { station: string; side: SideName }[],
  settings: readonly { setting: number; settingRule: SetLimiter['settingRule'] }[],
): CombinedOption {
  const check = energyCheck(changed);
  const basis = { case: changed, sides: check.sides, verdictBasis: x.results.verdictBasis };
  const unchangedShaft = changed.shaft === x.c.shaft;
  const slips = limitersSlip(
    basis,
    places.map((p, i) => ({ ...p, setting: settings[i].setting })),
    (side) => (unchangedShaft ? x.results.dynamic.sides.find((s) => s.side === side)?.dynamicPeakTorque : undefined),
  );
  const stop = changed.stations.find((s) => s.name === changed.stop.at)!;
  const limiters = places.map((p, i): SetLimiter => {
    const w = windowOf(x, changed, p.station, p.side);
    const side = check.sides.find((s) => s.side === p.side)!;
    const slip = slips[i];
    const at = changed.stations.find((s) => s.name === p.station)!;
    return {
      ...p,
      setting: settings[i].setting,
      settingRule: settings[i].settingRule,
      presentWindow: changed.shaft !== x.c.shaft && settings[i].settingRule !== 'lowest that runs the machine',
      min: w.min,
      max: w.max,
      weakest: w.weakest,
      slip,
      yieldRatio: slip.yieldRatio ?? limitedYieldRatio(changed, side, p.station, slip.peakTorque),
      unlimitedStations: side.stations.filter((name) => {
        const s = changed.stations.find((st) => st.name === name)!;
        return Math.abs(s.at - stop.at) < Math.abs(at.at - stop.at) - 1e-9;
      }),
      fuses: fuseOrder(x.c, changed, x.results.finding, p.station, slip, x.designFactor),
    };
  });
  const limited = new Set(places.map((p) => p.side));
  const otherSides = check.sides.filter((s) => !limited.has(s.side)).map((s) => ({ side: s.side, yieldRatio: sideYieldRatio(check, s.side) }));
  return {
    option,
    segments: [],
    limiters,
    check,
    yieldRatio: Math.max(...limiters.map((l) => l.yieldRatio), ...otherSides.map((s) => s.yieldRatio)),
    otherSides,
    running: runningCheck(changed, x.running, x.designFactor),
  };
}
