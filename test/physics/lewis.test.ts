import { describe, expect, it } from 'vitest';
import { lewisFormFactor, lewisStress, toothLoad } from '../../src/physics/lewis.ts';

const IN = 0.0254;
const LBF = 4.4482216152605;
const PSI = LBF / IN ** 2;

describe('the Lewis equation for a tooth in bending (a first estimate)', () => {
  it("reproduces Shigley's example of a stock spur gear: P = 8 teeth/in, F = 1.5 in, 16 teeth, W_t = 271 lbf, K_v = 2.05 give the allowable 10 kpsi", () => {
    // Shigley's Mechanical Engineering Design, 9th ed., Example 14-1 (from memory: AISI 1020 as
    // rolled, S_y = 30 kpsi, n_d = 3 so σ_all = 10 kpsi; Y = 0.296; d = 2 in at 1200 rev/min,
    // V = 628 ft/min, K_v = (600 + V)/600 = 2.05; W_t = F·Y·σ_all/(K_v·P) = 271 lbf). Lewis with
    // the velocity factor, K_v·W_t·P/(F·Y), must give back σ_all.
    const m = IN / 8;
    const Y = lewisFormFactor(16);
    expect(Y).toBe(0.296);
    const sigma = 2.05 * lewisStress(271 * LBF, 1.5 * IN, m, Y);
    expect(sigma / (10_000 * PSI)).toBeCloseTo(1, 2);
  });

  it('the tooth load is 2T over the pitch diameter m·z', () => {
    // d = m·z = 4 mm × 50 = 200 mm; T = 1000 N·m → W_t = 10 kN.
    expect(toothLoad(1000, 0.004, 50)).toBeCloseTo(10_000, 9);
  });

  it('Y rises with the tooth count, between the table rows linearly, toward the rack value 0.485', () => {
    expect(lewisFormFactor(23)).toBeCloseTo((0.331 + 0.337) / 2, 12);
    let prev = 0;
    for (let z = 12; z <= 2000; z += 7) {
      const y = lewisFormFactor(z);
      expect(y).toBeGreaterThan(prev);
      expect(y).toBeLessThan(0.485);
      prev = y;
    }
    expect(() => lewisFormFactor(11)).toThrow(/below the table's 12/);
  });
});
