import { parseQuantity } from '../units/quantity.ts';
import type { QuantityKind } from '../units/unit-table.ts';
import { formatPath, formatProblem, type SourcePosition } from './case-error.ts';
import type { Case, Part, Segment, Station } from './case.ts';
import { sourceValues, type SourceValue } from './source-position.ts';
import { isFractionWritten, swappedUnit, unitSystemOf } from './unit-swap.ts';

/**
 * Plausibility of a checked case: values that parse and are in range, but that are almost
 * certainly a typing or unit mistake (a 43 in diameter, `1 11/16 mm` in a US case). They run the
 * engine into nonsense (a break at 0 ms, a shaft with a hundred times its parts' energy), so they
 * are flagged before it runs; `--strict` makes them errors.
 *
 * The limits are deliberately loose: each one is a value no machine shaft of the kind this tool
 * investigates has, so a real incident, however violent, passes.
 */
export const PLAUSIBLE = {
  /** Thinnest segment diameter, m: below it no shaft carries a machine's parts. */
  minDiameter: 0.003,
  /** Thickest segment diameter, m: the largest rolling-mill and turbine-generator shafts stay below it. */
  maxDiameter: 2,
  /** A segment thicker than this many times the median of the shaft's other segments is a unit slip (25.4 between mm and in). */
  diameterStep: 10,
  /** Least bore-to-diameter gap, m (a wall of 0.25 mm). */
  minBoreGap: 0.0005,
  /**
   * Highest rim speed of any part or of the shaft's surface, m/s. A thin ring spinning at rim speed
   * v carries the hoop stress ρv² (the rotating ring, in any strength-of-materials text; from
   * memory): at 7850 kg/m³ and 500 m/s that is 2 GPa, about the tensile strength of the strongest
   * quenched-and-tempered alloy steels, so no steel ring survives it. Fans, flywheels, crushers
   * and grinding wheels run at some 20–200 m/s (common practice).
   */
  maxRimSpeed: 500,
  /** The shaft's own kinetic energy at most this many times its parts' (the engine warns from 5 %). */
  maxShaftEnergyRatio: 10,
} as const;

/** Standard gravity, m/s² (exact, NIST SP 811). */
const GRAVITY = 9.80665;

/** Stable codes of the plausibility warnings. */
export type InputWarningCode =
  | 'W_DIAMETER' // a segment diameter no shaft has, or far from the shaft's other segments
  | 'W_BORE' // a bore within 0.5 mm of its diameter
  | 'W_PART_MASS' // a part heavier than the shaft could hold up standing still
  | 'W_SPEED' // a speed at which a part's rim or the shaft's surface would burst
  | 'W_SHAFT_ENERGY' // the shaft's own kinetic energy many times the parts'
  | 'W_UNITS'; // a value typed in the other unit system, or an inch fraction with a metric unit

/** A value of a case file that is almost certainly a typing or unit mistake. */
export interface InputWarning {
  code: InputWarningCode;
  /** Field path as the user reads it: `shaft.segments[1].diameter`. */
  path: string;
  /** 1-based line and column of the value in the case file. */
  line: number;
  column: number;
  /** The value as written: `"43 in"`, without quotes. */
  value: string;
  /** What is wrong and what to do, without the position: `"43 in" is larger than …; did you mean "43 mm"?` */
  message: string;
  /** The value as it likely should be written, where one is clear (a unit swap that lands in the plausible range). */
  fix?: string;
}

/** `case.yaml:14:17 shaft.segments[1].diameter: "43 in" is larger than …` */
export function formatInputWarning(file: string, w: InputWarning): string {
  return formatProblem(file, { code: 'E_IMPLAUSIBLE', path: w.path, message: w.message, position: { line: w.line, column: w.column } });
}

type Path = (string | number)[];

/** One field's check: why a value (SI) is implausible, or undefined when it is plausible. */
interface FieldCheck {
  code: InputWarningCode;
  path: Path;
  kind: QuantityKind;
  judge: (value: number) => string | undefined;
  /** What to do when no unit swap fixes it. */
  advice: string;
  /** Whether a swapped value is a fix; default: the judge passes it. */
  fixes?: (value: number) => boolean;
  /** Warn only where a unit swap fixes the value. */
  onlyWithFix?: boolean;
}

/**
 * The plausibility warnings of a checked case, in the order of the file's fields. `text` is the
 * case file's text (for each value as written and its position). Pure. At most one warning per
 * field: the first check that finds it implausible.
 */
