/**
 * The units a case file may use, by kind, with their factor to SI.
 *
 * Factors are the exact definitions where one exists (inch = 0.0254 m, pound = 0.45359237 kg,
 * standard gravity 9.80665 m/s²) and otherwise follow from them; NIST SP 811 (2008) Appendix B.8
 * prints the same values to 7 significant digits, and test/units/unit-table.test.ts checks each one.
 * The table is our own rather than a units library's so that the factors are exact, the spellings
 * of the trade (rpm, r/min, ksi, lb*ft^2) are all here, and `check` pays no import cost for it.
 */

export type QuantityKind = 'length' | 'angular_speed' | 'stress' | 'density' | 'inertia' | 'angle' | 'time' | 'mass' | 'torque' | 'power' | 'energy' | 'force' | 'stiffness' | 'fraction';

const INCH = 0.0254;
const FOOT = 0.3048;
const POUND_MASS = 0.45359237;
const POUND_FORCE = POUND_MASS * 9.80665;
const PSI = POUND_FORCE / (INCH * INCH);

/** Factor to SI for each accepted spelling, after `normaliseUnit`. */
export const UNIT_FACTORS: Record<QuantityKind, Record<string, number>> = {
  length: { m: 1, mm: 1e-3, cm: 1e-2, um: 1e-6, in: INCH, inch: INCH, ft: FOOT },
  angular_speed: {
    rpm: (2 * Math.PI) / 60,
    'r/min': (2 * Math.PI) / 60,
    'rev/min': (2 * Math.PI) / 60,
    'rad/s': 1,
    'rev/s': 2 * Math.PI,
    'r/s': 2 * Math.PI,
  },
  stress: {
    Pa: 1,
    kPa: 1e3,
    MPa: 1e6,
    GPa: 1e9,
    'N/mm^2': 1e6,
    bar: 1e5,
    psi: PSI,
    ksi: PSI * 1e3,
    Mpsi: PSI * 1e6,
  },
  density: {
    'kg/m^3': 1,
    'g/cm^3': 1e3,
    'lb/in^3': POUND_MASS / INCH ** 3,
    'lb/ft^3': POUND_MASS / FOOT ** 3,
  },
  inertia: {
    'kg*m^2': 1,
    'g*cm^2': 1e-7,
    'lb*ft^2': POUND_MASS * FOOT ** 2,
    'lb*in^2': POUND_MASS * INCH ** 2,
    'slug*ft^2': POUND_FORCE * FOOT, // slug = lbf·s²/ft, so slug·ft² = lbf·ft·s²
    'lbf*in*s^2': POUND_FORCE * INCH,
  },
  angle: { rad: 1, mrad: 1e-3, deg: Math.PI / 180, '°': Math.PI / 180, rev: 2 * Math.PI },
  time: { s: 1, ms: 1e-3, us: 1e-6, min: 60 },
  mass: { kg: 1, g: 1e-3, t: 1e3, lb: POUND_MASS },
  torque: {
    'N*m': 1,
    Nm: 1,
    'kN*m': 1e3,
    'lbf*ft': POUND_FORCE * FOOT,
    'lbf*in': POUND_FORCE * INCH,
    // "lb-ft" for a torque means pound-force feet in the trade's everyday usage.
    'lb*ft': POUND_FORCE * FOOT,
    'lb*in': POUND_FORCE * INCH,
    'kgf*m': 9.80665,
  },
  power: { W: 1, kW: 1e3, MW: 1e6, hp: 550 * POUND_FORCE * FOOT },
  energy: { J: 1, kJ: 1e3, 'ft*lbf': POUND_FORCE * FOOT, 'in*lbf': POUND_FORCE * INCH },
  force: { N: 1, kN: 1e3, lbf: POUND_FORCE },
  // Torsional stiffness, torque per angle: a coupling maker's data sheet gives it per radian or per degree.
  stiffness: {
    'N*m/rad': 1,
    'kN*m/rad': 1e3,
    'MN*m/rad': 1e6,
    'N*m/deg': 180 / Math.PI,
    'kN*m/deg': (180 / Math.PI) * 1e3,
    'lbf*ft/rad': POUND_FORCE * FOOT,
    'lbf*in/rad': POUND_FORCE * INCH,
    'lbf*ft/deg': (POUND_FORCE * FOOT * 180) / Math.PI,
    'lbf*in/deg': (POUND_FORCE * INCH * 180) / Math.PI,
  },
  fraction: { '%': 0.01 },
};

