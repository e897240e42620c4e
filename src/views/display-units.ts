import type { Case } from '../case/case.ts';

/** How a quantity is shown: the unit's label and its size in SI. */
interface DisplayUnit {
  label: string;
  factor: number;
}

const INCH = 0.0254;
const LBF = 0.45359237 * 9.80665;

/** Display units by the case's `units:`; factors as in src/units/unit-table.ts (NIST SP 811). */
const DISPLAY: Record<Case['units'], Record<'length' | 'torque' | 'stress' | 'energy' | 'inertia' | 'speed' | 'angle' | 'stiffness' | 'force', DisplayUnit>> = {
  metric: {
    length: { label: 'mm', factor: 1e-3 },
    torque: { label: 'N·m', factor: 1 },
    stress: { label: 'MPa', factor: 1e6 },
    energy: { label: 'J', factor: 1 },
    inertia: { label: 'kg·m²', factor: 1 },
    speed: { label: 'rpm', factor: (2 * Math.PI) / 60 },
    angle: { label: '°', factor: Math.PI / 180 },
    stiffness: { label: 'kN·m/rad', factor: 1e3 },
    force: { label: 'kN', factor: 1e3 },
  },
  us: {
    length: { label: 'in', factor: INCH },
    torque: { label: 'lbf·ft', factor: LBF * 12 * INCH },
    stress: { label: 'ksi', factor: (1e3 * LBF) / INCH ** 2 },
    energy: { label: 'ft·lbf', factor: LBF * 12 * INCH },
    inertia: { label: 'lb·ft²', factor: 0.45359237 * (12 * INCH) ** 2 },
    speed: { label: 'rpm', factor: (2 * Math.PI) / 60 },
    angle: { label: '°', factor: Math.PI / 180 },
    stiffness: { label: 'lbf·ft/rad', factor: LBF * 12 * INCH },
    force: { label: 'lbf', factor: LBF },
  },
};

export type DisplayKind = keyof (typeof DISPLAY)['metric'];

/** Rounds to `digits` significant figures, without exponent notation for everyday sizes. */
export function sig(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return String(value);
  if (value === 0) return '0';
  const rounded = Number(value.toPrecision(digits));
  const abs = Math.abs(rounded);
  if (abs >= 1e-4 && abs < 1e9) return String(rounded);
  return rounded.toExponential(digits - 1);
}

/**
 * Below these a value is numerical noise, not a result, and is shown as 0: an angle no dial or
 * scribed line resolves (0.001°), a length below 0.1 µm, a torque or energy below 1 µN·m or 1 µJ.
 */
export const ANGLE_RESOLUTION = (1e-3 * Math.PI) / 180;
const RESOLUTION: Partial<Record<DisplayKind, number>> = { angle: ANGLE_RESOLUTION, length: 1e-7, torque: 1e-6, energy: 1e-6 };

/** `value` (SI) shown in the case's units, three significant figures: "81.5 MPa"; noise below the display resolution as 0. */
export function show(value: number, kind: DisplayKind, units: Case['units'], digits = 3): string {
  const u = DISPLAY[units][kind];
  if (Math.abs(value) < (RESOLUTION[kind] ?? 0)) value = 0;
  // Large metric torques and energies read better with the kilo prefix: 73.5 kN·m, not 73500 N·m.
  if (units === 'metric' && (kind === 'torque' || kind === 'energy') && Math.abs(value) >= 1e4) {
    return `${sig(value / 1e3, digits)} k${u.label}`;
  }
  const sep = u.label === '°' ? '' : ' ';
  return `${sig(value / u.factor, digits)}${sep}${u.label}`;
}

/** The unit label for a kind in the case's units. */
export function unitLabel(kind: DisplayKind, units: Case['units']): string {
  return DISPLAY[units][kind].label;
}

/** `value` (SI) as a number in the case's display unit. */
export function inDisplay(value: number, kind: DisplayKind, units: Case['units']): number {
  return value / DISPLAY[units][kind].factor;
}
