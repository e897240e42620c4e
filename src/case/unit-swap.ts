import { splitQuantity, parseQuantity } from '../units/quantity.ts';
import { normaliseUnit, type QuantityKind } from '../units/unit-table.ts';

/** The unit system a unit spelling belongs to, where it belongs to one (a speed or a stress in rpm or Pa does not). */
export type UnitSystem = 'metric' | 'us';

const SYSTEM: Record<string, UnitSystem> = { mm: 'metric', cm: 'metric', m: 'metric', um: 'metric', kg: 'metric', g: 'metric', in: 'us', inch: 'us', ft: 'us', lb: 'us' };

/**
 * The unit a number is most often typed with by mistake instead of the one written, by kind: the
 * millimetre and the inch for one another (a metric caliper read into a US case, or the reverse),
 * the metre and the foot, the kilogram and the pound, rpm and rad/s.
 */
const SWAP: Partial<Record<QuantityKind, Record<string, string>>> = {
  length: { mm: 'in', cm: 'in', in: 'mm', inch: 'mm' },
  mass: { kg: 'lb', lb: 'kg' },
  angular_speed: { 'rad/s': 'rpm', 'r/s': 'rpm', 'rev/s': 'rpm', rpm: 'rad/s', 'r/min': 'rad/s', 'rev/min': 'rad/s' },
};

function unitOf(text: string): string | undefined {
  const q = splitQuantity(text);
  return q && normaliseUnit(q.unit).toLowerCase();
}

/** The unit system of the value as written (`"43 in"` → `us`), undefined for units of neither. */
export function unitSystemOf(text: string): UnitSystem | undefined {
  const unit = unitOf(text);
  return unit === undefined ? undefined : SYSTEM[unit];
}

/** Whether the number as written is an inch-style fraction: `1 11/16`, `3/8`. */
export function isFractionWritten(text: string): boolean {
  return splitQuantity(text)?.number.includes('/') ?? false;
}

/**
 * The same number read in the unit it is most often confused with: `"43 in"` → `"43 mm"`,
 * `"1 11/16 mm"` → `"1 11/16 in"`, `"420 rad/s"` → `"420 rpm"`; its value in SI. The tolerance is
 * left out. Undefined where the kind or the unit has no such partner.
 */
export function swappedUnit(text: string, kind: QuantityKind): { text: string; value: number } | undefined {
  const q = splitQuantity(text);
  const unit = unitOf(text);
  const other = unit === undefined ? undefined : SWAP[kind]?.[unit];
  if (!q || other === undefined) return undefined;
  const swapped = `${q.number} ${other}`;
  return { text: swapped, value: parseQuantity(swapped, kind).value };
}
