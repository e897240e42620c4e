import { describe, expect, it } from 'vitest';
import { parseQuantity } from '../../src/units/quantity.ts';

describe('parseQuantity', () => {
  it('reads the spellings of the case-file contract', () => {
    expect(parseQuantity('40 mm', 'length').value).toBeCloseTo(0.04, 15);
    expect(parseQuantity('2.5 in', 'length').value).toBeCloseTo(0.0635, 15);
    expect(parseQuantity('420 rpm', 'angular_speed').value).toBeCloseTo(43.98229715, 8);
    expect(parseQuantity('1750 r/min', 'angular_speed').value).toBeCloseTo((1750 * 2 * Math.PI) / 60, 10);
    expect(parseQuantity('80 GPa', 'stress').value).toBe(80e9);
    expect(parseQuantity('60 ksi', 'stress').value).toBeCloseTo(60 * 6894757.293168, 2);
    expect(parseQuantity('11500 ksi', 'stress').value).toBeCloseTo(7.929e10, -8);
    expect(parseQuantity('7850 kg/m^3', 'density').value).toBe(7850);
    expect(parseQuantity('0.284 lb/in^3', 'density').value).toBeCloseTo(0.284 * 27679.9047, 2);
    expect(parseQuantity('4.5 lb*ft^2', 'inertia').value).toBeCloseTo(4.5 * 0.0421401100938, 10);
    expect(parseQuantity('0.31 kg*m^2', 'inertia').value).toBe(0.31);
    expect(parseQuantity('12 deg', 'angle').value).toBeCloseTo((12 * Math.PI) / 180, 14);
    expect(parseQuantity('3 ms', 'time').value).toBeCloseTo(0.003, 15);
  });

  it('reads inch fractions as drawings write them', () => {
    expect(parseQuantity('1 7/16 in', 'length').value).toBeCloseTo(1.4375 * 0.0254, 14);
    expect(parseQuantity('1-7/16 in', 'length').value).toBeCloseTo(1.4375 * 0.0254, 14);
    expect(parseQuantity('3/8 in', 'length').value).toBeCloseTo(0.375 * 0.0254, 14);
  });

  it('reads tolerances: relative, absolute in the same or another unit, and +/-', () => {
    expect(parseQuantity('420 rpm ± 3 %', 'angular_speed').tolerance).toEqual({ kind: 'relative', fraction: 0.03 });
    const t = parseQuantity('40 mm ± 0.05 mm', 'length').tolerance;
    expect(t?.kind).toBe('absolute');
    expect(t && t.kind === 'absolute' && t.value).toBeCloseTo(5e-5, 15);
    const u = parseQuantity('530 MPa +/- 40', 'stress').tolerance;
    expect(u && u.kind === 'absolute' && u.value).toBe(40e6);
  });

  it('a bare number is refused for a dimensional kind, with an example', () => {
    expect(() => parseQuantity('40', 'length')).toThrow(/"40" has no unit; give a length such as "40 mm"/);
    expect(() => parseQuantity(40, 'length')).toThrow(/has no unit/);
  });

  it('a unit of the wrong kind says which kind it is', () => {
    expect(() => parseQuantity('40 MPa', 'length')).toThrow(/"40 MPa" is stress, not length; give a length/);
  });

  it('an unknown unit is named', () => {
    expect(() => parseQuantity('40 furlongs', 'length')).toThrow(/unknown unit "furlongs"/);
  });

  it('a percentage is a fraction', () => {
    expect(parseQuantity('12 %', 'fraction').value).toBeCloseTo(0.12, 15);
  });
});

describe('parseQuantity: unit symbols keep their case', () => {
  it('"50 Mm" is not 50 mm and "530000000000 mPa" is not MPa: each is refused with the nearest spellings', () => {
    expect(() => parseQuantity('50 Mm', 'length')).toThrow(/unknown unit "Mm"; the nearest accepted are "mm", "m".*case-sensitive.*; give a length such as "40 mm"/);
    expect(() => parseQuantity('530000000000 mPa', 'stress')).toThrow(/unknown unit "mPa"; the nearest accepted are "MPa", "Pa"/);
    expect(() => parseQuantity('3 MM', 'length')).toThrow(/unknown unit "MM"/);
    expect(() => parseQuantity('80 gpa', 'stress')).toThrow(/unknown unit "gpa"; the nearest accepted are "GPa"/);
    expect(() => parseQuantity('2 KG', 'mass')).toThrow(/unknown unit "KG"/);
  });

  it('words of the trade are read in any case: RPM, PSI, KSI, IN, LB*FT^2', () => {
    expect(parseQuantity('420 RPM', 'angular_speed').value).toBeCloseTo(parseQuantity('420 rpm', 'angular_speed').value, 12);
    expect(parseQuantity('60 KSI', 'stress').value).toBe(parseQuantity('60 ksi', 'stress').value);
    expect(parseQuantity('2 IN', 'length').value).toBe(parseQuantity('2 in', 'length').value);
    expect(parseQuantity('4 LB*FT^2', 'inertia').value).toBe(parseQuantity('4 lb*ft^2', 'inertia').value);
  });

  it('names of the object prototype are no units', () => {
    for (const u of ['constructor', 'toString', '__proto__', 'hasOwnProperty']) {
      expect(() => parseQuantity(`40 ${u}`, 'length')).toThrow(new RegExp(`unknown unit "${u}"`));
    }
  });
});
