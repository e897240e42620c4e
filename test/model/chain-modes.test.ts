import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { buildChain } from '../../src/model/chain.ts';
import { sideModes } from '../../src/model/chain-modes.ts';
import { buildShaftModel } from '../../src/model/shaft-model.ts';
import { polarMoment } from '../../src/physics/torsion.ts';

/** Root of β·tan β = r in (0, π/2), by bisection (independent of the code under test). */
function betaTanBeta(r: number): number {
  let lo = 0;
  let hi = Math.PI / 2 - 1e-15;
  for (let i = 0; i < 200; i++) {
    const mid = 0.5 * (lo + hi);
    if (mid * Math.tan(mid) < r) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

describe("sideModes: natural frequencies of a case's chain with the stop held", () => {
  it('a uniform shaft split finer converges to β·tan β = J_shaft/J_tip', () => {
    // Shared REFERENCE.md 2.8 (derived from the wave equation, fixed end and a disc at the free
    // end; Timoshenko, from memory, verify): (ωL/c)·tan(ωL/c) = J_s/J, c = √(G/ρ). Its table gives
    // ωL/c = 0.860334 for J_s/J = 1; the bisection below recomputes it.
    const d = 0.04;
    const L = 0.5;
    const probe = parseCase(
      `case: { id: B }\nspeed: 100 rpm\nstop: { at: a }\nshaft: { material: aisi-1045-cd, segments: [{ length: 500 mm, diameter: 40 mm }] }\nstations:\n  - { name: a, at: 0 mm }\n  - { name: b, at: 500 mm, parts: [{ shape: inertia, inertia: 1 kg*m^2 }] }\n`,
    );
    const m = probe.materials['aisi-1045-cd'];
    const Js = m.density! * polarMoment(d) * L;
    const beta = betaTanBeta(1);
    expect(beta).toBeCloseTo(0.860334, 6);
    const exact = (beta * Math.sqrt(m.shearModulus! / m.density!)) / L;
    const c = parseCase(
      `case: { id: B }\nspeed: 100 rpm\nstop: { at: a }\nshaft: { material: aisi-1045-cd, segments: [{ length: 500 mm, diameter: 40 mm }] }\nstations:\n  - { name: a, at: 0 mm }\n  - { name: b, at: 500 mm, parts: [{ shape: inertia, inertia: ${Js} kg*m^2 }] }\n`,
    );
    const model = buildShaftModel(c);
    const errors = [2, 4, 8, 16, 32, 64].map((n) => Math.abs(sideModes(buildChain(c, model, { elements: n, shaftInertia: true }), 1)[0].omega / exact - 1));
    for (let i = 1; i < errors.length; i++) expect(errors[i]).toBeLessThan(errors[i - 1]);
    expect(errors[errors.length - 1]).toBeLessThan(1e-4);
    // Lumped masses converge as 1/n²: each halving of the element length cuts the error about four times.
    expect(errors[4] / errors[5]).toBeGreaterThan(3.5);
  });

  it('two loaded stations on a side give the two-mass fixed–free frequencies', () => {
    // Shared REFERENCE.md 10.8 (derived): J1 = 2, J2 = 0.5 kg·m², k1 = 1e5, k2 = 5e4 N·m/rad →
    // 189.6343 and 372.8791 rad/s. Here k1 and k2 come from shaft lengths chosen to give them.
    const probe = parseCase(
      `case: { id: T }\nspeed: 100 rpm\nstop: { at: a }\nshaft: { material: aisi-1045-cd, segments: [{ length: 1 m, diameter: 40 mm }] }\nstations:\n  - { name: a, at: 0 mm }\n  - { name: b, at: 1 m, parts: [{ shape: inertia, inertia: 1 kg*m^2 }] }\n`,
    );
    const GJ = probe.materials['aisi-1045-cd'].shearModulus! * polarMoment(0.04);
    const L1 = (GJ / 1e5) * 1000;
    const L2 = (GJ / 5e4) * 1000;
    const c = parseCase(
      `case: { id: T }\nspeed: 100 rpm\nstop: { at: a }\nanalysis: { shaft_inertia: false }\nshaft: { material: aisi-1045-cd, segments: [{ length: ${L1} mm, diameter: 40 mm }, { length: ${L2} mm, diameter: 40 mm }] }\nstations:\n  - { name: a, at: 0 mm }\n  - { name: m1, at: ${L1} mm, parts: [{ shape: inertia, inertia: 2 kg*m^2 }] }\n  - { name: m2, at: ${L1 + L2} mm, parts: [{ shape: inertia, inertia: 0.5 kg*m^2 }] }\n`,
    );
    const modes = sideModes(buildChain(c, buildShaftModel(c), { elements: 1, shaftInertia: false }), 5);
    expect(modes).toHaveLength(2);
    expect(modes[0].omega).toBeCloseTo(189.6343, 3);
    expect(modes[1].omega).toBeCloseTo(372.8791, 3);
  });
});
