import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { lineOf, problems } from '../helpers/case-problems.ts';

const text = (coupling: string, stations = '  - { name: jam, at: 0 mm }\n  - { name: disc, at: 500 mm, parts: [{ shape: inertia, inertia: 2 kg*m^2 }] }') => `
case: { id: C }
speed: 100 rpm
stop: { at: jam }
shaft:
  material: aisi-1045-cd
  segments:
    - { length: 500 mm, diameter: 40 mm, coupling: ${coupling} }
stations:
${stations}
`;

describe("a segment's coupling: stiffness, rated_torque, peak_torque", () => {
  it('reads the coupling in SI, lbf*ft/deg among the stiffness units', () => {
    const c = parseCase(text('{ stiffness: 1000 lbf*ft/deg, rated_torque: 3000 lbf*ft, peak_torque: 6000 lbf*ft }'));
    // 1 lbf·ft = 1.3558179483 N·m (NIST SP 811 App. B.8, derived exactly); per degree × 180/π.
    expect(c.shaft.segments[0].coupling!.stiffness).toBeCloseTo((1000 * 1.3558179483314 * 180) / Math.PI, 6);
    expect(c.shaft.segments[0].coupling!.ratedTorque).toBeCloseTo(3000 * 1.3558179483314, 6);
  });

  it('a stiffness in a torque unit is refused with the unit kind and an example', () => {
    const t = text('{ stiffness: 120 kN*m, rated_torque: 4 kN*m }');
    expect(problems(t)).toMatch(new RegExp(`case\\.yaml:${lineOf(t, 'coupling')}:\\d+ shaft\\.segments\\[0\\]\\.coupling\\.stiffness: `));
  });

  it('a missing rated torque, and a peak below the rated, are each refused', () => {
    expect(problems(text('{ stiffness: 120 kN*m/rad }'))).toMatch(/shaft\.segments\[0\]\.coupling\.rated_torque: is required; give the coupling's rated \(nominal\) torque/);
    expect(problems(text('{ rated_torque: 4 kN*m, peak_torque: 2 kN*m }'))).toMatch(/coupling\.peak_torque: is below the rated torque/);
  });

  it("a station inside the coupling's segment is refused: split the segment", () => {
    const t = text('{ rated_torque: 4 kN*m }', '  - { name: jam, at: 0 mm }\n  - { name: mid, at: 250 mm }\n  - { name: disc, at: 500 mm, parts: [{ shape: inertia, inertia: 2 kg*m^2 }] }');
    expect(problems(t)).toMatch(/shaft\.segments\[0\]\.coupling: station "mid" lies inside this segment/);
  });

  it("reads the coupling's damping_ratio as a fraction (a percentage too), and a segment's own", () => {
    const c = parseCase(text('{ stiffness: 120 kN*m/rad, rated_torque: 4 kN*m, damping_ratio: 8 % }'));
    expect(c.shaft.segments[0].coupling!.dampingRatio).toBeCloseTo(0.08, 12);
    expect(c.shaft.segments[0].dampingRatio).toBeUndefined();
    const own = parseCase(text('{ rated_torque: 4 kN*m, damping_ratio: 0.1 }').replace('diameter: 40 mm,', 'diameter: 40 mm, damping_ratio: 0.004,'));
    expect(own.shaft.segments[0].dampingRatio).toBe(0.004);
    expect(own.shaft.segments[0].coupling!.dampingRatio).toBe(0.1);
  });

  it('a damping ratio at or above critical is refused with its line and a right value', () => {
    const t = text('{ rated_torque: 4 kN*m, damping_ratio: 1.2 }');
    expect(problems(t)).toMatch(
      new RegExp(
        `case\\.yaml:${lineOf(t, 'coupling')}:\\d+ shaft\\.segments\\[0\\]\\.coupling\\.damping_ratio: 1\\.2 is not below 1 \\(critical damping\\); give the coupling's damping ratio from its data sheet, such as "8 %"`,
      ),
    );
    expect(problems(text('{ rated_torque: 4 kN*m }').replace('diameter: 40 mm,', 'diameter: 40 mm, damping_ratio: -1 %,'))).toMatch(/shaft\.segments\[0\]\.damping_ratio: .*0\.5 %/);
  });
});