/** One example value per kind, used in error messages. */
export const KIND_EXAMPLES: Record<QuantityKind, string> = {
  length: 'a length such as "40 mm" or "1.5 in"',
  angular_speed: 'a speed such as "1480 rpm" or "155 rad/s"',
  stress: 'a stress such as "530 MPa" or "77 ksi"',
  density: 'a density such as "7850 kg/m^3" or "0.284 lb/in^3"',
  inertia: 'a mass moment of inertia such as "0.31 kg*m^2" or "4.5 lb*ft^2"',
  angle: 'an angle such as "12 deg" or "0.2 rad"',
  time: 'a time such as "3 ms" or "0 s"',
  mass: 'a mass such as "25 kg" or "55 lb"',
  torque: 'a torque such as "450 N*m" or "330 lbf*ft"',
  power: 'a power such as "22 kW" or "30 hp"',
  energy: 'an energy such as "500 J" or "370 ft*lbf"',
  force: 'a force such as "1200 N" or "270 lbf"',
  stiffness: 'a torsional stiffness such as "120 kN*m/rad" or "2100 N*m/deg"',
  fraction: 'a percentage such as "12 %"',
};

/**
 * Brings the spellings people type to the table's: `·`, `⋅`, `-` and spaces between unit
 * symbols become `*`, superscripts become `^2`/`^3`, `µ` becomes `u`.
 */
export function normaliseUnit(unit: string): string {
  return unit
    .trim()
    .replace(/[µμ]/g, 'u')
    .replace(/²/g, '^2')
    .replace(/³/g, '^3')
    .replace(/\s*[·⋅]\s*/g, '*')
    .replace(/(?<=[a-zA-Z])-(?=[a-zA-Z])/g, '*')
    .replace(/\s+/g, '*')
    .replace(/\*\*/g, '^')
    .replace(/(?<=[a-zA-Z])(2|3)$/g, '^$1')
    .replace(/(?<=[a-zA-Z])(2|3)(?=\*|\/)/g, '^$1');
}

/**
 * Words of the trade (not SI symbols) that may be written in any case: "RPM", "PSI", "In", "Deg".
 * An SI symbol's case is its meaning (m milli, M mega; p pico, P peta; Pa the pascal), so
 * a spelling made of SI symbols is matched exactly: "50 Mm" is not 50 mm and "530 mPa" not MPa.
 */
const CASE_BLIND_WORDS = new Set(['rpm', 'r', 'rev', 'min', 'in', 'inch', 'ft', 'bar', 'psi', 'ksi', 'lb', 'lbf', 'slug', 'deg', 'hp']);

/** Whether `spelling` (a table key) is made of trade words only, so its case does not matter. */
export function isCaseBlind(spelling: string): boolean {
  return spelling
    .split(/[*/^]|\d+/)
    .filter((w) => w !== '')
    .every((w) => CASE_BLIND_WORDS.has(w));
}

/**
 * The factor to SI for `unit` as a `kind`, or undefined. Exact spelling first (also with the
 * factors of a product swapped, "ft*lbf" for "lbf*ft"), then in any case for spellings made only
 * of trade words (`isCaseBlind`). Own keys only: "constructor" is no unit.
 */
export function unitFactor(unit: string, kind: QuantityKind): number | undefined {
  const table = UNIT_FACTORS[kind];
  const u = normaliseUnit(unit);
  if (Object.hasOwn(table, u)) return table[u];
  const swapped = u.includes('*') ? u.split('*').reverse().join('*') : u;
  if (Object.hasOwn(table, swapped)) return table[swapped];
  const blind = Object.keys(table).filter((k) => isCaseBlind(k) && (k.toLowerCase() === u.toLowerCase() || k.toLowerCase() === swapped.toLowerCase()));
  return blind.length === 1 ? table[blind[0]] : undefined;
}

/**
 * The accepted spellings of `kind` nearest to `unit`, best first (at most three): those equal to it
 * but for case first ("Mm" → "mm"), then those within two edits.
 */
export function nearestUnits(unit: string, kind: QuantityKind): string[] {
  const u = normaliseUnit(unit);
  const scored = Object.keys(UNIT_FACTORS[kind])
    .map((k) => ({ k, d: k.toLowerCase() === u.toLowerCase() ? 0 : distance(k.toLowerCase(), u.toLowerCase()) + (distance(k, u) > distance(k.toLowerCase(), u.toLowerCase()) ? 0.5 : 0) }))
    .filter((x) => x.d <= 2)
    .sort((a, b) => a.d - b.d);
  return scored.slice(0, 3).map((x) => x.k);
}

/** Levenshtein distance; unit spellings are short. */
function distance(a: string, b: string): number {
  let prev = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const cur = [i];
    for (let j = 1; j <= b.length; j++) cur[j] = Math.min(prev[j] + 1, cur[j - 1] + 1, prev[j - 1] + (a[i - 1] === b[j - 1] ? 0 : 1));
    prev = cur;
  }
  return prev[b.length];
}

/** The kinds `unit` belongs to (to tell "a length given in MPa" from a typo). */
export function kindsOfUnit(unit: string): QuantityKind[] {
  return (Object.keys(UNIT_FACTORS) as QuantityKind[]).filter((k) => unitFactor(unit, k) !== undefined);
}
