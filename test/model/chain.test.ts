import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { buildChain } from '../../src/model/chain.ts';
import { buildShaftModel } from '../../src/model/shaft-model.ts';
import { energyMethodSide } from '../../src/physics/energy-method.ts';
import { polarMoment } from '../../src/physics/torsion.ts';

const text = `case: { id: C }
speed: 300 rpm
stop: { at: jam }
shaft:
  material: aisi-1045-cd
  segments:
    - { length: 100 mm, diameter: 40 mm }
    - { length: 300 mm, diameter: 50 mm, slip_torque: 900 N*m, label: limiter seat }
    - { length: 200 mm, diameter: 60 mm }
    - { length: 100 mm, diameter: 45 mm }
stations:
  - { name: flywheel, at: 50 mm, parts: [{ shape: inertia, inertia: 3 kg*m^2 }] }
  - { name: bearing, at: 250 mm }
  - { name: jam, at: 400 mm, parts: [{ shape: inertia, inertia: 0.7 kg*m^2 }] }
  - name: pulley
    at: 650 mm
    parts:
      - { shape: inertia, name: sheave, inertia: 0.5 kg*m^2 }
      - { shape: inertia, name: motor rotor, inertia: 0.1 kg*m^2, speed_ratio: 3 }
    drive: { belt: { slip_torque: 400 N*m }, torque: 60 N*m }
`;
const c = parseCase(text);
const model = buildShaftModel(c);
const rho = c.materials['aisi-1045-cd'].density!;

describe('buildChain: the lumped torsional chain of a case', () => {
  it('without shaft inertia: nodes at the stop and the loaded stations, springs the series of the pieces between', () => {
    const ch = buildChain(c, model, { elements: 1, shaftInertia: false });
    expect(ch.nodes.map((n) => n.at)).toEqual([0.05, 0.4, 0.65]);
    expect(ch.stopNode).toBe(1);
    // Each side's spring is the energy method's compliance of that side, inverted (shared REFERENCE.md 1.1.5, series rule).
    for (const side of model.sides) {
      const C = energyMethodSide(side, c.speed, c.materials, 'distortion-energy').compliance;
      const el = ch.elements.find((e) => e.side === side.side)!;
      expect(el.stiffness * C).toBeCloseTo(1, 12);
    }
    // The sheave is on the node; the rotor (0.1·3² = 0.9 kg·m²) is behind the belt.
    expect(ch.nodes[2].inertia).toBeCloseTo(0.5, 12);
    expect(ch.drives[0].rotorInertia).toBeCloseTo(0.9, 12);
    expect(ch.drives[0].line.torques[0]).toBeCloseTo(60 * 3, 12);
    expect(ch.nodes[1].inertia).toBeCloseTo(0.7, 12);
  });

  it("with shaft inertia: the whole shaft's ρ·J_p·L is on the nodes, and the parts besides", () => {
    const ch = buildChain(c, model, { elements: 24, shaftInertia: true });
    const shaft = c.shaft.segments.reduce((s, seg) => s + rho * polarMoment(seg.diameter) * (seg.end - seg.start), 0);
    const total = ch.nodes.reduce((s, n) => s + n.inertia, 0);
    expect(total).toBeCloseTo(shaft + 3 + 0.7 + 0.5, 12);
    // Nodes at every station and segment joint in the chain.
    for (const x of [0.05, 0.1, 0.25, 0.4, 0.6, 0.65]) expect(ch.nodes.some((n) => Math.abs(n.at - x) < 1e-12)).toBe(true);
    // Springs in series still add up to each side's compliance.
    for (const side of model.sides) {
      const C = energyMethodSide(side, c.speed, c.materials, 'distortion-energy').compliance;
      const sum = ch.elements.filter((e) => e.side === side.side).reduce((s, e) => s + 1 / e.stiffness, 0);
      expect(sum / C).toBeCloseTo(1, 12);
    }
  });

  it("puts a segment's torque limiter on one element inside that segment", () => {
    const ch = buildChain(c, model, { elements: 24, shaftInertia: true });
    const devices = ch.elements.filter((e) => e.device);
    expect(devices.map((e) => e.side)).toEqual(['A']);
    expect(devices[0].device).toMatchObject({ kind: 'torque limiter', torque: 900 });
    expect(devices[0].start).toBeGreaterThanOrEqual(0.1);
    expect(devices[0].end).toBeLessThanOrEqual(0.4);
  });

  it('shares the elements among the pieces by length, at least one each', () => {
    const ch = buildChain(c, model, { elements: 2, shaftInertia: true });
    const pieces = new Set(ch.elements.flatMap((e) => e.pieces));
    expect(pieces.size).toBe(ch.pieces.length);
    expect(ch.elements.every((e) => e.pieces.length === 1)).toBe(true);
  });
});
