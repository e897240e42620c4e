import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { rigidity, tangentRigidity, torqueAtTwistRate, yieldTorque, type TorsionLaw } from '../../../src/physics/plastic/plastic-torsion.ts';
import { sectionTwistRate, SeriesBackbone } from '../../../src/physics/plastic/series-backbone.ts';

const law = (c2: number, c1: number, tauY: number, h = 0): TorsionLaw => ({ outerRadius: c2, innerRadius: c1, shearModulus: 79.3e9, shearYield: tauY, hardeningModulus: h });

describe('SeriesBackbone', () => {
  it('two equal halves in series carry what the whole length does at the same twist (independent computation)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 8, noNaN: true }), fc.constantFrom(0, 1e9), (u, h) => {
        const l = law(0.02, 0.005, 300e6, h);
        const one = new SeriesBackbone([{ law: l, length: 0.6 }]);
        const two = new SeriesBackbone([
          { law: l, length: 0.3 },
          { law: l, length: 0.3 },
        ]);
        const th = u * one.yieldTwist;
        return Math.abs(two.torque(th) - one.torque(th)) <= 1e-9 * yieldTorque(l);
      }),
      { numRuns: 50 },
    );
  });

  it("a thick and a thin piece: the twist is the sum of each piece's twist at the one torque (Beer & Johnston, shafts in series; from memory, confident)", () => {
    const thin = law(0.015, 0, 300e6);
    const thick = law(0.03, 0, 300e6);
    const b = new SeriesBackbone([
      { law: thin, length: 0.4 },
      { law: thick, length: 0.5 },
    ]);
    for (const u of [0.5, 1.5, 3, 10]) {
      const th = u * b.yieldTwist;
      const T = b.torque(th);
      const sum = 0.4 * sectionTwistRate(thin, T) + 0.5 * sectionTwistRate(thick, T);
      expect(Math.abs(sum / th - 1)).toBeLessThan(1e-9);
    }
  });

  it('rises monotonically with a tangent never above the elastic stiffness, matching a central difference (property)', () => {
    const b = new SeriesBackbone([
      { law: law(0.015, 0, 300e6), length: 0.4 },
      { law: law(0.03, 0.01, 250e6, 2e9), length: 0.5 },
    ]);
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 10, noNaN: true }), (u) => {
        const th = u * b.yieldTwist;
        const d = 1e-6 * th;
        const fd = (b.torque(th + d) - b.torque(th - d)) / (2 * d);
        const t = b.tangent(th);
        return b.torque(th + d) > b.torque(th) && t <= b.stiffness * (1 + 1e-12) && Math.abs(fd - t) <= 1e-4 * b.stiffness;
      }),
      { numRuns: 50 },
    );
  });
});

describe('tangentRigidity', () => {
  it('is G·J_p while elastic and agrees with a central difference of torqueAtTwistRate past yield (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 10, noNaN: true }), fc.constantFrom(0, 0.01), fc.constantFrom(0, 2e9), (u, c1, h) => {
        const l = law(0.02, c1, 300e6, h);
        const phiY = 300e6 / (79.3e9 * 0.02);
        const phi = u * phiY;
        const d = 1e-6 * phi;
        const fd = (torqueAtTwistRate(l, phi + d) - torqueAtTwistRate(l, phi - d)) / (2 * d);
        if (u < 1) return tangentRigidity(l, phi) === rigidity(l);
        return Math.abs(fd - tangentRigidity(l, phi)) <= 1e-5 * rigidity(l);
      }),
      { numRuns: 60 },
    );
  });
});
