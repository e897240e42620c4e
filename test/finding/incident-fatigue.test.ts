import { describe, expect, it } from 'vitest';
import { incidentFatigue } from '../../src/finding/incident-fatigue.ts';
import type { Material } from '../../src/materials/material.ts';
import { findMaterial } from '../../src/materials/library.ts';

// SAE 1045 at about 225 HB with Dowling's constants (4th ed., Table 14.1; from memory).
const MILL: Material = {
  key: 'mill',
  name: 'SAE 1045 Q&T',
  shearModulus: 79e9,
  elasticModulus: 202e9,
  yieldStrength: 530e6,
  tensileStrength: 725e6,
  cyclic: {
    cyclicStrengthCoefficient: 1344e6,
    cyclicHardeningExponent: 0.18,
    fatigueStrengthCoefficient: 1227e6,
    fatigueStrengthExponent: -0.095,
    fatigueDuctilityCoefficient: 1.0,
    fatigueDuctilityExponent: -0.66,
  },
  source: 'test',
};

function bisect(f: (x: number) => number, lo: number, hi: number): number {
  let [a, b] = [lo, hi];
  const fa = f(a);
  for (let i = 0; i < 200; i++) {
    const m = (a + b) / 2;
    if (Math.sign(f(m)) === Math.sign(fa)) a = m;
    else b = m;
  }
  return (a + b) / 2;
}

describe('incidentFatigue', () => {
  it('one jam at a keyseat of kt 2: its life agrees within 1 % with an independent hand solve (von Mises, Neuber, strain–life)', () => {
    const kt = 2;
    const tauNominal = 300e6;
    const z = incidentFatigue(MILL, kt, kt * tauNominal, 0, undefined);
    // Independent calculation: S = √3·τ; Neuber Δσ·Δε = (kt·S)²/E on the Masing branch; then
    // ε_a = Δε/2 into Coffin–Manson–Basquin, each solved by bisection.
    const E = 202e9;
    const S = Math.sqrt(3) * tauNominal;
    const range = (ds: number) => ds / E + 2 * (ds / 2 / 1344e6) ** (1 / 0.18);
    const ds = bisect((x) => x * range(x) - (kt * S) ** 2 / E, 1, kt * S);
    const ea = range(ds) / 2;
    const N = 10 ** bisect((x) => (1227e6 / E) * (10 ** x) ** -0.095 + (10 ** x) ** -0.66 - ea, 0, 20) / 2;
    expect(z.propertiesSource).toBe('case material');
    expect(z.ringDown).toBe(false);
    expect(Math.abs(z.jamCycle.life.cycles! / N - 1)).toBeLessThan(0.01);
    expect(Math.abs(z.damage * N - 1)).toBeLessThan(0.01);
  });

  it("the ring-down adds its counted cycles: the damage is the sum of theirs and at least the jam's own", () => {
    const torque = new Float64Array([100, 1000, -400, 600, -200, 300, 150]);
    const z = incidentFatigue(MILL, 2, 2 * 300e6, 1000, torque);
    expect(z.ringDown).toBe(true);
    expect(z.cycles.length).toBeGreaterThan(2);
    expect(z.damage).toBeCloseTo(
      z.cycles.reduce((s, c) => s + c.damage, 0),
      15,
    );
    expect(z.damage).toBeGreaterThan(z.jamCycle.damage);
  });

  it('estimates the constants by the uniform material law where the material has none, and says so', () => {
    const steel = findMaterial('aisi-1045-cd')!;
    const z = incidentFatigue(steel, 1.5, 400e6, 0, undefined);
    expect(z.propertiesSource).toBe('uniform material law (estimate)');
    expect(z.properties.fatigueStrengthCoefficient).toBeCloseTo(1.5 * steel.tensileStrength!, 0);
    expect(z.notes.join(' ')).toMatch(/uniform material law/);
  });
});