export function checkPlausibility(c: Case, text: string): InputWarning[] {
  if (c.shaft.segments.length === 0) return [];
  const source = sourceValues(text);
  const out: InputWarning[] = [];
  const run = (fc: FieldCheck): void => {
    const src = source.at(fc.path);
    if (!src || out.some((w) => w.path === formatPath(fc.path))) return;
    const why = fc.judge(parseQuantity(src.text, fc.kind).value);
    if (why === undefined) return;
    const w = warning(c, fc, src, why);
    if (w.fix !== undefined || !fc.onlyWithFix) out.push(w);
  };

  const segments = c.shaft.segments;
  const length = segments.at(-1)?.end ?? 0;
  for (const seg of segments) run(diameterCheck(c, seg, length));
  for (const seg of segments) {
    const step = stepCheck(c, seg, length);
    if (step) run(step);
  }
  for (const seg of segments) if (seg.bore > 0) run(boreCheck(c, ['shaft', 'segments', seg.index, 'bore'], seg.diameter));
  c.stations.forEach((st, i) =>
    st.parts.forEach((part, j) => {
      if (part.shape === 'disc' && part.dimensions.bore > 0) run(boreCheck(c, ['stations', i, 'parts', j, 'bore'], part.dimensions.diameter));
    }),
  );
  c.stations.forEach((st, i) =>
    st.parts.forEach((part, j) => {
      const check = partMassCheck(c, st, part, ['stations', i, 'parts', j]);
      if (check) run(check);
    }),
  );
  run(speedCheck(c));
  const energy = shaftEnergyCheck(c, length);
  if (energy) run(energy);
  for (const v of source.all()) {
    const fraction = fractionCheck(v);
    if (fraction && !out.some((w) => w.path === fraction.path)) out.push(fraction);
  }
  return out.sort((a, b) => a.line - b.line || a.column - b.column);
}

function warning(c: Case, fc: FieldCheck, src: SourceValue, why: string): InputWarning {
  const swap = swappedUnit(src.text, fc.kind);
  const fixes = fc.fixes ?? ((v: number) => fc.judge(v) === undefined);
  const fix = swap && fixes(swap.value) ? swap.text : undefined;
  const written = unitSystemOf(src.text);
  const foreign = fix !== undefined && written !== undefined && written !== c.units;
  const units = c.units === 'us' ? 'US' : 'metric';
  const message = `"${src.text}" ${why}${foreign ? `, and the case is in ${units} units` : ''}; ${fix ? `did you mean "${fix}"?` : fc.advice}`;
  return { code: foreign ? 'W_UNITS' : fc.code, ...where(fc.path, src.position), value: src.text, message, ...(fix ? { fix } : {}) };
}

function where(path: Path, p: SourcePosition): Pick<InputWarning, 'path' | 'line' | 'column'> {
  return { path: formatPath(path), line: p.line, column: p.column };
}

/** A segment diameter: 3 mm to 2 m and no larger than the whole shaft. */
function diameterCheck(c: Case, seg: Segment, length: number): FieldCheck {
  const show = (x: number) => showLength(x, c.units);
  return {
    code: 'W_DIAMETER',
    path: ['shaft', 'segments', seg.index, 'diameter'],
    kind: 'length',
    advice: 'check the value and its unit',
    judge: (d) => {
      if (d < PLAUSIBLE.minDiameter) return `is below ${showLimit(PLAUSIBLE.minDiameter, c.units)}, thinner than any shaft that carries a machine's parts`;
      if (d > PLAUSIBLE.maxDiameter) return `is above ${showLimit(PLAUSIBLE.maxDiameter, c.units)}, thicker than any machine shaft`;
      if (d > length) return `is larger than the shaft's whole length (${show(length)})`;
      return undefined;
    },
  };
}

/**
 * A segment more than ten times thicker (or thinner) than every other segment of the shaft, where
 * the same number in the other unit (mm for in) fits among them: a unit slip. Only with that fix:
 * from two segments alone the thick one and the thin one cannot be told apart otherwise.
 */
function stepCheck(c: Case, seg: Segment, length: number): FieldCheck | undefined {
  const others = c.shaft.segments.filter((s) => s !== seg).map((s) => s.diameter);
  if (others.length === 0) return undefined;
  const [lo, hi] = [Math.min(...others), Math.max(...others)];
  const range = diameterCheck(c, seg, length);
  const judge = (d: number): string | undefined => {
    const m = median(others)!;
    const show = (x: number) => showLength(x, c.units);
    const what = others.length === 1 ? `the shaft's other segment (${show(m)})` : `the shaft's other segments (median ${show(m)})`;
    if (d > PLAUSIBLE.diameterStep * hi) return `is ${round(d / m)} times ${what}`;
    if (d * PLAUSIBLE.diameterStep < lo) return `is 1/${round(m / d)} of ${what}`;
    return undefined;
  };
  return { ...range, judge, onlyWithFix: true, fixes: (d) => judge(d) === undefined && range.judge(d) === undefined };
}

