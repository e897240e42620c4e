import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { integrateChain, type IntegrationResult } from '../../../src/physics/integrator/integrate-chain.ts';
import type { TorqueLaw } from '../../../src/physics/torque-law.ts';
import { torqueForEnergy } from '../../../src/physics/torsion.ts';
import { chain, odexTorque } from './chain-fixtures.ts';

const books = (r: IntegrationResult) => {
  const e = r.energy;
  return e.final - (e.initial + e.motorWork + e.boundaryWork - e.dampingWork - e.slipWork - e.released);
};

describe('integrateChain: one mass on a massless shaft', () => {
  const J = 0.98646;
  const k = 3.9861e4;
  const w0 = (150 * 2 * Math.PI) / 60;
  const Tn = (2 * Math.PI) / Math.sqrt(k / J);

  it('an instantaneous stop gives peak twist ω0√(J/k) and peak torque ω0√(Jk), equal to the energy method within 0.1 %', () => {
    // Shared REFERENCE.md 10.2 (energy ½Jω0² = ½kθ²; Den Hartog, Thomson & Dahleh; from memory,
    // confident) and 10.9 (J = 0.986460 kg·m², k = 3.98610e4 N·m/rad, 150 rpm → T = 3114.8 N·m).
    const r = integrateChain(chain({ J: [0, J], k: [k], speed: w0 }), { duration: 2 * Tn, timeStep: Tn / 120 });
    const peak = r.peakTorque[0];
    expect(Math.abs(peak / (w0 * Math.sqrt(J * k)) - 1)).toBeLessThan(1e-3);
    expect(Math.abs(peak / k / (w0 * Math.sqrt(J / k)) - 1)).toBeLessThan(1e-3);
    expect(Math.abs(peak / 3114.8 - 1)).toBeLessThan(1e-3);
    // The energy method's T = √(2E/C) (Gere & Goodno, Mechanics of Materials 7th ed., Problem 3.9-11).
    expect(Math.abs(peak / torqueForEnergy(0.5 * J * w0 ** 2, 1 / k) - 1)).toBeLessThan(1e-3);
    // The peak comes a quarter period after the stop.
    expect(r.peakTime[0] / Tn).toBeCloseTo(0.25, 2);
  });

  it.each([0.05, 0.1, 0.25, 0.4, 0.5, 0.75, 1, 2, 3])('a stop ramped over τ = %s natural periods gives the velocity-ramp shock factor within 0.5 %', (tau) => {
    // Derivation (shared REFERENCE.md 10.6, derived; ODE-checked there): with θ = φ_J − φ_jam and the
    // jam decelerating at α = ω0/t_r, Jθ̈ = −kθ + Jα for 0 < t < t_r, θ(0) = θ̇(0) = 0, so
    // θ = (α/ωn²)(1 − cos ωn·t) during the ramp and θ = (α/ωn²)[cos ωn(t − t_r) − cos ωn·t] after it,
    // of amplitude (2α/ωn²)|sin(ωn·t_r/2)|. The ramp's own maximum is 2α/ωn² if it lasts past half a
    // period. With θ0 = ω0/ωn and τ = t_r/T_n: R = θmax/θ0 = sin(πτ)/(πτ) for τ ≤ ½ (the later
    // free vibration is larger), and 2α/ωn²/θ0 = 1/(πτ) for τ ≥ ½ (the ramp's own peak is).
    const tr = tau * Tn;
    const r = integrateChain(chain({ J: [0, J], k: [k], speed: w0, ramp: tr }), { duration: tr + 1.5 * Tn, timeStep: Math.min(Tn / 120, tr / 40) });
    const R = tau <= 0.5 ? Math.sin(Math.PI * tau) / (Math.PI * tau) : 1 / (Math.PI * tau);
    expect(Math.abs(r.peakTorque[0] / (w0 * Math.sqrt(J * k)) / R - 1)).toBeLessThan(5e-3);
  });

  it('with a steady drive torque T_d before and after, the peak is T_d + ω0√(Jk)', () => {
    // Shared REFERENCE.md 10.3 (derived; ODE check there: J = 1, k = 1e4, ω0 = 10, T_d = 50 → 1050).
    const line = { speeds: [0], torques: [50] };
    const r = integrateChain(chain({ J: [0, 1], k: [1e4], speed: 10, preload: [50], drives: [{ node: 1, line, rotorInertia: 0 }] }), { duration: 0.1, timeStep: 1e-4 });
    expect(r.peakTorque[0]).toBeCloseTo(1050, 0);
  });

  it('with the drive torque rising to T_b at the stop, the peak is T_b + √((T_b − T_d)² + Jkω0²)', () => {
    // Shared REFERENCE.md 10.4 (derived; ODE check there with T_b = 150: 1154.987).
    const line = { speeds: [0], torques: [150] };
    const r = integrateChain(chain({ J: [0, 1], k: [1e4], speed: 10, preload: [50], drives: [{ node: 1, line, rotorInertia: 0 }] }), { duration: 0.1, timeStep: 1e-4 });
    expect(r.peakTorque[0]).toBeCloseTo(150 + Math.sqrt(100 ** 2 + 1e4 * 100), 0);
  });

  it("locates the moment the motor's speed reaches zero: a quarter period after the stop under its own running torque", () => {
    // With T_b = T_d the mass swings about the running twist T_d/k at speed ω0·cos(ωn·t) (10.3),
    // so it is at rest at t = T_n/4 = 15.708 ms, between the steps of 0.2 ms.
    const line = { speeds: [0], torques: [50] };
    const h = 2e-4;
    const r = integrateChain(chain({ J: [0, 1], k: [1e4], speed: 10, preload: [50], drives: [{ node: 1, line, rotorInertia: 0 }] }), { duration: 0.03, timeStep: h });
    const stall = r.events.find((e) => e.what === 'reaches standstill');
    expect(stall).toBeDefined();
    // Within the scheme's phase error, (ωn·h)²/12 of the time (Hughes, The Finite Element Method, Sec. 9.1.5; from memory, confident).
    expect(Math.abs(stall!.time - (2 * Math.PI) / 100 / 4)).toBeLessThan(((100 * h) ** 2 / 12) * 0.016 * 1.5);
    expect(Math.abs(stall!.time / h - Math.round(stall!.time / h))).toBeGreaterThan(0.01);
  });
});

