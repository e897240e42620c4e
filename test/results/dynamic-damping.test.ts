import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { RINGS_ON_RATIO } from '../../src/results/dynamic-damping.ts';

// A disc of 2 kg·m² at 100 rpm on a 40 mm × 500 mm steel shaft (G = 79.3 GPa, Shigley 9th ed.
// Table A-5) with a flexible coupling of 20 kN·m/rad in it; the other end jams at once. Without the
// shaft's own inertia the chain is one mass on two springs in series (as in coupling-checks.test.ts).
const text = (coupling: string, analysis: string) => `
case: { id: DAMPED }
speed: 100 rpm
stop: { at: jam }
shaft:
  material: aisi-1045-cd
  segments:
    - { length: 500 mm, diameter: 40 mm, damping_ratio: 1 %, coupling: ${coupling} }
stations:
  - { name: jam, at: 0 mm }
  - { name: disc, at: 500 mm, parts: [{ shape: inertia, inertia: 2 kg*m^2 }] }
analysis: { shaft_inertia: false, dynamic_plasticity: false, ${analysis} }
`;
const J = 2;
const ks = (79.3e9 * Math.PI * 0.04 ** 4) / 32 / 0.5;
const kc = 20e3;
const k = (ks * kc) / (ks + kc);
const w0 = (100 * 2 * Math.PI) / 60;
const E0 = 0.5 * J * w0 ** 2;

/**
 * The exact two-spring chain, written here independently of the program: the disc (angle θ, speed
 * v) on the shaft's spring and dashpot (k_s, c_s, twist x) in series with the coupling's (k_c, c_c,
 * twist θ − x), with no inertia between them, so both carry one torque:
 *   k_s·x + c_s·ẋ = k_c·(θ − x) + c_c·(v − ẋ),   J·v̇ = −(k_s·x + c_s·ẋ).
 * Classical fourth-order Runge–Kutta; returns the energy each dashpot dissipated over `duration`.
 */
function seriesRingDown(cs: number, cc: number, duration: number): { shaft: number; coupling: number } {
  const xdot = (th: number, v: number, x: number) => (kc * (th - x) + cc * v - ks * x) / (cs + cc);
  const f = (y: number[]): number[] => {
    const [th, v, x] = y;
    const xd = xdot(th, v, x);
    const T = ks * x + cs * xd;
    return [v, -T / J, xd, cs * xd * xd, cc * (v - xd) ** 2];
  };
  const h = 2e-5;
  let y = [0, w0, 0, 0, 0];
  const steps = Math.round(duration / h);
  for (let i = 0; i < steps; i++) {
    const a = f(y);
    const b = f(y.map((q, j) => q + 0.5 * h * a[j]));
    const c = f(y.map((q, j) => q + 0.5 * h * b[j]));
    const d = f(y.map((q, j) => q + h * c[j]));
    y = y.map((q, j) => q + (h / 6) * (a[j] + 2 * b[j] + 2 * c[j] + d[j]));
  }
  return { shaft: y[3], coupling: y[4] };
}

