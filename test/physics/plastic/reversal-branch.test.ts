import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { residualTwistRate, torqueAtTwistRate, yieldTwistRate, type TorsionLaw } from '../../../src/physics/plastic/plastic-torsion.ts';
import { branchTorque } from '../../../src/physics/plastic/reversal-branch.ts';

/**
 * An independent section model: the section cut into thin rings, each ring an elastic–perfectly
 * plastic (or linear kinematic-hardening) element in shear, stepped through a twist history; the
 * torque is Σ τᵢ·rᵢ·Aᵢ. It knows nothing of Masing's rule.
 */
function ringSection(l: TorsionLaw, rings = 4000) {
  const dr = (l.outerRadius - l.innerRadius) / rings;
  const r = Array.from({ length: rings }, (_, i) => l.innerRadius + (i + 0.5) * dr);
  const area = r.map((x) => 2 * Math.PI * x * dr);
  const hp = l.hardeningModulus > 0 ? (l.shearModulus * l.hardeningModulus) / (l.shearModulus - l.hardeningModulus) : 0;
  const plastic = new Float64Array(rings); // plastic shear strain per ring
  let phi = 0;
  return {
    to(target: number, steps = 20): number {
      const start = phi;
      for (let k = 1; k <= steps; k++) {
        phi = start + ((target - start) * k) / steps;
        for (let i = 0; i < rings; i++) {
          // Return mapping with linear kinematic hardening (back stress = hp·γp): Simo & Hughes,
          // Computational Inelasticity, 1998, Sec. 1.3 (from memory, confident).
          const trial = l.shearModulus * (r[i] * phi - plastic[i]);
          const over = Math.abs(trial - hp * plastic[i]) - l.shearYield;
          if (over > 0) plastic[i] += (Math.sign(trial - hp * plastic[i]) * over) / (l.shearModulus + hp);
        }
      }
      let t = 0;
      for (let i = 0; i < rings; i++) t += l.shearModulus * (r[i] * phi - plastic[i]) * r[i] * area[i];
      return t;
    },
  };
}

const law = (c2: number, c1: number, h = 0): TorsionLaw => ({ outerRadius: c2, innerRadius: c1, shearModulus: 79.3e9, shearYield: 300e6, hardeningModulus: h });

describe("branchTorque (Masing's rule for a reversal)", () => {
  it('agrees with a ring-by-ring section model on unloading and reverse loading back to the mirrored point, solid and hollow', () => {
    fc.assert(
      fc.property(fc.constantFrom(0, 0.5), fc.double({ min: 1.2, max: 8, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true }), fc.constantFrom(0, 2e9), (ratio, u1, f, h) => {
        const l = law(0.02, ratio * 0.02, h);
        const py = yieldTwistRate(l);
        const rings = ringSection(l);
        const tr = rings.to(u1 * py);
        expect(Math.abs(tr / torqueAtTwistRate(l, u1 * py) - 1)).toBeLessThan(2e-3);
        const back = f * u1 * py;
        const t = rings.to(back);
        const masing = branchTorque(l, { twistRate: u1 * py, torque: tr }, back);
        expect(Math.abs(t - masing)).toBeLessThan(3e-3 * Math.abs(tr));
      }),
      { numRuns: 12 },
    );
  });

  it('meets the first-loading curve of the other sense at the mirrored twist, where that curve takes over', () => {
    const l = law(0.02, 0.008);
    const phi = 3 * yieldTwistRate(l);
    const from = { twistRate: phi, torque: torqueAtTwistRate(l, phi) };
    expect(branchTorque(l, from, -phi)).toBeCloseTo(-from.torque, 6);
    const rings = ringSection(l);
    rings.to(phi);
    expect(Math.abs(rings.to(-1.5 * phi) / -torqueAtTwistRate(l, 1.5 * phi) - 1)).toBeLessThan(2e-3);
  });

  it('unloads on the elastic line for twice the yield twist rate, so a perfectly plastic bar springs back elastically to its permanent twist', () => {
    const l = law(0.02, 0);
    const py = yieldTwistRate(l);
    const phi = 5 * py;
    const from = { twistRate: phi, torque: torqueAtTwistRate(l, phi) };
    const zero = residualTwistRate(l, phi);
    expect(Math.abs(branchTorque(l, from, zero))).toBeLessThan(1e-6 * from.torque);
    expect(phi - zero).toBeLessThan(2 * py);
  });
});