/** A bore closer than 0.5 mm to its diameter: a wall no shaft or hub is made of. */
function boreCheck(c: Case, path: Path, diameter: number): FieldCheck {
  return {
    code: 'W_BORE',
    path,
    kind: 'length',
    advice: 'check the bore and the diameter (the bore is the inside diameter, not the wall); leave the bore out for a solid one',
    judge: (bore) =>
      diameter - bore < PLAUSIBLE.minBoreGap
        ? `leaves a wall of ${showLength((diameter - bore) / 2, c.units)} in a diameter of ${showLength(diameter, c.units)}, thinner than any tube a shaft or hub is made of`
        : undefined,
  };
}

/**
 * A part on the shaft (speed ratio 1, not a motor's rotor) heavier than the shaft could hold up
 * standing still: its weight alone, at the middle of a simply supported span of the shaft's whole
 * length, would bend the shaft's strongest segment in bending (the largest section modulus) past
 * its yield strength, σ = 32·M·D/(π(D⁴ − d⁴))
 * with M = W·L/4 (Shigley, beam tables; from memory). A real part is held nearer its bearings and
 * the shaft is sized for far more than its weight, so the rule only catches masses no such shaft
 * can have carried (a disc diameter in feet for inches).
 */
function partMassCheck(c: Case, st: Station, part: Part, path: Path): FieldCheck | undefined {
  const index = st.parts.indexOf(part);
  if (part.speedRatio !== 1 || st.drive?.rotorParts.includes(index) || (part.shape !== 'disc' && part.shape !== 'mass')) return undefined;
  const modulus = (s: Segment) => (s.diameter ** 4 - s.bore ** 4) / s.diameter;
  const stoutest = c.shaft.segments.reduce((a, b) => (modulus(b) > modulus(a) ? b : a));
  const length = c.shaft.segments.at(-1)!.end;
  const { diameter: D, bore: d } = stoutest;
  const sy = c.materials[stoutest.material].yieldStrength!;
  const stress = (mass: number) => {
    const moment = (mass * part.count * GRAVITY * length) / 4;
    return (32 * moment * D) / (Math.PI * (D ** 4 - d ** 4));
  };
  const why = (mass: number): string | undefined => {
    const s = stress(mass);
    if (s <= sy) return undefined;
    const many = part.count > 1 ? ` (${part.count} of them)` : '';
    return `makes the part weigh ${showMass(mass, c.units)}${many}, whose weight alone at mid-span of the whole shaft (${showLength(length, c.units)}) would bend its strongest segment in bending (${showLength(D, c.units)}) to ${showStress(s, c.units)}, past its yield strength of ${showStress(sy, c.units)}`;
  };
  const advice = 'check the value and its unit';
  if (part.shape === 'mass') return { code: 'W_PART_MASS', path: [...path, 'mass'], kind: 'mass', advice, judge: why };
  const { thickness: t, bore: b, density: rho } = part.dimensions;
  return {
    code: 'W_PART_MASS',
    path: [...path, 'diameter'],
    kind: 'length',
    advice: 'check the diameter, the thickness and their units',
    judge: (dia) => (dia <= b ? `is no larger than the part's bore (${showLength(b, c.units)})` : why((rho * Math.PI * (dia ** 2 - b ** 2) * t) / 4)),
  };
}

/** The speed: no part's rim, nor the shaft's surface, faster than `PLAUSIBLE.maxRimSpeed`. */
function speedCheck(c: Case): FieldCheck {
  const rims: { what: string; radius: number; ratio: number }[] = [];
  for (const st of c.stations) {
    for (const p of st.parts) {
      const radius = p.shape === 'disc' ? p.dimensions.diameter / 2 : p.shape === 'mass' ? p.dimensions.radius_of_gyration : 0;
      // A mass part's rim lies beyond its radius of gyration: the speed there is a lower bound.
      if (radius > 0) rims.push({ what: `the rim of "${p.name}" at "${st.name}"${p.shape === 'mass' ? ' (at its radius of gyration)' : ''}`, radius, ratio: p.speedRatio });
    }
  }
  const thickest = Math.max(...c.shaft.segments.map((s) => s.diameter));
  rims.push({ what: "the shaft's surface", radius: thickest / 2, ratio: 1 });
  return {
    code: 'W_SPEED',
    path: ['speed'],
    kind: 'angular_speed',
    advice: 'check the speed and its unit (rpm or rad/s), and the diameters',
    judge: (w) => {
      const fastest = rims.reduce((a, b) => (b.radius * b.ratio > a.radius * a.ratio ? b : a));
      const v = w * fastest.ratio * fastest.radius;
      if (v <= PLAUSIBLE.maxRimSpeed) return undefined;
      const limit = c.units === 'us' ? `${showSpeed(PLAUSIBLE.maxRimSpeed, 'us')} (${PLAUSIBLE.maxRimSpeed} m/s)` : showSpeed(PLAUSIBLE.maxRimSpeed, 'metric');
      return `gives ${fastest.what} a speed of ${showSpeed(v, c.units)}, beyond the ${limit} at which even a thin ring of the strongest steel bursts`;
    },
  };
}

