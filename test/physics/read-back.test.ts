import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { PlasticBalance, type BalancePiece } from '../../src/physics/plastic/plastic-balance.ts';
import { rigidity, yieldTorque, type TorsionLaw } from '../../src/physics/plastic/plastic-torsion.ts';
import { energyAtSpeed, onsetSpeed, permanentTwistAtSpeed, speedForPermanentTwist, type ReadBackSide } from '../../src/physics/read-back.ts';

const law = (c2: number, c1: number, tauY: number, h = 0): TorsionLaw => ({ outerRadius: c2, innerRadius: c1, shearModulus: 79.3e9, shearYield: tauY, hardeningModulus: h });
const piece = (length: number, l: TorsionLaw): BalancePiece => ({ length, law: l, fractureTwistRate: Infinity });
const rpm = (n: number) => (n * 2 * Math.PI) / 60;

// EP5's shaft and disc (shared REFERENCE.md, derived): d = 40 mm, L = 0.5 m, τ_Y = 0.577·530 MPa, J = 0.986460 kg·m².
const ep5: ReadBackSide = { balance: new PlasticBalance([piece(0.5, law(0.02, 0, 0.577 * 530e6))]), inertia: 0.98646, between: [0] };

describe('reading a permanent twist back to the speed at the stop', () => {
  it("permanentTwistAtSpeed gives EP5's 0.041193 rad at 300 rpm and nothing at 150 rpm", () => {
    expect(Math.abs(permanentTwistAtSpeed([ep5], rpm(300)) / 0.041193 - 1)).toBeLessThan(0.005);
    expect(permanentTwistAtSpeed([ep5], rpm(150))).toBe(0);
  });

  it('the onset speed is where the kinetic energy equals the elastic energy at first yield, ½·T_Y²·C (EP5: 185.247 J)', () => {
    const ty = yieldTorque(ep5.balance.pieces[0].law);
    const u = (0.5 * ty ** 2 * 0.5) / rigidity(ep5.balance.pieces[0].law);
    expect(u).toBeCloseTo(185.247, 0);
    expect(onsetSpeed([ep5])).toBeCloseTo(Math.sqrt((2 * u) / 0.98646), 9);
  });

  it('round trip: the speed found from a predicted permanent twist is the speed that produced it, to 1e-6', () => {
    const side: ReadBackSide = {
      balance: new PlasticBalance([piece(0.3, law(0.03, 0, 300e6)), piece(0.1, law(0.02, 0, 300e6)), piece(0.2, law(0.025, 0.012, 300e6, 4e8))]),
      inertia: 2.5,
      between: [1, 2],
    };
    fc.assert(
      fc.property(fc.double({ min: 1.05, max: 50, noNaN: true }), (factor) => {
        const speed = onsetSpeed([side]) * factor;
        const twist = permanentTwistAtSpeed([side], speed);
        expect(Math.abs(speedForPermanentTwist([side], twist)! / speed - 1)).toBeLessThan(1e-6);
      }),
      { numRuns: 25 },
    );
  });

  it('round trip holds across both sides of a stop, each with its own energy', () => {
    const a: ReadBackSide = { balance: new PlasticBalance([piece(0.2, law(0.02, 0, 250e6))]), inertia: 1.2, between: [0] };
    const b: ReadBackSide = { balance: new PlasticBalance([piece(0.4, law(0.022, 0, 250e6))]), inertia: 0.7, between: [0] };
    for (const speed of [rpm(400), rpm(900), rpm(2500)]) {
      const twist = permanentTwistAtSpeed([a, b], speed);
      expect(twist).toBeGreaterThan(0);
      expect(Math.abs(speedForPermanentTwist([a, b], twist)! / speed - 1)).toBeLessThan(1e-6);
    }
    expect(energyAtSpeed([a, b], 10)).toBeCloseTo(0.5 * 1.9 * 100, 12);
  });

  it('the permanent twist is zero below the onset speed and grows with speed above it (property)', () => {
    const onset = onsetSpeed([ep5]);
    fc.assert(
      fc.property(fc.double({ min: 0, max: 20, noNaN: true }), fc.double({ min: 0, max: 20, noNaN: true }), (f1, f2) => {
        const [lo, hi] = [Math.min(f1, f2), Math.max(f1, f2)].map((f) => f * onset);
        const [pl, ph] = [permanentTwistAtSpeed([ep5], lo), permanentTwistAtSpeed([ep5], hi)];
        if (hi <= onset * (1 - 1e-9)) expect(ph).toBe(0);
        expect(ph).toBeGreaterThanOrEqual(pl - 1e-15);
      }),
      { numRuns: 40 },
    );
  });

  it('a zero measured twist means at most the onset speed', () => {
    expect(speedForPermanentTwist([ep5], 0)).toBe(onsetSpeed([ep5]));
  });

  it('gives no speed for a twist between stations whose shaft is shielded by a weaker piece elsewhere', () => {
    const side: ReadBackSide = { balance: new PlasticBalance([piece(0.3, law(0.04, 0, 300e6)), piece(0.1, law(0.02, 0, 300e6))]), inertia: 3, between: [0] };
    expect(onsetSpeed([side])).toBe(Infinity);
    expect(permanentTwistAtSpeed([side], 1e4)).toBe(0);
    expect(speedForPermanentTwist([side], 0.01)).toBeUndefined();
  });
});
