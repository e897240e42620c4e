import { describe, expect, it } from 'vitest';
import { integrateChain } from '../../../src/physics/integrator/integrate-chain.ts';
import { chain, odexTorque, type ChainSpec } from './chain-fixtures.ts';

describe('end-face torques next to an instantaneously stopped node', () => {
  it('carry no dashpot torque: the peak stays within the largest elastic torque of the two neighbouring elements, as odex finds it', () => {
    // A free shaft of 6 equal elements (k, own inertia j, half lumped on each end), stopped at once
    // at node 0 and followed over the stop's wave (ten periods of an element's own mode), with stiffness-proportional dashpots c = β·k heavy enough
    // to overdamp the element's own mode (c/(2√(k·j)) = 3). The recorder's end-face torque of element
    // 0 at node 1 is T₀ − ½j·a₁; with a₁ from the law torques alone that is a weighted mean of T₀ and
    // T₁ (node 1 carries j: ½j from each side), so it can never exceed max(|T₀|, |T₁|). Taken from
    // the accelerations with the dashpots in, it carried half of c·Δω at the stop, which grows
    // without bound as the shaft is split finer. Independent check: the same chain, dashpots
    // included, solved by odex at tight tolerance; its elastic torques k·θ give the bound. (Before
    // the accelerations left the dashpots out, this peak came out at 3.4 times the bound.)
    const n = 6;
    const k = 2e6;
    const j = 2e-4;
    const c = 3 * 2 * Math.sqrt(k * j);
    const speed = 40;
    const J = [0.5 * j, ...Array.from({ length: n - 1 }, () => j), 0.5 * j];
    const spec: ChainSpec = { J, k: Array(n).fill(k), c: Array(n).fill(c), speed };
    const sys = { ...chain(spec), elementInertia: Float64Array.from({ length: n }, () => j) };
    const local = (2 * Math.PI) / (2 * Math.sqrt(k / j));
    const duration = 10 * local;
    const r = integrateChain(sys, { duration, timeStep: local / 40 });
    const times = Array.from({ length: 4001 }, (_, i) => (i * duration) / 4000);
    const T = odexTorque(spec, times);
    const bound = Math.max(...T.map((row) => Math.max(Math.abs(row[0]), Math.abs(row[1]))));
    const first = Math.max(...T.map((row) => Math.abs(row[0])));
    // The wave torque of the stop, ω√(k·j) (the lumped shaft's impedance), sets the scale.
    expect(first).toBeGreaterThan(0.3 * speed * Math.sqrt(k * j));
    // Tolerance 1 % for the integrator's step (40 per period of the element's own mode).
    expect(r.peakTorque[0]).toBeLessThan(1.01 * bound);
    expect(r.peakTorque[0]).toBeGreaterThan(0.99 * first);
  });
});
