import type { Case, TwistMeasurement } from '../case/case.ts';
import type { Side } from '../model/shaft-model.ts';
import { energyAtSpeed, onsetSpeed, permanentTwistAtSpeed, speedForPermanentTwist, type ReadBackSide } from '../physics/read-back.ts';
import type { SideBalance } from './side-balance.ts';

/** Band on the recorded speed used when the case states none: ±10 %. */
export const DEFAULT_SPEED_BAND = 0.1;
/** Points of the speed → permanent-twist curve kept for the figure. */
const CURVE_POINTS = 48;
const EPS = 1e-9;

/**
 * consistent: the measured twist fits the recorded speed within its band; more / less: it needs a
 * higher / lower speed than the band allows; no_loaded_shaft: no shaft between the stations
 * carries torque in the model; unexplained: no speed leaves that much twist there.
 */
export type TwistFindingCode = 'consistent' | 'more' | 'less' | 'no_loaded_shaft' | 'unexplained';

/** The band on the recorded speed a finding is judged against, rad/s. */
export interface SpeedBand {
  low: number;
  high: number;
  /**
   * `case`: the ± stated on `speed` in the case; `default`: DEFAULT_SPEED_BAND, stated as a default;
   * `monte-carlo`: the band is still the recorded speed's (the case's or the default), and the finding
   * was judged by whether the interval of speeds that explain the measured twist over the case's
   * tolerances meets it (see `judgeByInterval`).
   */
  basis: 'case' | 'default' | 'monte-carlo';
}

/** A measured permanent twist read back to the incident. */
export interface TwistFinding {
  measurement: TwistMeasurement;
  /** Which model the prediction and the read-back come from. */
  model: TwistRelation['model'];
  /** ± band stated on the measured angle, rad; 0 when none. */
  angleTolerance: number;
  /** Permanent twist between the stations predicted at the recorded speed, rad. */
  predicted: number;
  recordedSpeed: number;
  band: SpeedBand;
  /** Speed at the stop that leaves exactly the measured twist, rad/s (for a zero twist: the most speed that leaves none). */
  speedForMeasured: number | undefined;
  /** Speeds for the measured angle minus and plus its tolerance, rad/s (upper undefined when no speed reaches it). */
  speedRange: [number | undefined, number | undefined];
  /** Kinetic energy at `speedForMeasured` of the sides loading the stations, J. */
  energyForMeasured: number | undefined;
  /** Highest speed at the stop that leaves no permanent twist between the stations, rad/s; Infinity when their pieces never yield (a weaker piece elsewhere shields them). */
  yieldOnsetSpeed: number;
  /** At `speedForMeasured` the model predicts fracture (the twist is past the fracture estimate). */
  beyondFracture: boolean;
  finding: TwistFindingCode;
  /** How the strengths of the shaft between the stations were stated (the words of `meaning` follow it). */
  strengthBasis: StrengthBasis;
  /** What the finding usually means, in plain words (no numbers: the views add them in the case's units). */
  meaning: string;
  /**
   * The speed → permanent-twist relation between the stations, for the figure. Built when first
   * read (through the dynamic model each point is a rerun, and only the report draws it); empty
   * where no loaded shaft lies between the stations.
   */
  readonly curve: { speed: number; permanentTwist: number }[];
  /** Whether loaded shaft lies between the stations (the curve has points), known without building the curve. */
  loadedShaft: boolean;
}

const MEANINGS: Record<TwistFindingCode, string> = {
  consistent: 'The measured twist agrees with the recorded speed within the stated band.',
  more: 'The shaft took more energy than the recorded speed gives: the speed may have been higher than recorded, the drive may have kept pushing through the jam (its torque is not in the energy balance), the shaft may already have been twisted in an earlier event, or the material is weaker than the value used.',
  less: 'The shaft took less energy than the recorded speed gives: energy was taken elsewhere (belt slip, a torque limiter or shear pin, a hub or key slipping, the jam giving way), or the bar is stronger than {strength}.',
  no_loaded_shaft:
    'No shaft between these stations carries torque in the model (it lies outside every loaded run), so no permanent twist is predicted there; a measured offset points to slip at a fit, a load path the case does not describe, or an earlier event.',
  unexplained:
    'No speed leaves this much twist between these stations: a weaker piece elsewhere yields first and shields them (or they never yield). Check the measurement, the stations, and for slip at a fit.',
};

