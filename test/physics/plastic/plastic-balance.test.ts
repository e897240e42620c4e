import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { PlasticBalance, type BalancePiece } from '../../../src/physics/plastic/plastic-balance.ts';
import { energyPerLength, plasticTorque, rigidity, yieldTorque, type TorsionLaw } from '../../../src/physics/plastic/plastic-torsion.ts';

const law = (c2: number, c1: number, g: number, tauY: number, h = 0): TorsionLaw => ({ outerRadius: c2, innerRadius: c1, shearModulus: g, shearYield: tauY, hardeningModulus: h });
const piece = (length: number, l: TorsionLaw, fractureTwistRate = Infinity): BalancePiece => ({ length, law: l, fractureTwistRate });
const rel = (a: number, b: number) => Math.abs(a / b - 1);
const rpm = (n: number) => (n * 2 * Math.PI) / 60;

describe('PlasticBalance, one piece: EP5 sudden stop into the plastic range', () => {
  // EP5 (shared REFERENCE.md, derived): the steel disc of REFERENCE section 2 (D = 400 mm, t = 50 mm,
  // ρ = 7850 kg/m³, J = 0.986460 kg·m², Beer & Johnston Dynamics table of mass moments; from memory,
  // confident) on a d = 40 mm × L = 0.5 m shaft, G = 79.3 GPa (Shigley 9th ed. Table A-5), AISI 1045 CD
  // S_y = 530 MPa (Shigley A-20), τ_Y = 0.577·S_y. Energy balance REFERENCE 3.1.9.
  const J = 0.98646;
  const shaft = new PlasticBalance([piece(0.5, law(0.02, 0, 79.3e9, 0.577 * 530e6))]);

  it('at 150 rpm the stop is elastic: T = 3114.81 N·m, θ = 0.078143 rad, no permanent twist', () => {
    const s = shaft.stateForEnergy(0.5 * J * rpm(150) ** 2);
    expect(rel(s.torque, 3114.81)).toBeLessThan(0.005);
    expect(rel(s.pieces[0].twist, 0.078143)).toBeLessThan(0.005);
    expect(s.pieces[0].permanentTwist).toBe(0);
  });

  it('at 300 rpm: T = 4859.34 N·m, θ_max = 0.163102 rad, residual twist 0.041193 rad, all within 0.5 %', () => {
    const s = shaft.stateForEnergy(0.5 * J * rpm(300) ** 2);
    expect(rel(s.torque, 4859.34)).toBeLessThan(0.005);
    expect(rel(s.pieces[0].twist, 0.163102)).toBeLessThan(0.005);
    expect(rel(s.pieces[0].permanentTwist, 0.041193)).toBeLessThan(0.005);
    expect(rel(s.energy, 0.5 * J * rpm(300) ** 2)).toBeLessThan(1e-9);
    expect(rel(s.energy, 486.799)).toBeLessThan(1e-5);
  });

  it('at 1500 rpm the twist reaches 2.447 rad (140°) and the surface strain about 0.098 (EP5)', () => {
    const s = shaft.stateForEnergy(0.5 * J * rpm(1500) ** 2);
    expect(rel(s.pieces[0].twist, 2.447)).toBeLessThan(0.005);
    expect(s.pieces[0].maxShearStrain).toBeCloseTo(0.098, 3);
  });
});

