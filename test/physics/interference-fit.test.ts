import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { contactPressure, fitSlipTorque, hubBoreHoopStress } from '../../src/physics/interference-fit.ts';

const steel = { elasticModulus: 207e9, poissonRatio: 0.292 }; // Shigley 9th ed. Table A-5 (from memory, confident)
const rel = (a: number, b: number) => Math.abs(a / b - 1);

describe('shrink and press fits (Shigley 9th ed. Sec. 3-16 and 7-8)', () => {
  it('contactPressure for one material and a solid shaft is the closed form p = E·δ_d·(1 − (d/D)²)/(2d) (Shigley Eq. 3-57 with r_i = 0; from memory, verify the number)', () => {
    // d = 50 mm seat, D = 100 mm hub, 0.05 mm diametral interference, E = 207 GPa:
    // p = 207e9 × 0.05e-3 × (1 − 0.25)/(2 × 0.05) = 77.625 MPa (derived by hand).
    const p = contactPressure({ seatDiameter: 0.05, hubOuterDiameter: 0.1, shaftBore: 0, interference: 0.05e-3 }, steel, steel);
    expect(rel(p, 77.625e6)).toBeLessThan(1e-12);
  });

  it('fitSlipTorque is T = π·μ·p·d²·L/2 (Shigley 9th ed. Sec. 7-8; from memory, confident): 2194.8 N·m for the fit above, μ = 0.12, L = 60 mm', () => {
    // π × 0.12 × 77.625e6 × 0.05² × 0.06 / 2 = 2194.79 N·m (derived by hand).
    expect(rel(fitSlipTorque(77.625e6, 0.12, 0.05, 0.06), 2194.79)).toBeLessThan(5e-6);
  });

  it('the general equation (3-56) reduces to the one-material form (3-57) with a bored shaft, for any geometry', () => {
    // Shigley Eq. 3-57: p = (E·δ/(2R³))·(r_o² − R²)(R² − r_i²)/(r_o² − r_i²), δ radial (from memory, verify).
    fc.assert(
      fc.property(
        fc.double({ min: 0.02, max: 0.2, noNaN: true }),
        fc.double({ min: 1.2, max: 4, noNaN: true }),
        fc.double({ min: 0, max: 0.8, noNaN: true }),
        fc.double({ min: 1e-4, max: 1e-3, noNaN: true }),
        (d, outer, bore, strain) => {
          const g = { seatDiameter: d, hubOuterDiameter: outer * d, shaftBore: bore * d, interference: strain * d };
          const R = d / 2;
          const ro = g.hubOuterDiameter / 2;
          const ri = g.shaftBore / 2;
          const closed = ((steel.elasticModulus * (g.interference / 2)) / (2 * R ** 3)) * (((ro ** 2 - R ** 2) * (R ** 2 - ri ** 2)) / (ro ** 2 - ri ** 2));
          return rel(contactPressure(g, steel, steel), closed) < 1e-9;
        },
      ),
      { numRuns: 200 },
    );
  });

  it('a softer hub (gray iron, E = 100 GPa, ν = 0.211; Table A-5) takes a lower pressure than a steel one, and the pressure grows in proportion to the interference', () => {
    const iron = { elasticModulus: 100e9, poissonRatio: 0.211 };
    const g = { seatDiameter: 0.06, hubOuterDiameter: 0.12, shaftBore: 0, interference: 0.05e-3 };
    expect(contactPressure(g, iron, steel)).toBeLessThan(contactPressure(g, steel, steel));
    expect(rel(contactPressure({ ...g, interference: 0.1e-3 }, iron, steel), 2 * contactPressure(g, iron, steel))).toBeLessThan(1e-12);
  });

  it('hubBoreHoopStress is p·(r_o² + R²)/(r_o² − R²): 5/3 of p for a hub twice the seat (Shigley Eq. 3-58; from memory, verify)', () => {
    expect(rel(hubBoreHoopStress(60e6, 0.05, 0.1), (60e6 * 5) / 3)).toBeLessThan(1e-12);
  });
});
