import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { withDiameters } from '../../src/resize/change-case.ts';
import { parseCase } from '../../src/case/parse-case.ts';
import { lowestFrequency, stiffnessChange } from '../../src/resize/stiffness-change.ts';
import { caseOf, caseText, rel } from '../helpers/layout.ts';

describe('what an option does to the stiffness and natural frequency (energy-method estimate)', () => {
  it('scaling every diameter by s makes the shaft s⁴ as stiff (J_p ∝ d⁴), the frequency s² and the torque s² higher', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 3, noNaN: true }), (s) => {
        const c = caseOf({
          rpm: 300,
          segments: [
            [200, 40, 0],
            [300, 50, 10],
          ],
          stations: [
            ['jam', 0, 0],
            ['disc', 500, 2],
          ],
          stop: 'jam',
        });
        const present = analyseCase(c);
        const scaled = analyseCase(
          withDiameters(
            c,
            new Map([
              [0, 0.04 * s],
              [1, 0.05 * s],
            ]),
          ),
        );
        const k = stiffnessChange(present, scaled, 'B');
        // k = G·J_p/L, J_p = π(d⁴ − di⁴)/32 (REFERENCE 1.1.2, 1.1.5); ω_n = √(k/J) (REFERENCE 10.1).
        return rel(k.stiffness, s ** 4) < 1e-9 && rel(k.frequency, s ** 2) < 1e-9 && rel(k.peakTorque, s ** 2) < 1e-9;
      }),
      // Each run is two solves of the whole engine; a few dozen scales prove the law.
      { numRuns: 25 },
    );
  });

  it('names its method', () => {
    const c = caseOf({
      rpm: 300,
      segments: [[500, 50, 0]],
      stations: [
        ['jam', 0, 0],
        ['disc', 500, 2],
      ],
      stop: 'jam',
    });
    expect(stiffnessChange(analyseCase(c), analyseCase(c), 'B').method).toMatch(/energy method/);
  });
});

describe('the natural-frequency shift through the dynamic model, where the verdict stands on it', () => {
  const layout = (d: number, analysis?: string) =>
    caseText({
      rpm: 300,
      segments: [[500, d, 0]],
      stations: [
        ['jam', 0, 0],
        ['disc', 500, 0.5],
      ],
      stop: 'jam',
      analysis,
    }).replace('stop: { at: jam }', 'stop: { at: jam, duration: 1 ms }');

  it("with the shaft's inertia left out, one disc: the shift is (d_new/d_old)², as √(k/J) with k ∝ d⁴", () => {
    // ω_n = √(k/J) for one mass on a massless shaft held at one end (REFERENCE 10.1).
    const present = analyseCase(parseCase(layout(40, '  shaft_inertia: false')));
    const option = analyseCase(parseCase(layout(50, '  shaft_inertia: false')));
    expect(present.verdictBasis).toBe('dynamic model');
    const k = stiffnessChange(present, option, 'B');
    expect(k.frequencyMethod).toBe('dynamic model');
    expect(k.method).toMatch(/dynamic model/);
    expect(rel(k.frequency, (50 / 40) ** 2)).toBeLessThan(1e-6);
  });

  it("with the shaft's inertia in, the shift follows Rayleigh's estimate √(k/(J + J_shaft/3)), not √(k/J)", () => {
    // Rayleigh: a uniform shaft held at one end with a disc at the other, ω² ≈ k/(J + J_s/3)
    // (Den Hartog, Mechanical Vibrations, Rayleigh's method; from memory, confident).
    // A 120 → 160 mm shaft 0.5 m long: J_s = ρπd⁴L/32, ρ = 7850 kg/m³; the disc 0.5 kg·m².
    const present = analyseCase(parseCase(layout(120)));
    const option = analyseCase(parseCase(layout(160)));
    const k = stiffnessChange(present, option, 'B');
    const js = (d: number) => (7850 * Math.PI * d ** 4 * 0.5) / 32;
    const rayleigh = Math.sqrt(((160 / 120) ** 4 * (0.5 + js(0.12) / 3)) / (0.5 + js(0.16) / 3));
    // Rayleigh's estimate is a little high for a heavy shaft: 1 % tolerance.
    expect(rel(k.frequency, rayleigh)).toBeLessThan(1e-2);
    expect(rel(k.frequency, (160 / 120) ** 2)).toBeGreaterThan(3e-2);
    expect(lowestFrequency(option, 'B')! / lowestFrequency(present, 'B')!).toBe(k.frequency);
  });

  it('where the energy method is exact, the shift stays its single-mass estimate', () => {
    const c = caseOf({
      rpm: 300,
      segments: [[500, 120, 0]],
      stations: [
        ['jam', 0, 0],
        ['disc', 500, 2],
      ],
      stop: 'jam',
    });
    const c2 = caseOf({
      rpm: 300,
      segments: [[500, 160, 0]],
      stations: [
        ['jam', 0, 0],
        ['disc', 500, 2],
      ],
      stop: 'jam',
    });
    const k = stiffnessChange(analyseCase(c), analyseCase(c2), 'B');
    expect(k.frequencyMethod).toBe('energy method');
    expect(rel(k.frequency, (160 / 120) ** 2)).toBeLessThan(1e-9);
  });
});