describe('integrateChain: the properties of the scheme', () => {
  it('conserves energy to 1e-6 with no damping and no slip', () => {
    const r = integrateChain(chain({ J: [0, 0.01, 0.01, 0.3, 0.01, 2], k: [2e6, 2e6, 1e6, 1e6, 5e5], speed: 100 }), { duration: 0.5, timeStep: 2e-5 });
    expect(Math.abs(r.energy.final / r.energy.initial - 1)).toBeLessThan(1e-6);
    expect(r.energy.dampingWork).toBe(0);
  });

  it('closes its energy books with damping, a ramped stop and a motor', () => {
    const r = integrateChain(
      chain({
        J: [0.5, 0.2, 1.5],
        k: [4e5, 2e5],
        c: [20, 10],
        speed: 60,
        ramp: 0.004,
        preload: [300, 300],
        drives: [{ node: 2, line: { speeds: [0, 50, 70], torques: [900, 700, 0] }, rotorInertia: 0 }],
      }),
      { duration: 0.2, timeStep: 5e-5 },
    );
    expect(Math.abs(books(r)) / r.energy.initial).toBeLessThan(1e-9);
    expect(r.energy.dampingWork).toBeGreaterThan(0);
    // Each element's dashpot work is booked on its own, and they add up to the total.
    expect(r.elementDampingWork[0]).toBeGreaterThan(0);
    expect(r.elementDampingWork[1]).toBeGreaterThan(0);
    expect(r.elementDampingWork[0] + r.elementDampingWork[1]).toBeCloseTo(r.energy.dampingWork, 9);
  });

  it("one mass on one damped spring: over a full ring-down the dashpot's work equals the energy the stop left, ½Jω0²", () => {
    // c = 2ζ√(kJ) at ζ = 5 %; 30 natural periods leave e^(−4π·0.05·30) ≈ 6e-9 of the energy.
    const J = 1;
    const k = 1e4;
    const c = 2 * 0.05 * Math.sqrt(k * J);
    const Tn = (2 * Math.PI) / Math.sqrt(k / J);
    const r = integrateChain(chain({ J: [0, J], k: [k], c: [c], speed: 10 }), { duration: 30 * Tn, timeStep: Tn / 120 });
    expect(Math.abs(r.elementDampingWork[0] / (0.5 * J * 10 ** 2) - 1)).toBeLessThan(1e-6);
    expect(r.elementDampingWork[0]).toBe(r.energy.dampingWork);
  });

  it('follows a three-mass chain with a ramped stop, damping and a motor curve as odex does at tight tolerance', () => {
    const spec = {
      J: [0, 1.2, 0.4, 2.5],
      k: [3e5, 1.5e5, 1e5],
      c: [15, 8, 5],
      speed: 40,
      ramp: 0.006,
      preload: [200, 200, 200],
      drives: [{ node: 3, line: { speeds: [0, 30, 42], torques: [600, 500, 150] }, rotorInertia: 0 }],
    };
    const times = Array.from({ length: 201 }, (_, i) => i * 5e-4);
    const ref = odexTorque(spec, times);
    const r = integrateChain(chain(spec), { duration: 0.1, timeStep: 2e-6, samples: times.length });
    const peak = Math.max(...ref.map((row) => Math.abs(row[0])));
    for (let e = 0; e < 3; e++) {
      const err = Math.max(...times.map((_, i) => Math.abs(r.history.elementTorque[e][i] - ref[i][e])));
      expect(err / peak).toBeLessThan(1e-4);
    }
  });

  it('is second-order: halving the step quarters the error', () => {
    const spec = { J: [0, 1, 0.5], k: [2e5, 1e5], speed: 30 };
    const times = Array.from({ length: 41 }, (_, i) => i * 1e-3);
    const ref = odexTorque(spec, times);
    const err = (h: number) => {
      const r = integrateChain(chain(spec), { duration: 0.04, timeStep: h, samples: times.length });
      return Math.max(...times.map((_, i) => Math.abs(r.history.elementTorque[0][i] - ref[i][0])));
    };
    const ratio = err(1e-4) / err(5e-5);
    expect(ratio).toBeGreaterThan(3.6);
    expect(ratio).toBeLessThan(4.4);
  });

  it('takes a law that is not affine (a hardening spring) through its Newton iteration, matching odex', () => {
    // A test law T = k·θ·(1 + (θ/θr)²), standing in for the plastic law a later issue plugs in.
    const k0 = 2e5;
    const thr = 0.01;
    class Hardening implements TorqueLaw {
      readonly kind = 'hardening test spring';
      readonly affine = false;
      readonly dissipated = 0;
      readonly offset = 0;
      readonly stiffness = k0;
      torque(t: number) {
        return k0 * t * (1 + (t / thr) ** 2);
      }
      tangent(t: number) {
        return k0 * (1 + 3 * (t / thr) ** 2);
      }
      damped() {
        return true;
      }
      leave() {
        return -1;
      }
      enter() {
        return 'no change';
      }
      commit() {}
      energy(t: number) {
        return k0 * ((t * t) / 2 + t ** 4 / (4 * thr * thr));
      }
    }
    const spec = { J: [0, 1], k: [k0], speed: 20 };
    const times = Array.from({ length: 51 }, (_, i) => i * 4e-4);
    const ref = odexTorque(spec, times, 1e-11, (_, t) => k0 * t * (1 + (t / thr) ** 2));
    const r = integrateChain(chain({ ...spec, laws: [new Hardening()] }), { duration: 0.02, timeStep: 1e-6, samples: times.length });
    const peak = Math.max(...ref.map((row) => Math.abs(row[0])));
    expect(Math.max(...times.map((_, i) => Math.abs(r.history.elementTorque[0][i] - ref[i][0]))) / peak).toBeLessThan(1e-4);
    expect(Math.abs(books(r)) / r.energy.initial).toBeLessThan(1e-6);
  });

  it('peak torque scales with the speed at the stop', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 300, noNaN: true }), fc.double({ min: 0.1, max: 10, noNaN: true }), (w, s) => {
        const run = (speed: number) => integrateChain(chain({ J: [0, 1, 0.3], k: [2e5, 1e5], speed, c: [5, 2] }), { duration: 0.03, timeStep: 5e-5 }).peakTorque;
        const a = run(w);
        const b = run(w * s);
        return Math.abs(b[0] / (a[0] * s) - 1) < 1e-9 && Math.abs(b[1] / (a[1] * s) - 1) < 1e-9;
      }),
      { numRuns: 20 },
    );
  });
});