/** Where the dynamic model, which follows the drive, the slip and the breaks in time, says otherwise. */
const DYNAMIC_MEANINGS: Partial<Record<TwistFindingCode, string>> = {
  more: 'The shaft took more energy than the recorded speed gives: the speed may have been higher than recorded, the drive may have pushed harder or longer than the case describes, the shaft may already have been twisted in an earlier event, or the material is weaker than the value used.',
  less: 'The shaft took less energy than the recorded speed gives, even with the slip and the drive the case describes followed in time: energy was taken somewhere the case does not describe (a hub or key slipping, the jam giving way, a belt or limiter slipping sooner than stated), or the bar is stronger than {strength}.',
};

/**
 * How the strength the finding used was stated, for the sentence that says the bar may be
 * stronger: the materials' own `strengthBasis` (a published minimum, which a real bar usually
 * exceeds; a typical value, a mean that a given bar may exceed or fall short of), or the case's.
 */
const STRENGTH_WORDS: Record<StrengthBasis, string> = {
  minimum: 'the published minimum strength used, as a real bar usually is',
  typical: 'the typical (mean) strength used: a given bar may be stronger or weaker than the mean',
  case: 'the strength given in the case',
  mixed: 'the strengths used (published minima for some materials, typical means or values given in the case for others)',
};

/** The basis of the strengths of the shaft between two stations (see `STRENGTH_WORDS`). */
export type StrengthBasis = 'minimum' | 'typical' | 'case' | 'mixed';

function meaningOf(finding: TwistFindingCode, model: TwistRelation['model'], strength: StrengthBasis): string {
  const text = (model === 'dynamic model' ? DYNAMIC_MEANINGS[finding] : undefined) ?? MEANINGS[finding];
  return text.replace('{strength}', STRENGTH_WORDS[strength]);
}

/** The strength basis of the materials of the segments between x1 and x2 (m along the shaft). */
function strengthBasisBetween(c: Case, x1: number, x2: number): StrengthBasis {
  const bases = new Set<StrengthBasis>();
  for (const seg of c.shaft.segments) {
    if (Math.min(seg.end, x2) - Math.max(seg.start, x1) <= EPS) continue;
    bases.add(c.materials[seg.material].strengthBasis ?? 'case');
  }
  return bases.size === 1 ? [...bases][0] : bases.size === 0 ? 'case' : 'mixed';
}

/** A twist no speed leaves because the model breaks the shaft before the stations are twisted that far. */
const PAST_FRACTURE =
  'No speed leaves this much twist between these stations: the dynamic model breaks the shaft first (the measured twist is past the fracture estimate, or another piece breaks and unloads them). Check the measurement, the fracture strain and the stations, and for slip at a fit.';

/**
 * The speed at the stop → permanent twist between two stations, as one model gives it: the energy
 * balance past yield (`balanceTwistRelation`) or the dynamic model (`dynamicTwistRelation`).
 */
export interface TwistRelation {
  model: 'energy balance' | 'dynamic model';
  /** Permanent twist between the stations after a stop from speed ω, rad. */
  permanentAt(speed: number): number;
  /** The speed that leaves exactly `twist`, rad/s; for a zero twist the onset speed; undefined when no speed does. */
  speedFor(twist: number): number | undefined;
  /** Where `speedFor(twist)` finds no speed: whether that is because the model breaks the shaft before the stations are left with that much. */
  breaksBefore(twist: number): boolean;
  /** Highest speed that leaves no permanent twist between the stations, rad/s; Infinity when none ever does. */
  onset(): number;
  /** Kinetic energy at speed ω of what loads the stations, J. */
  energyAt(speed: number): number;
  /** Whether the model predicts fracture after a stop from speed ω. */
  breaksAt(speed: number): boolean;
  /** The curve's widest step in speed is its top speed over this. */
  curvePoints: number;
  /** Speeds the relation has already been evaluated at (a costly model's runs), which the curve takes before adding its own. */
  knownSpeeds?(): number[];
}

