import Qty from 'js-quantities';
import { describe, expect, it } from 'vitest';
import { normaliseUnit, unitFactor, UNIT_FACTORS, type QuantityKind } from '../../src/units/unit-table.ts';

// NIST Special Publication 811 (2008 ed.), Appendix B.8, factors printed to 7 significant digits
// (values from memory, confident; each is the exact definition rounded, see shared REFERENCE.md §12).
const NIST: [string, QuantityKind, number][] = [
  ['in', 'length', 2.54e-2],
  ['ft', 'length', 3.048e-1],
  ['lb', 'mass', 4.535924e-1],
  ['lbf', 'force', 4.448222],
  ['psi', 'stress', 6.894757e3],
  ['ksi', 'stress', 6.894757e6],
  ['lbf*ft', 'torque', 1.355818],
  ['lbf*in', 'torque', 1.129848e-1],
  ['lb*ft^2', 'inertia', 4.214011e-2],
  ['lb*in^2', 'inertia', 2.926397e-4],
  ['hp', 'power', 7.456999e2],
  ['deg', 'angle', 1.745329e-2],
  ['lb/in^3', 'density', 2.76799e4],
  ['lb/ft^3', 'density', 1.601846e1],
  ['kgf*m', 'torque', 9.80665],
  ['ft*lbf', 'energy', 1.355818],
];

describe('unit factors', () => {
  it.each(NIST)('%s as %s matches NIST SP 811 to its 7 printed digits', (unit, kind, nist) => {
    const f = unitFactor(unit, kind)!;
    expect(Math.abs(f - nist) / nist).toBeLessThan(6e-7);
  });

  it('rpm, r/min and rev/min are 2π/60 rad/s (definition of the revolution)', () => {
    for (const u of ['rpm', 'r/min', 'rev/min']) expect(unitFactor(u, 'angular_speed')).toBe((2 * Math.PI) / 60);
  });

  // Cross-check against a general-purpose units library (js-quantities 1.8.0, tests only; its
  // constants are rounded to about 4e-7, hence the tolerance).
  it.each([
    ['rpm', 'angular_speed', '1 rpm', 'rad/s'],
    ['lb*ft^2', 'inertia', '1 lb*ft^2', 'kg*m^2'],
    ['psi', 'stress', '1 psi', 'Pa'],
    ['hp', 'power', '1 hp', 'W'],
    ['lbf*ft', 'torque', '1 lbf*ft', 'N*m'],
    ['lb/in^3', 'density', '1 lb/in^3', 'kg/m^3'],
  ] as const)('%s agrees with js-quantities', (unit, kind, q, si) => {
    const ref = Qty(q).to(si).scalar;
    expect(Math.abs(unitFactor(unit, kind)! - ref) / ref).toBeLessThan(1e-6);
  });

  it('torsional stiffness: lbf·in/rad is 0.1129848 N·m/rad (shared reference §12, derived) and a degree is π/180 rad', () => {
    expect(unitFactor('lbf*in/rad', 'stiffness')! / 0.1129848 - 1).toBeLessThan(1e-6);
    expect(unitFactor('N*m/deg', 'stiffness')).toBeCloseTo(180 / Math.PI, 12);
    expect(unitFactor('lbf*ft/deg', 'stiffness')! / ((1.3558179483314 * 180) / Math.PI)).toBeCloseTo(1, 12);
    expect(unitFactor('kN·m/rad', 'stiffness')).toBe(1e3);
  });

  it("normaliseUnit brings typed spellings to the table's", () => {
    expect(normaliseUnit('kg·m²')).toBe('kg*m^2');
    expect(normaliseUnit('lb ft2')).toBe('lb*ft^2');
    expect(normaliseUnit('N/mm2')).toBe('N/mm^2');
    expect(normaliseUnit('lbf-ft')).toBe('lbf*ft');
    expect(normaliseUnit('µs')).toBe('us');
  });

  it('every spelling in the table resolves to its own factor', () => {
    for (const [kind, table] of Object.entries(UNIT_FACTORS) as [QuantityKind, Record<string, number>][]) {
      for (const [unit, factor] of Object.entries(table)) expect(unitFactor(unit, kind)).toBe(factor);
    }
  });

  it('a unit of another kind is not accepted', () => {
    expect(unitFactor('MPa', 'length')).toBeUndefined();
    expect(unitFactor('mm', 'stress')).toBeUndefined();
  });
});
