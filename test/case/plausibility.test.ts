import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { fillRequired, template } from '../helpers/filled-template.ts';
import { parseCase } from '../../src/case/parse-case.ts';
import { checkPlausibility, formatInputWarning, PLAUSIBLE } from '../../src/case/plausibility.ts';

// Two small invented cases; each test changes one value. The line numbers below are these texts'.
const US = `case:
  id: T-US
units: us
speed: 1180 rpm
stop:
  at: impeller
shaft:
  material: aisi-1045-hr
  segments:
    - { length: 4 in, diameter: 1 7/16 in }
    - { length: 30 in, diameter: 1 15/16 in }
    - { length: 6 in, diameter: 1 11/16 in }
stations:
  - name: fan sheave
    at: 2 in
    parts:
      - { shape: disc, name: sheave, diameter: 13 in, thickness: 3 in, bore: 1 7/16 in, material: gray-iron-30 }
  - name: impeller
    at: 40 in
    parts:
      - { shape: inertia, name: impeller, inertia: 180 lb*ft^2 }
`;

const METRIC = `case:
  id: T-M
units: metric
speed: 420 rpm
stop:
  at: jam
shaft:
  material: aisi-1045-cd
  segments:
    - { length: 100 mm, diameter: 50 mm }
    - { length: 1800 mm, diameter: 60 mm }
    - { length: 100 mm, diameter: 50 mm }
stations:
  - name: jam
    at: 0 mm
  - name: flywheel
    at: 2000 mm
    parts:
      - { shape: disc, name: flywheel, diameter: 600 mm, thickness: 80 mm, bore: 50 mm, material: gray-iron-30 }
`;

/** The warnings of `text` with `from` replaced by `to` on line `line` (1-based). */
function warnings(text: string, line: number, from: string, to: string) {
  const lines = text.split('\n');
  expect(lines[line - 1]).toContain(from);
  lines[line - 1] = lines[line - 1].replace(from, to);
  const changed = lines.join('\n');
  return { found: checkPlausibility(parseCase(changed, 'case.yaml'), changed), column: lines[line - 1].indexOf(to) + 1 };
}

