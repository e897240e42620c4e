import { KIND_EXAMPLES, kindsOfUnit, nearestUnits, normaliseUnit, unitFactor, type QuantityKind } from './unit-table.ts';

/** A stated tolerance on a measured value: a fraction of it, or a band in SI units. */
export type Tolerance = { kind: 'relative'; fraction: number } | { kind: 'absolute'; value: number };

/** A quantity read from a case file, converted to SI. */
export interface Quantity {
  /** Value in SI units (m, rad/s, Pa, kg/m³, kg·m², rad, s, kg, N·m, W, J, N, or a plain fraction). */
  value: number;
  /** The ± band the case states, if any. */
  tolerance?: Tolerance;
}

/** Why a text is not a quantity of the wanted kind: a message without the field's location. */
export class QuantityError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'QuantityError';
  }
}

// A decimal, an optional exponent; or a whole number with a fraction ("1 7/16", "1-7/16", "3/8").
const NUMBER = String.raw`[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?`;
const MIXED = String.raw`(?:\d+[ -])?\d+\/\d+`;
const QUANTITY = new RegExp(String.raw`^\s*(${MIXED}|${NUMBER})\s*([^±]*?)\s*(?:(?:±|\+/-)\s*(${NUMBER})\s*([^±]*?)\s*)?$`);

function readNumber(text: string): number {
  const mixed = /^(?:(\d+)[ -])?(\d+)\/(\d+)$/.exec(text);
  if (mixed) return Number(mixed[1] ?? 0) + Number(mixed[2]) / Number(mixed[3]);
  return Number(text);
}

function factorOrThrow(unit: string, kind: QuantityKind, whole: string): number {
  const factor = unitFactor(unit, kind);
  if (factor !== undefined) return factor;
  const others = kindsOfUnit(unit);
  if (others.length > 0) {
    throw new QuantityError(`"${whole}" is ${others[0].replace('_', ' ')}, not ${kind.replace('_', ' ')}; give ${KIND_EXAMPLES[kind]}`);
  }
  const near = nearestUnits(unit, kind);
  const caseOnly = near.length > 0 && near[0].toLowerCase() === normaliseUnit(unit).toLowerCase();
  const hint =
    near.length === 0
      ? ''
      : `; the nearest accepted ${near.length === 1 ? 'is' : 'are'} ${near.map((n) => `"${n}"`).join(', ')}${caseOnly ? ' (unit symbols are case-sensitive: M is mega, m milli, P peta, p pico)' : ''}`;
  throw new QuantityError(`"${whole}": unknown unit "${unit}"${hint}; give ${KIND_EXAMPLES[kind]}`);
}

/**
 * The number and the unit of a quantity as written ("1 7/16 in" → `{ number: '1 7/16', unit: 'in' }`),
 * the tolerance left out; undefined when the text is not a number with a unit. For checks that look
 * at the spelling (a value typed in the other unit system), not at the value.
 */
export function splitQuantity(input: string): { number: string; unit: string } | undefined {
  const m = QUANTITY.exec(input);
  return m && m[2] !== '' ? { number: m[1], unit: m[2] } : undefined;
}

/**
 * Reads "40 mm", "1750 r/min", "420 rpm ± 3 %", "40 mm +/- 0.05 mm", "1 7/16 in" as a quantity of `kind`.
 * A bare number is accepted only for `fraction` (as a fraction of one, not a percentage).
 */
export function parseQuantity(input: string | number, kind: QuantityKind): Quantity {
  if (typeof input === 'number') {
    if (kind === 'fraction') return { value: input };
    throw new QuantityError(`"${input}" has no unit; give ${KIND_EXAMPLES[kind]}`);
  }
  const m = QUANTITY.exec(input);
  if (!m) throw new QuantityError(`"${input}" is not a number with a unit; give ${KIND_EXAMPLES[kind]}`);
  const [, num, unit, tolNum, tolUnit] = m;
  if (unit === '') {
    if (kind === 'fraction') return { value: readNumber(num) };
    throw new QuantityError(`"${input}" has no unit; give ${KIND_EXAMPLES[kind]}`);
  }
  const factor = factorOrThrow(unit, kind, input);
  const quantity: Quantity = { value: readNumber(num) * factor };
  if (tolNum !== undefined) {
    const band = Math.abs(Number(tolNum));
    if (tolUnit === '%') quantity.tolerance = { kind: 'relative', fraction: band / 100 };
    else if (tolUnit === '') quantity.tolerance = { kind: 'absolute', value: band * factor };
    else quantity.tolerance = { kind: 'absolute', value: band * factorOrThrow(tolUnit, kind, input) };
  }
  return quantity;
}
