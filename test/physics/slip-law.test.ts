import { describe, expect, it } from 'vitest';
import { integrateChain } from '../../src/physics/integrator/integrate-chain.ts';
import { SlipLaw } from '../../src/physics/slip-law.ts';
import { chain, odexSlip } from './integrator/chain-fixtures.ts';

describe('SlipLaw: a friction torque limiter between the inertia and the jam', () => {
  // Shared REFERENCE.md 10.11 (derived): J = 1 kg·m², ω0 = 50 rad/s, k = 1e5 N·m/rad, T_s = 500 N·m:
  // slip time ≈ Jω0/T_s = 0.100 s, stored 1.25 J, dissipated 1248.75 J; without it 15 811 N·m.
  const run = (Ts: number, c = 0) => {
    const law = new SlipLaw(1e5, Ts);
    const r = integrateChain(chain({ J: [0, 1], k: [1e5], speed: 50, laws: [law], c: [c] }), { duration: 0.2, timeStep: 5e-5 });
    return { r, law };
  };

  it('caps the torque at the slip torque, and slip energy is the kinetic energy less what the shaft keeps', () => {
    const { r, law } = run(500);
    expect(r.peakTorque[0]).toBeLessThanOrEqual(500 * (1 + 1e-9));
    expect(r.peakTorque[0]).toBeGreaterThan(499.9);
    expect(law.dissipated).toBeCloseTo(0.5 * 1 * 50 ** 2 - 500 ** 2 / (2 * 1e5), 6);
    expect(r.energy.final).toBeCloseTo(1.25, 6);
    const start = r.events.find((e) => e.what === 'starts to slip')!.time;
    const end = r.events.find((e) => e.what === 'stops slipping')!.time;
    // It slips from the moment the spring reaches T_s until the inertia has been brought to rest by
    // T_s alone: J·v(t_start)/T_s, with v(t_start) = ω0·cos(asin(T_s/(ω0√(Jk)))). Times within the
    // scheme's phase error, (Ωh)²/12 (Hughes, The Finite Element Method, Sec. 9.1.5; from memory, confident).
    const phase = (Math.sqrt(1e5) * 5e-5) ** 2 / 12;
    const t0 = Math.asin(500 / (50 * Math.sqrt(1e5))) / Math.sqrt(1e5);
    expect(Math.abs(start / t0 - 1)).toBeLessThan(2 * phase);
    expect(Math.abs((end - start) / ((Math.cos(Math.sqrt(1e5) * t0) * 50) / 500) - 1)).toBeLessThan(1e-6);
    expect(end - start).toBeCloseTo(0.1, 3);
  });

  it('does nothing when set above the torque the stop can raise', () => {
    const { r, law } = run(20000);
    expect(law.dissipated).toBe(0);
    expect(r.events).toHaveLength(0);
    expect(r.peakTorque[0]).toBeCloseTo(50 * Math.sqrt(1e5), -1);
  });

  it('with slip, the energy dissipated equals the loss of total energy', () => {
    const { r } = run(2000, 3);
    const e = r.energy;
    expect(e.slipWork).toBeGreaterThan(0);
    expect(Math.abs(e.initial - e.final - e.slipWork - e.dampingWork) / e.initial).toBeLessThan(1e-9);
  });

  it('sticks again when the slip reverses, and carries torque elastically from there', () => {
    const law = new SlipLaw(1e5, 100, 0);
    law.commit(0.002);
    law.enter(0.002);
    expect(law.slipping).toBe(true);
    expect(law.torque(0.003)).toBe(100);
    law.commit(0.003);
    expect(law.slipAngle).toBeCloseTo(0.001, 12);
    law.enter(0.003);
    expect(law.slipping).toBe(false);
    expect(law.torque(0.0025)).toBeCloseTo(100 - 1e5 * 0.0005, 9);
  });
});

describe('SlipLaw with the shaft dashpot: damping acts on the slip as on a Kelvin–Voigt shaft in series with the slider (odex reference)', () => {
  const [J, k, Ts, w0] = [1, 1e5, 5000, 50];
  const wn = Math.sqrt(k / J);
  const run = (zeta: number) => {
    const c = ((2 * zeta) / wn) * k;
    const law = new SlipLaw(k, Ts, 0, c);
    const r = integrateChain(chain({ J: [0, J], k: [k], speed: w0, laws: [law], c: [c] }), { duration: 0.03, timeStep: 2e-6 });
    const start = r.events.find((e) => e.what === 'starts to slip')!.time;
    return { law, r, start, c };
  };

  for (const zeta of [0, 0.005, 0.05, 0.2]) {
    it(`at ζ = ${100 * zeta} % starts to slip when odex's reference does and does its slip work within 0.02 %`, () => {
      const { law, start, c } = run(zeta);
      const ref = odexSlip(J, k, c, Ts, w0);
      expect(Math.abs(start - ref.start)).toBeLessThan(1e-8);
      expect(Math.abs(law.dissipated / ref.slipWork - 1)).toBeLessThan(2e-4);
    });
  }

  it('takes less slip work and starts to slip earlier the more it is damped', () => {
    const runs = [0, 0.005, 0.05, 0.2].map(run);
    for (let i = 1; i < runs.length; i++) {
      expect(runs[i].law.dissipated).toBeLessThan(runs[i - 1].law.dissipated);
      expect(runs[i].start).toBeLessThanOrEqual(runs[i - 1].start);
    }
  });
});