/**
 * The speeds of the figure's curve, up to `top`: every speed in `must` and `known` (points already
 * paid for) in range, and evenly spaced points added wherever two neighbours lie more than
 * top/points apart above the onset. From standstill to the onset the twist is none, so no points
 * are added there. For a model whose every point is a full run this puts the curve through the
 * runs its read-back already made and adds only what the gaps need.
 */
export function curveSpeeds(top: number, points: number, onset: number, must: readonly number[], known: readonly number[]): number[] {
  const step = top / points;
  const base = [...new Set([0, top, ...must, ...known, ...(Number.isFinite(onset) && onset < top ? [onset] : [])].filter((w) => w >= 0 && w <= top))].sort((a, b) => a - b);
  const out: number[] = [];
  base.forEach((w, i) => {
    if (i > 0) {
      const from = base[i - 1];
      const gap = w - from;
      if (w > onset && gap > step * (1 + 1e-9)) {
        const k = Math.ceil(gap / step - 1e-9);
        for (let j = 1; j < k; j++) out.push(from + (gap * j) / k);
      }
    }
    out.push(w);
  });
  return out;
}

/**
 * Reads every measured permanent twist back to the speed and energy of the stop. `relation` gives
 * the model's speed → permanent-twist relation between two positions, or undefined when no shaft
 * between them carries torque.
 */
export function readTwistBack(c: Case, relation: (x1: number, x2: number) => TwistRelation | undefined): TwistFinding[] {
  const band = speedBand(c);
  return c.observed.permanentTwist.map((m, k) => {
    const at = m.between.map((name) => c.stations.find((s) => s.name === name)!.at);
    const rel = relation(Math.min(...at), Math.max(...at));
    const tol = angleTolerance(c, k, m.angle);
    const strengthBasis = strengthBasisBetween(c, Math.min(...at), Math.max(...at));
    const base = { measurement: m, angleTolerance: tol, recordedSpeed: c.speed, band, strengthBasis };
    if (!rel) {
      const finding: TwistFindingCode = m.angle - tol <= 0 ? 'consistent' : 'no_loaded_shaft';
      return {
        ...base,
        model: 'energy balance' as const,
        predicted: 0,
        yieldOnsetSpeed: Infinity,
        speedForMeasured: undefined,
        speedRange: [undefined, undefined] as [undefined, undefined],
        energyForMeasured: undefined,
        beyondFracture: false,
        finding,
        meaning: finding === 'consistent' ? 'No twist is expected between these stations (no loaded shaft), and none beyond the measurement tolerance was measured.' : MEANINGS.no_loaded_shaft,
        curve: [],
        loadedShaft: false,
      };
    }
    const speed = rel.speedFor(m.angle);
    const low = m.angle - tol <= 0 ? 0 : rel.speedFor(m.angle - tol);
    const high = tol > 0 ? rel.speedFor(m.angle + tol) : speed;
    const onset = rel.onset();
    let finding: TwistFindingCode;
    if (speed === undefined && m.angle - tol > 0) finding = 'unexplained';
    else if (low !== undefined && low > band.high) finding = 'more';
    else if (high !== undefined && high < band.low) finding = 'less';
    else finding = 'consistent';
    const top = 1.3 * Math.max(c.speed, band.high, Number.isFinite(onset) ? onset : 0, speed ?? 0);
    let curve: TwistFinding['curve'] | undefined;
    return {
      ...base,
      loadedShaft: true,
      model: rel.model,
      predicted: rel.permanentAt(c.speed),
      yieldOnsetSpeed: onset,
      speedForMeasured: speed,
      speedRange: [low, high] as [number | undefined, number | undefined],
      energyForMeasured: speed === undefined ? undefined : rel.energyAt(speed),
      // A zero twist's speed is the most that leaves none: no twist to be past the fracture estimate.
      beyondFracture: speed !== undefined && m.angle > 0 && rel.breaksAt(speed),
      finding,
      meaning: finding === 'unexplained' && rel.breaksBefore(m.angle) ? PAST_FRACTURE : meaningOf(finding, rel.model, strengthBasis),
      get curve() {
        // Built where a figure reads it: the points the relation has not run yet cost a run each.
        curve ??= curveSpeeds(top, rel.curvePoints, onset, [c.speed, ...(speed === undefined ? [] : [speed])], rel.knownSpeeds?.() ?? []).map((w) => ({
          speed: w,
          permanentTwist: rel.permanentAt(w),
        }));
        return curve;
      },
    };
  });
}

