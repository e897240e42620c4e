// A one-way node (ChainSystem.holds: a backstop, a self-locking gearbox) in the integrator.
import { describe, expect, it } from 'vitest';
import { integrateChain, type IntegrationResult } from '../../../src/physics/integrator/integrate-chain.ts';
import { chain } from './chain-fixtures.ts';

const books = (r: IntegrationResult) => {
  const e = r.energy;
  return e.final - (e.initial + e.motorWork + e.boundaryWork - e.dampingWork - e.slipWork - e.released);
};

describe('integrateChain: a node that cannot turn backwards', () => {
  // One mass J on a massless spring k, the spring's other end stopped at once from ω0 (the jam).
  const J = 2;
  const k = 5e4;
  const w0 = 12;
  const Tn = (2 * Math.PI) / Math.sqrt(k / J);
  const opts = { duration: 3 * Tn, timeStep: Tn / 200 };
  const minSpeed = (r: IntegrationResult) => Math.min(...r.history.nodeSpeed[1]);

  it('without it the mass swings back to −ω0 (undamped); with it its speed never goes below zero', () => {
    const free = integrateChain(chain({ J: [0, J], k: [k], speed: w0 }), opts);
    // Undamped free vibration about the stop: v(t) = ω0·cos(ωn·t), reaching −ω0 half a period on.
    expect(minSpeed(free) / w0).toBeLessThan(-0.99);
    const held = integrateChain({ ...chain({ J: [0, J], k: [k], speed: w0 }), holds: [1] }, opts);
    expect(minSpeed(held)).toBeGreaterThanOrEqual(-1e-9 * w0);
    expect(held.events.filter((e) => e.source.kind === 'hold').map((e) => e.what)).toEqual(['holds the shaft against turning backwards']);
  });

  it('the backstop catches the mass at its wound-up twist and holds the spring torque k·θ = ω0·√(J·k)', () => {
    // Independent calculation: the mass stops where its kinetic energy is all in the spring,
    // ½Jω0² = ½kθ², so θ = ω0·√(J/k), a quarter period after the stop (Den Hartog, Mechanical
    // Vibrations, the undamped single-degree system; from memory, confident). Caught there, it is
    // held against k·θ for good: nothing else acts.
    const held = integrateChain({ ...chain({ J: [0, J], k: [k], speed: w0 }), holds: [1] }, opts);
    const theta = w0 * Math.sqrt(J / k);
    expect(held.holds[0].peakTorque / (k * theta) - 1).toBeCloseTo(0, 3);
    expect(held.events.find((e) => e.source.kind === 'hold')!.time / Tn).toBeCloseTo(0.25, 3);
    // Held to the window's end at the same twist.
    const twist = held.history.elementTwist[0];
    expect(twist[twist.length - 1] / theta).toBeCloseTo(1, 4);
    expect(Math.abs(books(held))).toBeLessThan(1e-6 * 0.5 * J * w0 ** 2);
  });

  it('with a forward drive torque T_d it is caught at its largest twist and holds k·θ − T_d = √(T_d² + J·k·ω0²)', () => {
    // The peak is T_d + √(T_d² + J·k·ω0²) (shared REFERENCE.md 10.4 with no running torque before the
    // stop); at that twist the mass is at rest and the spring's torque beats the drive's, so the
    // backstop catches it there and holds the difference for good.
    const Td = 300;
    const line = { speeds: [0], torques: [Td] };
    const held = integrateChain({ ...chain({ J: [0, J], k: [k], speed: w0, drives: [{ node: 1, line, rotorInertia: 0 }] }), holds: [1] }, opts);
    const peak = Td + Math.sqrt(Td ** 2 + J * k * w0 ** 2);
    expect(minSpeed(held)).toBeGreaterThanOrEqual(-1e-9 * w0);
    expect(held.peakTorque[0] / peak - 1).toBeCloseTo(0, 3);
    expect(held.holds[0].peakTorque / (peak - Td) - 1).toBeCloseTo(0, 3);
    expect(Math.abs(books(held))).toBeLessThan(1e-6 * 0.5 * J * w0 ** 2);
  });

  it('a light held node between two springs is let go when the mass beyond pulls it forward again, and never turns backwards', () => {
    // Stop — k — light node (one-way) — k — heavy mass: the light node rings against the stop
    // faster than the mass swings, so it is caught and let go as the outer spring winds up.
    const sys = { ...chain({ J: [0, 0.01, J], k: [k, k], speed: w0 }), holds: [1] };
    const r = integrateChain(sys, opts);
    const whats = r.events.filter((e) => e.source.kind === 'hold').map((e) => e.what);
    expect(whats).toContain('holds the shaft against turning backwards');
    expect(whats).toContain('lets the shaft go forward again');
    expect(Math.min(...r.history.nodeSpeed[1])).toBeGreaterThanOrEqual(-1e-9 * w0);
    expect(Math.abs(books(r))).toBeLessThan(1e-6 * 0.5 * J * w0 ** 2);
  });
});
