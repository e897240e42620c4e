import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { beltSlip, coulombTorque, effectiveFriction, slipTorqueFromInstalled, slipTorqueFromTightSide, tensionRatio } from '../../src/physics/slip.ts';

describe('belt slip by the capstan relation', () => {
  it('the flat-belt tension ratio is e^(μφ)', () => {
    // Shared REFERENCE.md 8 (derived values; Euler–Eytelwein relation, Shigley 9th ed. Sec. 17-2,
    // from memory, confident): φ = π gives 2.1933 (μ 0.25), 2.5663 (0.30), 3.5136 (0.40); μ 0.3 at 160° gives 2.3112.
    expect(tensionRatio(0.25, Math.PI)).toBeCloseTo(2.1933, 4);
    expect(tensionRatio(0.3, Math.PI)).toBeCloseTo(2.5663, 4);
    expect(tensionRatio(0.4, Math.PI)).toBeCloseTo(3.5136, 4);
    expect(tensionRatio(0.3, (160 * Math.PI) / 180)).toBeCloseTo(2.3112, 4);
  });

  it('a V-groove raises the friction to μ/sin(β/2)', () => {
    // Shared REFERENCE.md 8.2 and its derived values (Shigley 9th ed. Sec. 17-3): μ = 0.3, φ = π,
    // β = 34°/36°/38°/40° → μ_eff 1.0261/0.9708/0.9215/0.8771, ratios 25.1/21.1/18.1/15.7.
    const deg = Math.PI / 180;
    expect(effectiveFriction(0.3, 34 * deg)).toBeCloseTo(1.0261, 4);
    expect(effectiveFriction(0.3, 40 * deg)).toBeCloseTo(0.8771, 4);
    expect(tensionRatio(0.3, Math.PI, 36 * deg)).toBeCloseTo(21.1, 1);
    expect(tensionRatio(0.3, Math.PI, 38 * deg)).toBeCloseTo(18.1, 1);
    // Shigley's effective V-belt friction f = 0.5123 gives the design ratio 5 at 180° (8.3, from memory, confident).
    expect(tensionRatio(0.5123, Math.PI)).toBeCloseTo(5.0, 2);
  });

  it("the slip torque of the reference's pulley example, from the tight side and from the installed tension", () => {
    // Shared REFERENCE.md 8 slip example (derived): D 400, d 100, C 800 mm → φ_d = 2.76436 rad;
    // μ 0.3, F1 = 2000 N → ratio 2.2917, F2 = 872.70 N, T = 56.37 N·m at the small pulley and
    // 225.46 N·m at the large; F_i = 1000 N → F1 = 1392.42, F2 = 607.58 N, T = 39.24 N·m.
    const phi = Math.PI - 2 * Math.asin(300 / 1600); // open-belt wrap, Shigley Eq. 17-1
    expect(phi).toBeCloseTo(2.76436, 5);
    const ratio = tensionRatio(0.3, phi);
    expect(ratio).toBeCloseTo(2.2917, 4);
    // (2000 − 872.70)·0.05 = 56.365, printed 56.37: compare to the printed rounding.
    expect(Math.abs(slipTorqueFromTightSide(2000, ratio, 0.05) / 56.37 - 1)).toBeLessThan(2e-4);
    expect(slipTorqueFromTightSide(2000, ratio, 0.2)).toBeCloseTo(225.46, 2);
    expect(slipTorqueFromInstalled(1000, ratio, 0.05)).toBeCloseTo(39.24, 2);
    const b = beltSlip({ kind: 'capstan', wrapAngle: phi, friction: 0.3, tension: 1000, tensionIs: 'installed', pulleyDiameter: 0.1 });
    expect(b.capstan!.tightSide).toBeCloseTo(1392.42, 1);
    expect(b.capstan!.slackSide).toBeCloseTo(607.58, 1);
    expect(b.slipTorque).toBeCloseTo(39.24, 2);
  });

  it('a stated slip torque is taken as it is', () => {
    expect(beltSlip({ kind: 'slip torque', slipTorque: 1234 })).toEqual({ slipTorque: 1234 });
  });

  it('slip torque rises with friction, wrap and tension, and the two tension forms agree', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 0.6, noNaN: true }), fc.double({ min: 1, max: 4, noNaN: true }), fc.double({ min: 100, max: 1e4, noNaN: true }), (mu, phi, Fi) => {
        const r = tensionRatio(mu, phi);
        const t = slipTorqueFromInstalled(Fi, r, 0.2);
        const F1 = (2 * Fi * r) / (r + 1);
        return (
          slipTorqueFromInstalled(Fi, tensionRatio(mu * 1.1, phi), 0.2) > t &&
          slipTorqueFromInstalled(Fi, tensionRatio(mu, phi * 1.1), 0.2) > t &&
          slipTorqueFromInstalled(Fi * 1.1, r, 0.2) > t &&
          Math.abs(slipTorqueFromTightSide(F1, r, 0.2) / t - 1) < 1e-12
        );
      }),
    );
  });

  it('Coulomb friction opposes the relative speed and is zero at rest', () => {
    expect(coulombTorque(10, 2)).toBe(-10);
    expect(coulombTorque(10, -2)).toBe(10);
    expect(coulombTorque(10, 0)).toBe(0);
  });
});