describe('dynamicDamping: which damper took the energy', () => {
  it('one mass on one damped spring: over a full ring-down the damper takes all the energy the stop left (energy balance)', () => {
    // Rigid coupling (no stiffness): one spring, the shaft's, at 5 % of critical; 2 s are some 26
    // periods, after which e^(−4π·0.05·26) ≈ 1e-7 of the energy is left.
    const r = analyseCase(parseCase(text('{ rated_torque: 1 kN*m }', 'damping_ratio: 5 %, duration: 2 s').replace('damping_ratio: 1 %, ', '')));
    const d = r.dynamic.damping;
    expect(d.dampers).toHaveLength(1);
    expect(d.dampers[0]).toMatchObject({ kind: 'shaft', dampingRatio: 0.05, share: 1 });
    expect(Math.abs(d.total / E0 - 1)).toBeLessThan(1e-5);
    expect(Math.abs(d.dampers[0].energy / E0 - 1)).toBeLessThan(1e-5);
  });

  it("shaft and coupling dampers in series: each one's energy agrees with the exact two-spring chain integrated here within 0.5 % of the energy dissipated", () => {
    const r = analyseCase(parseCase(text('{ stiffness: 20 kN*m/rad, rated_torque: 1 kN*m, damping_ratio: 4 % }', 'damping_ratio: 0.5 %')));
    const d = r.dynamic.damping;
    const w1 = Math.sqrt(k / J);
    const exact = seriesRingDown((2 * 0.01 * ks) / w1, (2 * 0.04 * kc) / w1, r.dynamic.duration);
    const coupling = d.dampers.find((x) => x.kind === 'coupling')!;
    const shaft = d.dampers.find((x) => x.kind === 'shaft')!;
    expect(coupling.segment?.index).toBe(0);
    expect(shaft.segment?.index).toBe(0);
    expect(shaft.dampingRatio).toBe(0.01);
    // The program shares the element's dissipation as ζ_i·C_i, exact to first order in the damping;
    // the exact chain's springs twist by T/(k_i + iωc_i), which moves the split by the order of
    // 4ζ_i² (here some 0.2 % of the total: 92.6 J against 92.5 J, 11.6 J against 11.8 J).
    const total = exact.shaft + exact.coupling;
    expect(Math.abs(d.total / total - 1)).toBeLessThan(0.005);
    expect(Math.abs(coupling.energy - exact.coupling) / total).toBeLessThan(0.005);
    expect(Math.abs(shaft.energy - exact.shaft) / total).toBeLessThan(0.005);
    // And the coupling, some eight times as damping, dominates.
    expect(coupling.share).toBeGreaterThan(0.85);
    // To first order the split is ζ_i·C_i: 0.04/k_c against 0.01/k_s.
    const wc = 0.04 / kc;
    const ws = 0.01 / ks;
    expect(coupling.share).toBeCloseTo(wc / (wc + ws), 9);
    expect(coupling.share + shaft.share).toBeCloseTo(1, 12);
    expect(d.dampers[0]).toBe(coupling);
  });

  it('the lowest mode takes the strain-energy weighted ratio Σζ_i·C_i/ΣC_i: the energy left after n periods is e^(−4πζn)', () => {
    // The modal damping of Rayleigh damping with stiffness-proportional terms of their own per
    // spring, for one mode: ζ = Σ ζ_i·U_i / Σ U_i, U_i ∝ C_i under one torque (derived; see element-damping.ts).
    const zeta = (0.04 / kc + 0.01 / ks) / (1 / kc + 1 / ks);
    const Tn = (2 * Math.PI) / Math.sqrt(k / J);
    const r = analyseCase(parseCase(text('{ stiffness: 20 kN*m/rad, rated_torque: 1 kN*m, damping_ratio: 4 % }', `duration: ${(10 * Tn * 1000).toFixed(6)} ms`)));
    const left = 1 - r.dynamic.damping.total / E0;
    // Energy decays as e^(−2ζω_n·t) for light damping (its ripple within a period is of order ζ).
    expect(Math.abs(Math.log(left) / (-4 * Math.PI * zeta * 10) - 1)).toBeLessThan(0.03);
  });
});

describe('dynamicDamping: whether the response still rings at the end of the window', () => {
  const ringing = (ratio: string) => analyseCase(parseCase(text('{ rated_torque: 1 kN*m }', `damping_ratio: ${ratio}`).replace('damping_ratio: 1 %, ', ''))).dynamic.damping.ringing!;

  it('rings on at constant amplitude without damping', () => {
    const g = ringing('0');
    expect(g.ringsOn).toBe(true);
    expect(Math.abs(g.ratio - 1)).toBeLessThan(0.01);
    expect(Math.abs(g.firstCycle / (w0 * Math.sqrt(J * ks)) - 1)).toBeLessThan(0.01);
  });

  it('does not at a few percent of critical: the last cycle keeps e^(−2πζ·n) of the first', () => {
    const g = ringing('3 %');
    expect(g.ringsOn).toBe(false);
    expect(g.ratio).toBeLessThan(RINGS_ON_RATIO);
    expect(g.ratio).toBeGreaterThan(0);
  });
});
