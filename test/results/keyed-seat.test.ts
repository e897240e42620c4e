import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { buildChain } from '../../src/model/chain.ts';
import { keysOnPiece } from '../../src/model/hub-seat.ts';
import { buildShaftModel } from '../../src/model/shaft-model.ts';
import { PlasticElementLaw } from '../../src/physics/plastic/plastic-element-law.ts';
import { keyseatPlasticRatio } from '../../src/physics/plastic/keyseat-section.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { shaftElementLaw } from '../../src/results/shaft-element-law.ts';

// Two segments, Ø40 and Ø45, with a keyed hub (a 12 × 8 key, DIN 6885 for Ø40, half its height in
// the shaft) on the shoulder between them; the stop at the shaft's start. The hub's seat is the
// segment toward the stop, so only the Ø40 piece takes the keyseat's net section.
const text = `
case: { id: KEYED }
speed: 300 rpm
stop: { at: jam }
shaft:
  material: aisi-1045-cd
  segments:
    - { length: 250 mm, diameter: 40 mm, kt: 2 }
    - { length: 250 mm, diameter: 45 mm }
stations:
  - { name: jam, at: 0 mm }
  - { name: hub, at: 250 mm, parts: [{ shape: inertia, inertia: 1 kg*m^2 }], key: { width: 12 mm, height: 8 mm, length: 60 mm, material: aisi-1045-cd } }
  - { name: disc, at: 500 mm, parts: [{ shape: inertia, inertia: 1 kg*m^2 }] }
`;
const c = parseCase(text);
const tauY = c.materials['aisi-1045-cd'].yieldStrength! / Math.sqrt(3);
// The fully plastic torque of a solid round section, (2π/3)·τ_Y·c³ (REFERENCE 3.1.5), and its
// first yield, (π/2)·τ_Y·c³ (3.1.1).
const tp = (d: number) => ((2 * Math.PI) / 3) * tauY * (d / 2) ** 3;
const ty = (d: number) => (Math.PI / 2) * tauY * (d / 2) ** 3;
const ratio = keyseatPlasticRatio({ diameter: 0.04, bore: 0, width: 0.012, depth: 0.004 });

describe("a keyed seat's net section in the plastic capacity", () => {
  const r = analyseCase(c);
  const pieces = r.plastic.sides[0].pieces;

  it('the key sits on the piece toward the stop, not on the next segment', () => {
    const model = buildShaftModel(c);
    const [toStop, beyond] = model.sides[0].pieces;
    expect(keysOnPiece(c, toStop)).toHaveLength(1);
    expect(keysOnPiece(c, beyond)).toHaveLength(0);
  });

  it("the energy balance: the keyed piece's fully plastic torque and yield onset are the net section's, the other piece's the gross", () => {
    expect(ratio).toBeGreaterThan(0.85);
    expect(ratio).toBeLessThan(0.95);
    expect(pieces[0].plasticTorque / (ratio * tp(0.04))).toBeCloseTo(1, 9);
    expect(pieces[0].yieldTorque / (ratio * ty(0.04))).toBeCloseTo(1, 9);
    expect(pieces[1].plasticTorque / tp(0.045)).toBeCloseTo(1, 9);
  });

  it('the dynamic model: the elements of the keyed piece are capped at the net fully plastic torque', () => {
    const chain = buildChain(c, buildShaftModel(c), { elements: 4, shaftInertia: true });
    const limits = chain.elements.map((el) => {
      const law = shaftElementLaw(c, chain, el, 0);
      return law instanceof PlasticElementLaw ? law.backbone.limitTorque : NaN;
    });
    chain.elements.forEach((el, e) => {
      const d = chain.pieces[el.pieces[0]].piece.segment.diameter;
      expect(limits[e] / (d === 0.04 ? ratio * tp(0.04) : tp(0.045))).toBeCloseTo(1, 9);
    });
  });

  it("the elastic check is the gross section's with kt, as before", () => {
    const e = r.sides[0].pieces[0];
    expect(e.shearStress / ((2 * 16 * e.torque) / (Math.PI * 0.04 ** 3))).toBeCloseTo(1, 9);
  });
});