describe('PlasticBalance, pieces in series', () => {
  const G = 79.3e9;
  const tauY = 300e6;
  const thin = law(0.02, 0, G, tauY);
  const thick = law(0.03, 0, G, tauY);

  it('every piece carries the same torque, and the energies add up to the side energy', () => {
    const b = new PlasticBalance([piece(0.2, thick), piece(0.1, thin), piece(0.3, thick)]);
    const s = b.stateForEnergy(5000);
    expect(rel(s.energy, 5000)).toBeLessThan(1e-9);
    expect(s.torque).toBeLessThan(plasticTorque(thin));
    expect(s.torque).toBeGreaterThan(yieldTorque(thin));
    // Independent check of each piece: its energy at its own twist rate under the common torque.
    const sum = s.pieces.reduce((acc, p, i) => acc + energyPerLength([thick, thin, thick][i], p.twistRate) * [0.2, 0.1, 0.3][i], 0);
    expect(rel(sum, 5000)).toBeLessThan(1e-9);
  });

  it('the thicker pieces stay elastic and take no permanent twist while the thin one yields', () => {
    const b = new PlasticBalance([piece(0.2, thick), piece(0.1, thin)]);
    const s = b.stateForEnergy(5000);
    expect(s.pieces[0].permanentTwist).toBe(0);
    expect(s.pieces[0].twist).toBeCloseTo((s.torque * 0.2) / rigidity(thick), 12);
    expect(s.pieces[1].permanentTwist).toBeGreaterThan(0);
  });

  it('below first yield the elastic energy method comes back: T = √(2E/C)', () => {
    const b = new PlasticBalance([piece(0.4, thick), piece(0.25, thin)]);
    const c = 0.4 / rigidity(thick) + 0.25 / rigidity(thin);
    const e = 0.5 * yieldTorque(thin) ** 2 * c * 0.9;
    expect(rel(b.stateForEnergy(e).torque, Math.sqrt((2 * e) / c))).toBeLessThan(1e-9);
  });

  it('the closed form below first yield meets the root above it: the state is continuous at the first-yield energy', () => {
    // Below the first-yield energy the balance takes T = √(2E/C) directly; just above it the root
    // of the energy. Both sides of the boundary give the same torque and twist to a part in 10⁶.
    const b = new PlasticBalance([piece(0.4, thick), piece(0.25, thin)]);
    const ey = 0.5 * yieldTorque(thin) ** 2 * (0.4 / rigidity(thick) + 0.25 / rigidity(thin));
    const below = b.stateForEnergy(ey * (1 - 1e-9));
    const above = b.stateForEnergy(ey * (1 + 1e-9));
    expect(rel(below.torque, yieldTorque(thin))).toBeLessThan(1e-6);
    expect(rel(above.torque, below.torque)).toBeLessThan(1e-6);
    expect(rel(above.pieces[1].twist, below.pieces[1].twist)).toBeLessThan(1e-6);
    expect(rel(below.energy, ey)).toBeLessThan(1e-8);
  });

  it('splitting a piece into two of the same law changes nothing', () => {
    const whole = new PlasticBalance([piece(0.3, thin), piece(0.2, thick)]).stateForEnergy(8000);
    const split = new PlasticBalance([piece(0.1, thin), piece(0.2, thick), piece(0.2, thin)]).stateForEnergy(8000);
    expect(rel(split.torque, whole.torque)).toBeLessThan(1e-9);
    const perm = split.pieces[0].permanentTwist + split.pieces[2].permanentTwist;
    expect(rel(perm, whole.pieces[0].permanentTwist)).toBeLessThan(1e-8);
  });

  it('peak torque and permanent twist grow with energy, and the torque never passes the weakest T_P (property)', () => {
    const b = new PlasticBalance([piece(0.2, thick), piece(0.15, thin), piece(0.05, law(0.025, 0.015, G, tauY))]);
    const tp = Math.min(plasticTorque(thin), plasticTorque(thick), plasticTorque(law(0.025, 0.015, G, tauY)));
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1e6, noNaN: true }), fc.double({ min: 0, max: 1e6, noNaN: true }), (e1, e2) => {
        const [lo, hi] = [Math.min(e1, e2), Math.max(e1, e2)].map((e) => b.stateForEnergy(e));
        expect(hi.torque).toBeGreaterThanOrEqual(lo.torque * (1 - 1e-12));
        const perm = (s: typeof lo) => s.pieces.reduce((a, p) => a + p.permanentTwist, 0);
        expect(perm(hi)).toBeGreaterThanOrEqual(perm(lo) - 1e-12);
        expect(hi.torque).toBeLessThanOrEqual(tp * (1 + 1e-12));
      }),
      { numRuns: 50 },
    );
  });

  it('a hollow piece of the same area as a solid one carries more torque at yield and takes less permanent twist for the same energy', () => {
    // Same area: c₂² − c₁² = c². Hollow c₂ = 25 mm, c₁ = 15 mm ↔ solid c = 20 mm.
    const solid = new PlasticBalance([piece(0.5, law(0.02, 0, G, tauY))]);
    const hollow = new PlasticBalance([piece(0.5, law(0.025, 0.015, G, tauY))]);
    expect(yieldTorque(hollow.pieces[0].law)).toBeGreaterThan(yieldTorque(solid.pieces[0].law));
    const e = 3000;
    const ps = solid.stateForEnergy(e).pieces[0].permanentTwist;
    const ph = hollow.stateForEnergy(e).pieces[0].permanentTwist;
    expect(ph).toBeLessThan(ps);
  });

  it('an elastic-only (brittle) piece is never given a permanent twist, whatever the energy', () => {
    const brittle = law(0.02, 0, 41.4e9, Infinity);
    const b = new PlasticBalance([piece(0.3, brittle, 207e6 / 41.4e9 / 0.02)]);
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1e7, noNaN: true }), (e) => {
        expect(b.stateForEnergy(e).pieces[0].permanentTwist).toBe(0);
      }),
      { numRuns: 30 },
    );
  });
});

