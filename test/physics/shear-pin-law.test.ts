import { describe, expect, it } from 'vitest';
import { integrateChain } from '../../src/physics/integrator/integrate-chain.ts';
import { ShearPinLaw } from '../../src/physics/shear-pin-law.ts';
import { chain } from './integrator/chain-fixtures.ts';

describe('ShearPinLaw: a pin that parts and then carries nothing', () => {
  it('parts when the torque reaches its setting, located in time, and the inertia runs on with the rest of its energy', () => {
    // One mass on a spring after an instantaneous stop: T = ω0√(Jk)·sin(Ωt) (shared REFERENCE.md
    // 10.2), so T reaches T_p at t = asin(T_p/(ω0√(Jk)))/Ω; the pin's strain energy T_p²/(2k) is
    // released there and the mass keeps ½Jv² = ½Jω0² − T_p²/(2k).
    const J = 1;
    const k = 1e5;
    const w0 = 50;
    const Tp = 6000;
    const pin = new ShearPinLaw(k, Tp);
    const h = 1e-4;
    const r = integrateChain(chain({ J: [0, J], k: [k], speed: w0, laws: [pin] }), { duration: 0.02, timeStep: h });
    const parted = r.events.find((e) => e.what === 'parts')!;
    // Within the scheme's phase error (Ωh)²/12 (Hughes, The Finite Element Method, Sec. 9.1.5; from memory, confident).
    const exact = Math.asin(Tp / (w0 * Math.sqrt(J * k))) / Math.sqrt(k / J);
    expect(Math.abs(parted.time / exact - 1)).toBeLessThan((2 * (Math.sqrt(k / J) * h) ** 2) / 12);
    expect(Math.abs(parted.time / h - Math.round(parted.time / h))).toBeGreaterThan(0.01);
    expect(pin.isParted).toBe(true);
    expect(r.peakTorque[0]).toBeLessThanOrEqual(Tp * (1 + 1e-9));
    expect(r.history.elementTorque[0][r.history.time.length - 1]).toBe(0);
    const v = r.history.nodeSpeed[1][r.history.time.length - 1];
    expect(Math.abs(v / Math.sqrt(w0 ** 2 - Tp ** 2 / (k * J)) - 1)).toBeLessThan(1e-6);
    expect(pin.dissipated).toBeCloseTo(Tp ** 2 / (2 * k), 6);
    expect(r.energy.final + r.energy.released).toBeCloseTo(r.energy.initial, 6);
  });
});
