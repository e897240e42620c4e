import { describe, expect, it } from 'vitest';
import { isFractionWritten, swappedUnit, unitSystemOf } from '../../src/case/unit-swap.ts';

describe('unit-swap', () => {
  it('swappedUnit(text, kind) reads the same number in the unit it is confused with, tolerance left out', () => {
    expect(swappedUnit('43 in', 'length')?.text).toBe('43 mm');
    expect(swappedUnit('43 in', 'length')?.value).toBeCloseTo(0.043, 12);
    const fraction = swappedUnit('1 11/16 mm ± 0.1 mm', 'length');
    expect(fraction?.text).toBe('1 11/16 in');
    expect(fraction?.value).toBeCloseTo(1.6875 * 0.0254, 12);
    expect(swappedUnit('4200 rad/s', 'angular_speed')?.text).toBe('4200 rpm');
    expect(swappedUnit('310 lb', 'mass')?.text).toBe('310 kg');
  });

  it('swappedUnit gives nothing for the metre and the foot, nobody measures a shaft in them', () => {
    expect(swappedUnit('2.5 m', 'length')).toBeUndefined();
    expect(swappedUnit('3 ft', 'length')).toBeUndefined();
  });

  it('unitSystemOf(text) is the system of the unit as written; isFractionWritten sees inch fractions', () => {
    expect(unitSystemOf('1 7/16 in')).toBe('us');
    expect(unitSystemOf('40 mm')).toBe('metric');
    expect(unitSystemOf('420 rpm')).toBeUndefined();
    expect(isFractionWritten('1 7/16 in')).toBe(true);
    expect(isFractionWritten('3/8 mm')).toBe(true);
    expect(isFractionWritten('1.4375 in')).toBe(false);
  });
});