describe('checkPlausibility(case, text)', () => {
  it('finds nothing in the two plain cases the tests start from', () => {
    expect(checkPlausibility(parseCase(US), US)).toEqual([]);
    expect(checkPlausibility(parseCase(METRIC), METRIC)).toEqual([]);
  });

  it('a 43 in diameter on a 40 in shaft is larger than the whole shaft; the fix read in mm lands in range', () => {
    const { found, column } = warnings(US, 11, 'diameter: 1 15/16 in', 'diameter: 43 in');
    expect(found).toEqual([
      {
        code: 'W_DIAMETER',
        path: 'shaft.segments[1].diameter',
        line: 11,
        column: column + 'diameter: '.length,
        value: '43 in',
        message: `"43 in" is larger than the shaft's whole length (40 in); did you mean "43 mm"?`,
        fix: '43 mm',
      },
    ]);
  });

  it('formatInputWarning(file, w) reads like a case error: file:line:column path: message', () => {
    const { found, column } = warnings(US, 11, 'diameter: 1 15/16 in', 'diameter: 43 in');
    expect(formatInputWarning('case.yaml', found[0])).toBe(`case.yaml:11:${column + 10} shaft.segments[1].diameter: "43 in" is larger than the shaft's whole length (40 in); did you mean "43 mm"?`);
  });

  it('"1 11/16 mm" in a US case is below 3 mm and in the other unit system: W_UNITS, did you mean "1 11/16 in"', () => {
    const { found } = warnings(US, 12, '1 11/16 in', '1 11/16 mm');
    expect(found).toHaveLength(1);
    expect(found[0]).toMatchObject({ code: 'W_UNITS', path: 'shaft.segments[2].diameter', line: 12, value: '1 11/16 mm', fix: '1 11/16 in' });
    expect(found[0].message).toBe(`"1 11/16 mm" is below 0.118 in (3 mm), thinner than any shaft that carries a machine's parts, and the case is in US units; did you mean "1 11/16 in"?`);
  });

  it("a diameter above 2 m is refused as a shaft, whatever the shaft's length", () => {
    const long = METRIC.replace('length: 1800 mm', 'length: 4800 mm').replace('at: 2000 mm', 'at: 5000 mm');
    const { found } = warnings(long, 11, 'diameter: 60 mm', 'diameter: 2.5 m');
    expect(found[0]).toMatchObject({ code: 'W_DIAMETER', path: 'shaft.segments[1].diameter', line: 11, value: '2.5 m' });
    expect(found[0].message).toBe('"2.5 m" is above 2 m, thicker than any machine shaft; check the value and its unit');
  });

  it('"60 in" in a metric case among 50 mm segments is 30 times the others and read in mm it fits: W_UNITS', () => {
    const { found, column } = warnings(METRIC, 11, 'diameter: 60 mm', 'diameter: 60 in');
    expect(found.map((w) => w.code)).toEqual(['W_UNITS']);
    expect(found[0]).toMatchObject({ path: 'shaft.segments[1].diameter', line: 11, column: column + 10, fix: '60 mm' });
    expect(found[0].message).toBe(`"60 in" is 30 times the shaft's other segments (median 50 mm), and the case is in metric units; did you mean "60 mm"?`);
  });

  it('"2 in" in a metric case among 50 mm segments is plausible as written and gives no warning', () => {
    expect(warnings(METRIC, 11, 'diameter: 60 mm', 'diameter: 2 in').found).toEqual([]);
  });

  it('a bore within 0.5 mm of its diameter, on a segment or a disc, is W_BORE at the bore', () => {
    const seg = warnings(METRIC, 10, 'diameter: 50 mm }', 'diameter: 50 mm, bore: 49.6 mm }');
    expect(seg.found).toEqual([expect.objectContaining({ code: 'W_BORE', path: 'shaft.segments[0].bore', line: 10, column: seg.column + 'diameter: 50 mm, bore: '.length, value: '49.6 mm' })]);
    expect(seg.found[0].message).toMatch(/^"49\.6 mm" leaves a wall of 0\.2 mm in a diameter of 50 mm, thinner than any tube .*; check the bore and the diameter/);
    const disc = warnings(METRIC, 19, 'bore: 50 mm', 'bore: 599.8 mm');
    expect(disc.found).toEqual([expect.objectContaining({ code: 'W_BORE', path: 'stations[1].parts[0].bore', line: 19, value: '599.8 mm' })]);
  });

  it('a part whose weight alone would bend the shaft past yield is W_PART_MASS at its mass', () => {
    const text = METRIC.replace(
      '{ shape: disc, name: flywheel, diameter: 600 mm, thickness: 80 mm, bore: 50 mm, material: gray-iron-30 }',
      '{ shape: mass, name: flywheel, mass: 40000 kg, radius_of_gyration: 200 mm }',
    );
    const { found } = warnings(text, 19, 'mass: 40000 kg', 'mass: 40000 kg');
    expect(found).toEqual([expect.objectContaining({ code: 'W_PART_MASS', path: 'stations[1].parts[0].mass', line: 19, value: '40000 kg' })]);
    // M = W·L/4 = 40 000·9.80665·2/4 N·m on the thickest segment, 60 mm: σ = 32·M/(π·0.06³) ≈ 9.25 GPa.
    expect(found[0].message).toMatch(
      /^"40000 kg" makes the part weigh 40000 kg, whose weight alone at mid-span of the whole shaft \(2 m\) would bend its strongest segment in bending \(60 mm\) to 9250 MPa, past its yield strength of 530 MPa; check the value and its unit$/,
    );
    expect(found[0].fix).toBeUndefined();
  });

  it('a disc diameter typed in inches in a metric case makes a part too heavy for the shaft, and read in mm it fits', () => {
    const { found } = warnings(METRIC, 19, 'diameter: 600 mm', 'diameter: 600 in');
    expect(found).toEqual([expect.objectContaining({ code: 'W_UNITS', path: 'stations[1].parts[0].diameter', line: 19, fix: '600 mm' })]);
    expect(found[0].message).toMatch(/makes the part weigh .* past its yield strength of 530 MPa, and the case is in metric units; did you mean "600 mm"\?$/);
  });

  it(`a speed that takes a rim past ${PLAUSIBLE.maxRimSpeed} m/s is W_SPEED; "4200 rad/s" read as rpm fits`, () => {
    const { found } = warnings(METRIC, 4, '420 rpm', '4200 rad/s');
    expect(found).toEqual([expect.objectContaining({ code: 'W_SPEED', path: 'speed', line: 4, column: 8, value: '4200 rad/s', fix: '4200 rpm' })]);
    // 4200 rad/s at the 300 mm rim radius: 1260 m/s.
    expect(found[0].message).toBe(
      `"4200 rad/s" gives the rim of "flywheel" at "flywheel" a speed of 1260 m/s, beyond the 500 m/s at which even a thin ring of the strongest steel bursts; did you mean "4200 rpm"?`,
    );
  });

  it("a shaft whose own kinetic energy is many times its parts' is W_SHAFT_ENERGY at the segment holding most of it", () => {
    const text = METRIC.replace(
      '{ shape: disc, name: flywheel, diameter: 600 mm, thickness: 80 mm, bore: 50 mm, material: gray-iron-30 }',
      '{ shape: mass, name: hub, mass: 0.5 kg, radius_of_gyration: 20 mm }',
    );
    const found = checkPlausibility(parseCase(text), text);
    expect(found).toEqual([expect.objectContaining({ code: 'W_SHAFT_ENERGY', path: 'shaft.segments[1].diameter', line: 11, value: '60 mm' })]);
    // ρ·π/32·Σ D⁴·L = 7806·π/32·(2·0.05⁴·0.1 + 0.06⁴·1.8) = 0.01884 kg·m² against 0.5·0.02² = 2e-4 kg·m²: 94 times;
    // the middle segment's 0.06⁴·1.8 is 95 % of the sum.
    expect(found[0].message).toMatch(
      /^"60 mm" makes the shaft's own kinetic energy 94 times its parts' \(this segment holds 95 % of it\), yet the parts are what drive a shaft into a stop; check the shaft's diameters/,
    );
  });

  it("an inch fraction with a metric unit is W_UNITS in any length field, here a station's position", () => {
    const { found, column } = warnings(US, 15, 'at: 2 in', 'at: 2 1/2 mm');
    expect(found).toEqual([
      {
        code: 'W_UNITS',
        path: 'stations[0].at',
        line: 15,
        column: column + 4,
        value: '2 1/2 mm',
        message: '"2 1/2 mm" is an inch fraction with a metric unit; did you mean "2 1/2 in"?',
        fix: '2 1/2 in',
      },
    ]);
  });

  it('warnings come in the order of the file, one per field', () => {
    const text = US.replace('diameter: 1 15/16 in', 'diameter: 43 in').replace('speed: 1180 rpm', 'speed: 11800 rad/s');
    const found = checkPlausibility(parseCase(text), text);
    expect(found.map((w) => [w.line, w.path])).toEqual([
      [4, 'speed'],
      [11, 'shaft.segments[1].diameter'],
    ]);
  });
});

describe('the bundled cases give no plausibility warning', () => {
  const dir = fileURLToPath(new URL('../../sample-cases/', import.meta.url));
  it.each(readdirSync(dir).filter((f) => f.endsWith('.yaml')))('sample case %s', (f) => {
    const text = readFileSync(dir + f, 'utf8');
    expect(checkPlausibility(parseCase(text, f), text)).toEqual([]);
  });

  it("the README's annotated case-file example", () => {
    const readme = readFileSync(fileURLToPath(new URL('../../README.md', import.meta.url)), 'utf8');
    const example = /## The case file[\s\S]*?```yaml\n([\s\S]*?)```/.exec(readme)![1];
    expect(checkPlausibility(parseCase(example, 'README example'), example)).toEqual([]);
  });

  it.each(['case-metric.yaml', 'case-us.yaml'])('template %s filled in with its own examples', (name) => {
    // The same filling as test/templates/case-templates.test.ts: the US template's own example values.
    const filled = fillRequired(template(name));
    expect(checkPlausibility(parseCase(filled, name), filled)).toEqual([]);
  });
});
