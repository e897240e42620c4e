import { describe, expect, it } from 'vitest';
import { findMaterial } from '../../src/materials/library.ts';
import type { Material } from '../../src/materials/material.ts';
import { brittleFractureShear, fractureShearStrain, fractureStrainFromReductionOfArea, isBrittle } from '../../src/physics/fracture.ts';

const steel = (extra: Partial<Material>): Material => ({ key: 'test-steel', name: 'test steel', source: 'test', shearModulus: 79.3e9, yieldStrength: 400e6, tensileStrength: 600e6, ...extra });

describe('fracture shear strain', () => {
  // True fracture strain ε_f = ln(A₀/A_f) = ln(1/(1 − RA)) (Dieter, Mechanical Metallurgy 3rd ed.,
  // Sec. 8-3; from memory, verify), and γ = √3·ε by the von Mises effective strain (Dieter Sec. 3-9).
  // Hand arithmetic: RA = 50 %: √3·ln 2 = 1.732051 × 0.693147 = 1.200566.
  it('fractureStrainFromReductionOfArea(0.5) is √3·ln 2 = 1.2006', () => {
    expect(fractureStrainFromReductionOfArea(0.5)).toBeCloseTo(1.200566, 6);
  });

  // AISI 4140 annealed, RA 56.9 % (ASM data via efunda, confirmed in shared REFERENCE.md section 5):
  // √3·ln(1/0.431) = 1.732051 × 0.841647 = 1.457776.
  it('AISI 4140 annealed from the library gets √3·ln(1/0.431) = 1.4578 from its reduction of area', () => {
    const fs = fractureShearStrain(findMaterial('aisi-4140-annealed')!)!;
    expect(fs.value).toBeCloseTo(1.457776, 5);
    expect(fs.basis).toMatch(/reduction of area 56\.9 %/);
  });

  it('grows with reduction of area and is zero for none', () => {
    expect(fractureStrainFromReductionOfArea(0)).toBe(0);
    expect(fractureStrainFromReductionOfArea(0.6)).toBeGreaterThan(fractureStrainFromReductionOfArea(0.3));
  });

  it('a fracture_strain given in the case wins over reduction of area', () => {
    const fs = fractureShearStrain(steel({ reductionOfArea: 0.5, fractureStrain: 0.4 }))!;
    expect(fs.value).toBe(0.4);
    expect(fs.basis).toMatch(/given/);
  });

  it('without reduction of area it falls back to √3·ln(1 + e), said to be a low estimate', () => {
    const fs = fractureShearStrain(steel({ elongation: 0.12 }))!;
    expect(fs.value).toBeCloseTo(Math.sqrt(3) * Math.log(1.12), 12);
    expect(fs.basis).toMatch(/low estimate/);
    expect(fractureShearStrain(steel({}))).toBeUndefined();
  });
});

describe('brittle materials', () => {
  it('gray cast iron (elongation below 5 %) is brittle; 1045 steel is not', () => {
    expect(isBrittle(findMaterial('gray-iron-30')!)).toBe(true);
    expect(isBrittle(findMaterial('aisi-1045-cd')!)).toBe(false);
    expect(isBrittle(steel({}))).toBe(false);
  });

  // Maximum-normal-stress rule for brittle material in pure shear: σ₁ = τ, so τ_f = S_ut; K_t applies
  // to brittle material under static load (Shigley 9th ed. Sec. 3-13, 5-8; from memory, confident).
  it('brittleFractureShear is S_ut / kt', () => {
    expect(brittleFractureShear(findMaterial('gray-iron-30')!, 1)).toBe(207e6);
    expect(brittleFractureShear(findMaterial('gray-iron-30')!, 2)).toBe(103.5e6);
  });
});
