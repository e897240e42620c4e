import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { buildShaftModel } from '../../src/model/shaft-model.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { MODE_TOLERANCE } from '../../src/results/mode-convergence.ts';

/**
 * A uniform steel shaft held at one end and free at the other (a token inertia marks the free
 * end's station). Its torsional natural frequencies are f_n = (2n − 1)/4 · (1/L)·√(G/ρ) (uniform
 * fixed–free shaft, the wave equation with θ = 0 at the fixed end and ∂θ/∂x = 0 at the free one;
 * Rao, Mechanical Vibrations, torsional vibration of shafts; from memory, verify the section).
 */
const G = 79.3e9;
const rho = 7850;
const L = 1;
const exact = (n: number) => ((2 * n - 1) / 4) * (1 / L) * Math.sqrt(G / rho);
const shaft = (analysis = '') => `case: { id: FREE-FIXED }
speed: 10 rpm
stop: { at: held end }
materials:
  steel: { shear_modulus: 79.3 GPa, yield_strength: 530 MPa, density: 7850 kg/m^3 }
shaft:
  material: steel
  segments:
    - { length: 1000 mm, diameter: 50 mm }
stations:
  - { name: held end, at: 0 mm }
  - { name: free end, at: 1000 mm, parts: [{ shape: inertia, inertia: 1e-9 kg*m^2 }] }
${analysis}`;

describe('modeFrequencies: which natural frequencies the element count resolves', () => {
  it('flags a mode converged only where it is within 1 % of the free–fixed closed form, and the lowest few are', () => {
    const r = analyseCase(parseCase(shaft()));
    const f = r.dynamic.frequencies;
    expect(f.length).toBeGreaterThan(3);
    f.forEach((m, i) => {
      // The one loaded side: the free end's.
      expect(m.side).toBe(r.sides[0].side);
      const err = Math.abs(m.frequency / exact(i + 1) - 1);
      if (m.converged) expect(err).toBeLessThan(MODE_TOLERANCE * 1.05);
      else expect(err).toBeGreaterThan(0.5 * MODE_TOLERANCE);
    });
    expect(f[0].converged).toBe(true);
    expect(Math.abs(f[0].frequency / exact(1) - 1)).toBeLessThan(MODE_TOLERANCE);
    // The same numbers as naturalFrequencies, in the same order.
    expect(f.map((m) => m.frequency)).toEqual(r.dynamic.naturalFrequencies);
  });

  it('at 4 elements flags the higher modes not converged, and at 40 the lowest three converged, as the closed form says', () => {
    const coarse = analyseCase(parseCase(shaft('analysis: { elements: 4 }\n'))).dynamic.frequencies;
    const fine = analyseCase(parseCase(shaft('analysis: { elements: 40 }\n'))).dynamic.frequencies;
    for (const [list, n] of [
      [coarse, 4],
      [fine, 40],
    ] as const) {
      list.forEach((m, i) => {
        const err = Math.abs(m.frequency / exact(i + 1) - 1);
        expect(m.converged, `${n} elements, mode ${i + 1}: ${(100 * err).toFixed(2)} % off`).toBe(err <= MODE_TOLERANCE * 1.05 ? m.converged : false);
      });
    }
    expect(coarse.slice(1).some((m) => !m.converged)).toBe(true);
    expect(fine.slice(0, 3).every((m) => m.converged)).toBe(true);
  });

  it("without the shaft's inertia the chain is exact for its lumped masses: every mode converged", () => {
    const c = parseCase(shaft('analysis: { shaft_inertia: false }\n').replace('1e-9 kg*m^2', '2 kg*m^2'));
    expect(buildShaftModel(c).sides).toHaveLength(1);
    const f = analyseCase(c).dynamic.frequencies;
    expect(f.every((m) => m.converged && m.refinedFrequency === m.frequency)).toBe(true);
  });
});
