import { describe, expect, it } from 'vitest';
import { compliance, polarMoment, shearStress, strainEnergy, twist } from '../../src/physics/torsion.ts';

describe('torsion of round shafts', () => {
  // Derived check (shared REFERENCE.md E1): d = 50 mm, L = 1 m, G = 79.3 GPa (Shigley 9th ed. Table A-5),
  // T = 2000 N·m; J_p = πd⁴/32 and τ = Tc/J_p from Gere & Goodno, Mechanics of Materials 7th ed., Ch. 3 (from memory, confident).
  it('polarMoment, shearStress and twist of a solid shaft match the hand calculation', () => {
    expect(polarMoment(0.05)).toBeCloseTo(6.135923e-7, 12);
    expect(shearStress(2000, 0.05) / 1e6).toBeCloseTo(81.487, 2);
    expect(twist(2000, 1, 79.3e9, 0.05)).toBeCloseTo(4.11033e-2, 6);
    expect(strainEnergy(2000, compliance(1, 79.3e9, 0.05))).toBeCloseTo(41.103, 2);
  });
});