/**
 * The shaft's own kinetic energy against the parts' (both at the incident speed, so the speed
 * cancels): Σ ρ·J_p·L over the segments against Σ J·count·ratio² over the parts away from the
 * stop. Pointed at the diameter of the segment that holds most of it. Undefined where a shaft
 * material has no density (the engine says so itself).
 */
function shaftEnergyCheck(c: Case, length: number): FieldCheck | undefined {
  const segments = c.shaft.segments;
  if (segments.some((s) => c.materials[s.material].density === undefined)) return undefined;
  const stopAt = c.stations.find((s) => s.name === c.stop.at)!.at;
  const parts = c.stations
    .filter((s) => Math.abs(s.at - stopAt) > 1e-9)
    .flatMap((s) => s.parts)
    .reduce((sum, p) => sum + p.inertia * p.count * p.speedRatio ** 2, 0);
  const own = (s: Segment, D = s.diameter) => c.materials[s.material].density! * (Math.PI / 32) * (D ** 4 - s.bore ** 4) * (s.end - s.start);
  const biggest = segments.reduce((a, b) => (own(b) > own(a) ? b : a));
  const rest = segments.filter((s) => s !== biggest).reduce((sum, s) => sum + own(s), 0);
  const diameter = diameterCheck(c, biggest, length);
  const judge = (D: number): string | undefined => {
    const ratio = (rest + own(biggest, D)) / parts;
    if (!(ratio > PLAUSIBLE.maxShaftEnergyRatio)) return undefined;
    const share = own(biggest, D) / (rest + own(biggest, D));
    return `makes the shaft's own kinetic energy ${round(ratio)} times its parts' (this segment holds ${Math.round(share * 100)} % of it), yet the parts are what drive a shaft into a stop`;
  };
  return {
    code: 'W_SHAFT_ENERGY',
    path: diameter.path,
    kind: 'length',
    advice: "check the shaft's diameters and lengths and their units, and that no rotating part is left out",
    judge,
    fixes: (D) => judge(D) === undefined && D > biggest.bore && diameter.judge(D) === undefined,
  };
}

/** A length written as an inch fraction with a metric unit (`1 11/16 mm`): an inch value, whatever the field. */
function fractionCheck(v: SourceValue): InputWarning | undefined {
  if (!isFractionWritten(v.text) || unitSystemOf(v.text) !== 'metric') return undefined;
  const swap = swappedUnit(v.text, 'length');
  if (!swap) return undefined;
  return { code: 'W_UNITS', ...where(v.path, v.position), value: v.text, message: `"${v.text}" is an inch fraction with a metric unit; did you mean "${swap.text}"?`, fix: swap.text };
}

function median(xs: readonly number[]): number | undefined {
  if (xs.length === 0) return undefined;
  const s = [...xs].sort((a, b) => a - b);
  const mid = Math.floor(s.length / 2);
  return s.length % 2 === 1 ? s[mid] : (s[mid - 1] + s[mid]) / 2;
}

/** Two significant figures, for ratios in words. */
function round(x: number): number {
  return Number(x.toPrecision(2));
}

function sig(x: number): string {
  return String(Number(x.toPrecision(3)));
}

function showLength(m: number, units: Case['units']): string {
  if (units === 'us') return m >= 10 * 0.3048 ? `${sig(m / 0.3048)} ft` : `${sig(m / 0.0254)} in`;
  return m >= 1 ? `${sig(m)} m` : `${sig(m * 1000)} mm`;
}

/** A limit that is set in metric units, in the case's units with the metric figure beside it. */
function showLimit(m: number, units: Case['units']): string {
  return units === 'us' ? `${showLength(m, 'us')} (${showLength(m, 'metric')})` : showLength(m, 'metric');
}

function showMass(kg: number, units: Case['units']): string {
  return units === 'us' ? `${sig(kg / 0.45359237)} lb` : `${sig(kg)} kg`;
}

function showStress(pa: number, units: Case['units']): string {
  return units === 'us' ? `${sig(pa / 6894757.293168361)} ksi` : `${sig(pa / 1e6)} MPa`;
}

function showSpeed(mPerS: number, units: Case['units']): string {
  return units === 'us' ? `${sig(mPerS / 0.3048)} ft/s` : `${sig(mPerS)} m/s`;
}
