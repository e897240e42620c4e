import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { keyBearingStress, keyForce, keyShearStress } from '../../src/physics/key-stress.ts';
import { torqueFromPower } from '../../src/physics/power.ts';

const IN = 0.0254;
const LBF = 4.4482216152605; // N (NIST SP 811 App. B.8, exact from the definitions)
const PSI = 6894.7572931684; // Pa
const HP = 745.69987158227; // W

describe('key stresses (Shigley 9th ed. Sec. 7-7)', () => {
  it('reproduce Shigley 9th ed. Example 7-6: force, and the key lengths for shear and for crushing', () => {
    // Shigley 9th ed. Example 7-6 (the example number is confirmed by the 9th ed. text on p. 391;
    // its data from memory, verify): 1 7/16 in shaft, 40 hp at 600 rev/min, 3/8 in square key of
    // 1020 CD designed on a yield strength of 65 kpsi (as recalled; Table A-20's minimum is 57 kpsi),
    // design factor 2.80, S_sy = 0.577·S_y. Book answers: F ≈ 5850 lbf, l ≈ 1.16 in for shear,
    // l ≈ 1.34 in for crushing (which governs). REFERENCE 7.5 gives the arithmetic.
    const d = 1.4375 * IN;
    const t = 0.375 * IN;
    const T = torqueFromPower(40 * HP, (600 * 2 * Math.PI) / 60);
    expect(T / (LBF * IN)).toBeCloseTo(4201.7, 1); // T = 63 025·H/n lbf·in
    expect(Math.abs(keyForce(T, d) / LBF / 5850 - 1)).toBeLessThan(0.001);
    const n = 2.8;
    const Sy = 65e3 * PSI;
    // Our stress formulas solved for the length at which the stress reaches the allowable:
    const lShear = keyShearStress(T, d, t, 1) / ((0.577 * Sy) / n);
    const lCrush = keyBearingStress(T, d, t, 1) / (Sy / n);
    expect(Math.abs(lShear / IN / 1.164 - 1)).toBeLessThan(0.002);
    expect(Math.abs(lCrush / IN / 1.343 - 1)).toBeLessThan(0.002);
    expect(lCrush).toBeGreaterThan(lShear);
  });

  it('reproduce the derived metric example: 40 mm shaft, 12 × 8 key, 50 mm long, 500 N·m', () => {
    // REFERENCE 7.6 (derived): τ = 41.67 MPa, σ = 125.0 MPa by the h/2 rule, 166.7 MPa on the hub
    // side with the contact height h − t1 = 8 − 5 = 3 mm (DIN 6885 t1 = 5 mm for 38–44 mm shafts).
    expect(keyShearStress(500, 0.04, 0.012, 0.05) / 1e6).toBeCloseTo(41.667, 3);
    expect(keyBearingStress(500, 0.04, 0.008, 0.05) / 1e6).toBeCloseTo(125.0, 6);
    expect(keyBearingStress(500, 0.04, 0.008, 0.05, 0.003) / 1e6).toBeCloseTo(166.667, 3);
  });

  it('shear and bearing stresses are proportional to the torque and inverse to the length', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 1e5, noNaN: true }), fc.double({ min: 0.1, max: 10, noNaN: true }), (T, k) => {
        const a = keyShearStress(T, 0.05, 0.014, 0.06);
        return (
          Math.abs(keyShearStress(k * T, 0.05, 0.014, 0.06) / a / k - 1) < 1e-12 && Math.abs((keyBearingStress(T, 0.05, 0.009, k * 0.06) * k) / keyBearingStress(T, 0.05, 0.009, 0.06) - 1) < 1e-12
        );
      }),
    );
  });
});
