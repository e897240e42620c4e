import type { ChainSystem } from '../src/physics/integrator/chain-system.ts';
import { ElasticLaw } from '../src/physics/torque-law.ts';
import { polarMoment } from '../src/physics/torsion.ts';

/**
 * The benchmark's chain: a steel shaft 40 mm × 0.5 m (G = 79.3 GPa, ρ = 7850 kg/m³) with a disc of
 * 0.98646 kg·m² at its free end (the shared reference's 10.9 example: 32 Hz), split into n equal
 * elements with the shaft's inertia lumped, stopped instantly at the other end from 150 rpm.
 * Undamped, so its exact solution is the sum of its modes.
 */
export const BENCH = { d: 0.04, L: 0.5, G: 79.3e9, rho: 7850, disc: 0.98646, speed: (150 * 2 * Math.PI) / 60 };

export function uniformChain(n: number, damping = 0): ChainSystem {
  const Jp = polarMoment(BENCH.d);
  const le = BENCH.L / n;
  const k = (BENCH.G * Jp) / le;
  const je = BENCH.rho * Jp * le;
  const inertia = new Float64Array(n + 1);
  for (let e = 0; e < n; e++) {
    inertia[e] += je / 2;
    inertia[e + 1] += je / 2;
  }
  inertia[n] += BENCH.disc;
  return {
    inertia,
    laws: Array.from({ length: n }, () => new ElasticLaw(k)),
    damping: new Float64Array(n).fill(damping * k),
    elementInertia: new Float64Array(n).fill(je),
    initialTwist: new Float64Array(n),
    speed: BENCH.speed,
    stop: { node: 0, duration: 0 },
    drives: [],
  };
}
