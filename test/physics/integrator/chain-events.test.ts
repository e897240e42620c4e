import { describe, expect, it } from 'vitest';
import { integrateChain } from '../../../src/physics/integrator/integrate-chain.ts';
import { chain } from './chain-fixtures.ts';

const none = { speeds: [0], torques: [0] };

describe('belts and a soft jam: rigid until they slip, then Coulomb', () => {
  it('a belt slips when it must carry more than its slip torque, and the shaft peak follows the closed form', () => {
    // Derived here. Sheave J_S on a spring k to the stopped jam, rotor J_R behind a belt of slip
    // torque T_b, the motor giving nothing. Stuck: θ = (ω0/Ω1)·sin Ω1t, Ω1 = √(k/(J_S+J_R)), and the
    // belt carries the rotor's deceleration J_R·kθ/(J_S+J_R); it slips at θ1 = T_b(J_S+J_R)/(J_R·k),
    // with θ̇1 = ω0·cos(asin(θ1Ω1/ω0)). Then J_S·θ̈ = −kθ + T_b, so θ = T_b/k + A·sin(Ω2(t−t1) + ψ),
    // Ω2 = √(k/J_S), A = √((θ1 − T_b/k)² + (θ̇1/Ω2)²), and the peak torque is T_b + k·A (the rotor,
    // decelerated by T_b alone, still runs faster than the sheave at that moment).
    const [JS, JR, k, w0, Tb] = [1, 2, 1e5, 50, 800];
    const r = integrateChain(chain({ J: [0, JS], k: [k], speed: w0, drives: [{ node: 1, line: none, rotorInertia: JR, beltSlipTorque: Tb }] }), { duration: 0.012, timeStep: 1e-6 });
    const W1 = Math.sqrt(k / (JS + JR));
    const W2 = Math.sqrt(k / JS);
    const th1 = (Tb * (JS + JR)) / (JR * k);
    const dth1 = w0 * Math.cos(Math.asin((th1 * W1) / w0));
    const A = Math.sqrt((th1 - Tb / k) ** 2 + (dth1 / W2) ** 2);
    expect(r.events[0].what).toBe('starts to slip');
    expect(r.events[0].time).toBeCloseTo(Math.asin((th1 * W1) / w0) / W1, 8);
    expect(Math.abs(r.peakTorque[0] / (Tb + k * A) - 1)).toBeLessThan(1e-4);
    expect(r.belts[0]!.peakTorque).toBeLessThanOrEqual(Tb * (1 + 1e-9));
  });

  it("the belt's friction work accounts for the energy lost, with the motor's work added", () => {
    const r = integrateChain(
      chain({ J: [0, 1], k: [1e5], c: [4], speed: 50, preload: [300], drives: [{ node: 1, line: { speeds: [0, 40, 52], torques: [900, 1100, 0] }, rotorInertia: 2, beltSlipTorque: 1200 }] }),
      { duration: 0.5, timeStep: 5e-5 },
    );
    const e = r.energy;
    expect(r.belts[0]!.slipWork).toBeGreaterThan(0);
    expect(Math.abs(e.final - (e.initial + e.motorWork - e.dampingWork - e.slipWork)) / e.initial).toBeLessThan(1e-9);
  });

  it('a jam that can hold any torque is the limit of a soft jam of great capacity', () => {
    const rigid = integrateChain(chain({ J: [0.5, 1], k: [1e5], speed: 50 }), { duration: 0.03, timeStep: 2e-5 });
    const soft = integrateChain(chain({ J: [0.5, 1], k: [1e5], speed: 50, torqueCapacity: 1e8 }), { duration: 0.03, timeStep: 2e-5 });
    expect(Math.abs(soft.peakTorque[0] / rigid.peakTorque[0] - 1)).toBeLessThan(1e-3);
    expect(soft.events.some((e) => e.what === 'holds again')).toBe(true);
  });

  it('a soft jam never carries more than its capacity, and its friction work closes the energy books', () => {
    const r = integrateChain(chain({ J: [0.5, 1], k: [1e5], speed: 50, torqueCapacity: 3000, ramp: 0.01 }), { duration: 0.2, timeStep: 2e-5 });
    expect(r.peakJamTorque).toBeLessThanOrEqual(3000 * (1 + 1e-9));
    expect(r.jam!.slipWork).toBeGreaterThan(0);
    const e = r.energy;
    expect(Math.abs(e.final - (e.initial + e.boundaryWork - e.slipWork)) / e.initial).toBeLessThan(1e-9);
  });

  it("a soft jam that cannot give the ramp's deceleration slips from the start", () => {
    // The stop node (0.5 kg·m²) would need 0.5·50/0.001 = 25 kN·m to follow a 1 ms ramp; the jam holds 3 kN·m.
    const r = integrateChain(chain({ J: [0.5, 1], k: [1e5], speed: 50, torqueCapacity: 3000, ramp: 0.001 }), { duration: 0.05, timeStep: 2e-5 });
    expect(r.events[0]).toMatchObject({ time: 0, what: 'starts to slip' });
  });
});