describe('PlasticBalance.fractureLimit', () => {
  const G = 79.3e9;
  const tauY = 300e6;

  it('one ductile piece breaks once it has absorbed its own energy to the fracture strain', () => {
    const l = law(0.02, 0, G, tauY);
    const phiF = 0.5 / 0.02;
    const b = new PlasticBalance([piece(0.4, l, phiF)]);
    const limit = b.fractureLimit();
    expect(limit.piece).toBe(0);
    expect(rel(limit.energy, energyPerLength(l, phiF) * 0.4)).toBeLessThan(1e-12);
  });

  it('a stronger piece is shielded: it cannot break while the weaker one is fully plastic', () => {
    const weak = law(0.02, 0, G, tauY);
    const strong = law(0.03, 0, G, tauY);
    const b = new PlasticBalance([piece(0.2, strong, 0.01 / 0.03), piece(0.2, weak)]);
    expect(b.fractureLimit()).toEqual({ energy: Infinity, piece: undefined, twistRate: Infinity });
  });

  it('a brittle piece in series breaks when the torque reaches its fracture torque', () => {
    const steel = law(0.03, 0, G, tauY);
    const iron = law(0.02, 0, 41.4e9, Infinity);
    const tauF = 207e6;
    const b = new PlasticBalance([piece(0.2, steel), piece(0.1, iron, tauF / (41.4e9 * 0.02))]);
    const limit = b.fractureLimit();
    expect(limit.piece).toBe(1);
    const tF = (tauF * Math.PI * 0.02 ** 3) / 2;
    expect(tF).toBeLessThan(yieldTorque(steel));
    const c = 0.2 / rigidity(steel) + 0.1 / rigidity(iron);
    expect(rel(limit.energy, 0.5 * tF ** 2 * c)).toBeLessThan(1e-9);
  });

  it('yieldOnsetEnergy is the elastic energy at the first yield of the chosen pieces', () => {
    const weak = law(0.02, 0, G, tauY);
    const strong = law(0.025, 0, G, tauY);
    const b = new PlasticBalance([piece(0.3, strong), piece(0.2, weak)]);
    const c = 0.3 / rigidity(strong) + 0.2 / rigidity(weak);
    expect(rel(b.yieldOnsetEnergy([1]), 0.5 * yieldTorque(weak) ** 2 * c)).toBeLessThan(1e-9);
    // The strong piece's T_Y is (25/20)³ = 1.95 times the weak one's, above the weak T_P (4/3 times): it never yields.
    expect(yieldTorque(strong)).toBeGreaterThan(plasticTorque(weak));
    expect(b.yieldOnsetEnergy([0])).toBe(Infinity);
  });
});

describe('PlasticBalance.energyAt', () => {
  it("is the state's energy at every twist rate, elastic and past yield, for pieces in series (property)", () => {
    const b = new PlasticBalance([piece(0.4, law(0.03, 0, 79.3e9, 300e6)), piece(0.25, law(0.02, 0, 79.3e9, 300e6)), piece(0.1, law(0.025, 0.01, 79.3e9, 300e6, 2e9))]);
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 5, noNaN: true }), (phi) => {
        expect(b.energyAt(phi)).toBe(b.stateAt(phi).energy);
      }),
      { numRuns: 100 },
    );
  });
});

describe('PlasticBalance.summaryForEnergy', () => {
  it("is the state's torque, summed permanent twist and fracture, elastic and past yield, with and without a fracture limit (property)", () => {
    // Independent calculation: the state itself (`stateForEnergy`), read piece by piece.
    const pieces = (fracture: number) => [piece(0.4, law(0.03, 0, 79.3e9, 300e6), fracture), piece(0.25, law(0.02, 0, 79.3e9, 300e6), fracture), piece(0.1, law(0.025, 0.01, 79.3e9, 300e6, 2e9))];
    fc.assert(
      fc.property(fc.double({ min: 0, max: 5e4, noNaN: true }), fc.constantFrom(Infinity, 0.5, 2), (energy, fracture) => {
        const b = new PlasticBalance(pieces(fracture));
        const state = b.stateForEnergy(energy);
        const s = b.summaryForEnergy(energy);
        expect(s.torque).toBe(state.torque);
        expect(s.permanentTwist).toBe(state.pieces.reduce((sum, p) => sum + p.permanentTwist, 0));
        expect(s.fractured).toBe(state.pieces.some((p) => p.fractured));
      }),
      { numRuns: 100 },
    );
  });
});

describe('PlasticBalance.permanentTwistAt', () => {
  it("is the state's permanent twist of the pieces asked for, added in their order, at every twist rate (property)", () => {
    // Independent calculation: the state itself (`stateAt`), its pieces summed one by one.
    const b = new PlasticBalance([piece(0.4, law(0.03, 0, 79.3e9, 300e6)), piece(0.25, law(0.02, 0, 79.3e9, 300e6)), piece(0.1, law(0.025, 0.01, 79.3e9, 300e6, 2e9))]);
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 5, noNaN: true }), fc.subarray([0, 1, 2], { minLength: 1 }), fc.double({ min: 0, max: 1, noNaN: true }), (phi, among, start) => {
        const pieces = b.stateAt(phi).pieces;
        expect(b.permanentTwistAt(phi, among, start)).toBe(among.reduce((sum, i) => sum + pieces[i].permanentTwist, start));
      }),
      { numRuns: 100 },
    );
  });
});
