import { describe, expect, it } from 'vitest';
import { findMaterial } from '../../../src/materials/library.ts';
import { linearHardeningModulus } from '../../../src/physics/plastic/strain-hardening.ts';

describe('linearHardeningModulus', () => {
  // Hand calculation for AISI 1045 CD (Shigley 9th ed. Table A-20: S_y = 530, S_ut = 630 MPa, 12 %;
  // G = 79.3 GPa, Table A-5): E_p = 100 MPa / 0.12 = 833.33 MPa; in shear by distortion energy
  // H_p = E_p/3 = 277.78 MPa (Dieter, Mechanical Metallurgy 3rd ed., Sec. 3-9; from memory, verify);
  // with the elastic part in series H = G·H_p/(G + H_p) = 276.81 MPa.
  it('for 1045 CD by distortion energy is 276.8 MPa', () => {
    const h = linearHardeningModulus(findMaterial('aisi-1045-cd')!, 1 / Math.sqrt(3))!;
    expect(h / 1e6).toBeCloseTo(276.81, 1);
  });

  it('by maximum shear (k = ½) the plastic slope is a quarter of the tensile one', () => {
    const m = findMaterial('aisi-1045-cd')!;
    const h = linearHardeningModulus(m, 0.5)!;
    const hp = (0.25 * 100e6) / 0.12;
    expect(h).toBeCloseTo((79.3e9 * hp) / (79.3e9 + hp), 3);
  });

  it('is undefined when the material cannot harden or lacks the data', () => {
    expect(linearHardeningModulus(findMaterial('gray-iron-30')!, 0.577)).toBeUndefined(); // S_ut = S_y
    expect(linearHardeningModulus({ key: 'x', name: 'x', source: 'x', shearModulus: 79e9, yieldStrength: 300e6 }, 0.577)).toBeUndefined();
  });
});
