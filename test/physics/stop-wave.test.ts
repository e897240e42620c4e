import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { integrateChain } from '../../src/physics/integrator/integrate-chain.ts';
import { stopWaveTorque } from '../../src/physics/stop-wave.ts';
import { polarMoment } from '../../src/physics/torsion.ts';
import { chain } from './integrator/chain-fixtures.ts';

describe('stopWaveTorque: the torsional stress wave of a sudden stop', () => {
  it('is the torque behind the front in a long lumped shaft stopped at once at one end, found by integrating the chain', () => {
    // Independent numerical computation: a 40 mm steel shaft (G = 79.3 GPa, ρ = 7850 kg/m³) split
    // into 200 elements of 5 mm (k = G·J_p/L, node inertia ρ·J_p·L, shared REFERENCE 2.4), free at
    // the far end, stopped at once at node 0 from 30 rad/s, no damping. Element 100 is reached by
    // the front after 100·√(J/k) and by the free end's reflection after 300·√(J/k); between, its
    // torque rings about the wave's value (the lumped chain's dispersion), so its mean is compared.
    const [G, rho, d, L, w] = [79.3e9, 7850, 0.04, 0.005, 30];
    const n = 200;
    const k = (G * polarMoment(d)) / L;
    const J = rho * polarMoment(d) * L;
    const tau = Math.sqrt(J / k);
    const sys = chain({ J: [0.5 * J, ...Array.from({ length: n - 1 }, () => J), 0.5 * J], k: Array(n).fill(k), speed: w });
    const r = integrateChain(sys, { duration: 280 * tau, timeStep: tau / 5, samples: 1401 });
    const { time, elementTorque } = r.history;
    const window = [...time.keys()].filter((i) => time[i] > 140 * tau && time[i] < 260 * tau);
    const mean = window.reduce((s, i) => s + elementTorque[100][i], 0) / window.length;
    // Sign: the node toward the shaft's end runs ahead of the stopped end, so the torque is positive.
    expect(Math.abs(mean / stopWaveTorque(w, G, rho, d) - 1)).toBeLessThan(0.02);
  });

  it('grows with the jump in speed and with J_p (as d⁴ for a solid shaft), and a bore takes off its share', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 300, noNaN: true }), fc.double({ min: 0.01, max: 0.5, noNaN: true }), fc.double({ min: 1.1, max: 3, noNaN: true }), (w, d, s) => {
        const T = stopWaveTorque(w, 80e9, 7850, d);
        expect(stopWaveTorque(s * w, 80e9, 7850, d) / T).toBeCloseTo(s, 9);
        expect(stopWaveTorque(-w, 80e9, 7850, d) / T).toBeCloseTo(1, 12);
        expect(stopWaveTorque(w, 80e9, 7850, s * d) / T / s ** 4).toBeCloseTo(1, 9);
        expect(stopWaveTorque(w, 80e9, 7850, d, d / s) / T / (1 - s ** -4)).toBeCloseTo(1, 9);
      }),
    );
  });
});
