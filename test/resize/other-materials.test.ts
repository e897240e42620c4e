import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MATERIAL_LIBRARY } from '../../src/materials/library.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { withShaftMaterial } from '../../src/resize/change-case.ts';
import { otherMaterials } from '../../src/resize/other-materials.ts';
import { caseOf, rel } from '../helpers/layout.ts';

const c = caseOf({
  rpm: 40,
  segments: [
    [100, 62, 0, 1.4],
    [660, 62, 0],
  ],
  stations: [
    ['drive', 0, 30],
    ['jam', 760, 0],
  ],
  stop: 'jam',
});

describe('another material for the same geometry', () => {
  it('offers every library shaft material but the present one and the brittle ones, best first', () => {
    const list = otherMaterials(c, 1.5);
    const keys = list.map((m) => m.material.key);
    expect(keys).not.toContain('aisi-1045-cd');
    expect(keys).not.toContain('gray-iron-30'); // elongation 0.5 %: brittle
    expect(keys).toContain('al-7075-t6');
    for (let i = 1; i < list.length; i++) expect(list[i].yieldRatio).toBeGreaterThanOrEqual(list[i - 1].yieldRatio);
    for (const m of list) expect(m.keepsFactor).toBe(m.yieldRatio <= 1 / 1.5);
  });

  it("each yield ratio is the rerun's, and the peak torque scales as √G (T = √(2E/C), C ∝ 1/G)", () => {
    const present = analyseCase(c);
    for (const m of otherMaterials(c, 1.5)) {
      expect(m.yieldRatio).toBe(m.rerun.yieldRatio);
      expect(rel(m.rerun.sides[0].peakTorque / present.sides[0].peakTorque, Math.sqrt(m.material.shearModulus! / 79.3e9))).toBeLessThan(1e-12);
    }
  });

  it('a material with a lower G lowers the torque (property)', () => {
    const base = MATERIAL_LIBRARY.find((m) => m.key === 'aisi-1045-cd')!;
    fc.assert(
      fc.property(fc.double({ min: 10e9, max: 200e9, noNaN: true }), fc.double({ min: 0.1, max: 0.99, noNaN: true }), (G, f) => {
        const a = analyseCase(withShaftMaterial(c, { ...base, key: 'a', shearModulus: G }));
        const b = analyseCase(withShaftMaterial(c, { ...base, key: 'b', shearModulus: G * f }));
        return b.sides[0].peakTorque < a.sides[0].peakTorque && b.yieldRatio < a.yieldRatio;
      }),
      // Each run is two solves of the whole engine; a few dozen pairs of moduli prove the law.
      { numRuns: 25 },
    );
  });
});