/** The energy balance's relation between two positions: each side's energy ½·J·ω² into its run of shaft. */
export function balanceTwistRelation(sides: readonly Side[], balances: readonly SideBalance[], x1: number, x2: number): TwistRelation | undefined {
  const rb: ReadBackSide[] = sides.map((side, i) => ({
    balance: balances[i].balance,
    inertia: balances[i].inertia,
    between: side.pieces.flatMap((p, j) => (p.start >= x1 - EPS && p.end <= x2 + EPS ? [j] : [])),
  }));
  const involved = rb.filter((s) => s.between.length > 0);
  if (involved.length === 0) return undefined;
  return {
    model: 'energy balance',
    permanentAt: (w) => permanentTwistAtSpeed(involved, w),
    speedFor: (t) => speedForPermanentTwist(involved, t),
    onset: () => onsetSpeed(involved),
    energyAt: (w) => energyAtSpeed(involved, w),
    breaksAt: (w) => involved.some((s) => 0.5 * s.inertia * w ** 2 >= s.balance.fractureLimit().energy),
    // The balance carries on past the fracture estimate (`breaksAt` says so there): a twist it finds no speed for is shielded.
    breaksBefore: () => false,
    curvePoints: CURVE_POINTS,
  };
}

/** The case's ± on `speed`, or the default ±10 %. */
export function speedBand(c: Case): SpeedBand {
  const t = c.tolerances['speed'];
  if (!t) return { low: c.speed * (1 - DEFAULT_SPEED_BAND), high: c.speed * (1 + DEFAULT_SPEED_BAND), basis: 'default' };
  const half = t.kind === 'relative' ? t.fraction * c.speed : t.value;
  return { low: Math.max(0, c.speed - half), high: c.speed + half, basis: 'case' };
}

function angleTolerance(c: Case, index: number, angle: number): number {
  const t = c.tolerances[`observed.permanent_twist[${index}].angle`];
  if (!t) return 0;
  return t.kind === 'relative' ? t.fraction * angle : t.value;
}

/**
 * Re-judges a finding where the uncertainty run gives the 5–95 % interval of speeds that explain
 * the measured twist over every stated tolerance, by the same rule as `readTwistBack` with that
 * interval in place of the speeds for the measured angle ∓ its tolerance: consistent when the
 * interval meets the band on the recorded speed, `more` when it lies wholly above the band, `less`
 * when wholly below. The band stays the recorded speed's (the case's ± or the default), so a
 * measurement is judged against the same band with or without the Monte Carlo; only its basis says
 * that the interval judged it.
 */
export function judgeByInterval(f: TwistFinding, interval: [number, number] | null): TwistFinding {
  // The uncertainty run samples the energy balance; a finding read through the dynamic model keeps its own band.
  if (interval === null || f.model !== 'energy balance' || f.finding === 'no_loaded_shaft' || f.finding === 'unexplained') return f;
  const finding: TwistFindingCode = interval[0] > f.band.high ? 'more' : interval[1] < f.band.low ? 'less' : 'consistent';
  return { ...f, finding, meaning: meaningOf(finding, f.model, f.strengthBasis), speedRange: [interval[0], interval[1]], band: { low: f.band.low, high: f.band.high, basis: 'monte-carlo' } };
}
