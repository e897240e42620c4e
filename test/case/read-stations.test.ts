import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { lineOf, problems } from '../helpers/case-problems.ts';

const text = (rated: string) => `case: { id: W }
speed: 3000 rpm
stop: { at: jam }
shaft:
  material: aisi-1045-cd
  segments:
    - { length: 300 mm, diameter: 30 mm }
stations:
  - name: jam
    at: 0 mm
  - name: wheel
    at: 300 mm
    parts:
      - { shape: inertia, name: cut-off wheel, inertia: 0.05 kg*m^2, rated_speed: ${rated} }
`;

describe("a part's rated_speed", () => {
  it("is read as the part's marked speed in rad/s", () => {
    const part = parseCase(text('4400 rpm')).stations[1].parts[0];
    expect(part.ratedSpeed).toBeCloseTo((4400 * 2 * Math.PI) / 60, 9);
  });

  it('a rated speed without a unit is reported with its line', () => {
    const t = text('4400');
    const line = lineOf(t, 'rated_speed');
    expect(problems(t)).toMatch(new RegExp(`case\\.yaml:${line}:\\d+ stations\\[1\\]\\.parts\\[0\\]\\.rated_speed: "4400" has no unit`));
  });
});
