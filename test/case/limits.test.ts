import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { isIsoDate, parseCase } from '../../src/case/parse-case.ts';
import { lineOf, problems } from '../helpers/case-problems.ts';

const base = readFileSync(new URL('../data/one-disc.yaml', import.meta.url), 'utf8');

/** `base` with the first occurrence of `from` replaced by `to`. */
const edit = (from: string, to: string) => {
  expect(base).toContain(from);
  return base.replace(from, to);
};

const withMaterial = (fields: string) =>
  base.replace('shaft:\n  material: aisi-1045-cd', `materials:\n  m1:\n    shear_modulus: 79 GPa\n    yield_strength: 500 MPa\n${fields}\nshaft:\n  material: m1`);

describe('parseCase refuses numbers at the edges, each with its line, field and a right value', () => {
  it.each([
    ['speed: 150 rpm', 'speed: 1e308 rpm', 'speed', /"1e308 rpm" is out of range \(0\.01 rpm to 500 000 rpm\); give a speed such as "1480 rpm"/],
    ['speed: 150 rpm', 'speed: 1e-308 rpm', 'speed', /"1e-308 rpm" is out of range/],
    ['diameter: 50 mm', 'diameter: 1e300 m', 'shaft.segments[0].diameter', /"1e300 m" is out of range \(0\.1 mm to 100 m\); give a length such as "40 mm"/],
    ['diameter: 50 mm', 'diameter: 1e-300 m', 'shaft.segments[0].diameter', /is out of range/],
    ['mass: 40 kg', 'mass: 1e300 kg', 'stations[1].parts[0].mass', /is out of range \(1 g to 1000 t\)/],
    ['speed: 150 rpm', 'speed: 150 rpm ± 1e400 %', 'speed', /the ± band is not narrower than the value/],
    ['speed: 150 rpm', 'speed: 150 rpm ± 100 %', 'speed', /the ± band is not narrower than the value/],
    ['speed: 150 rpm', 'speed: 150 rpm ± 300 rpm', 'speed', /the ± band is not narrower than the value/],
    ['diameter: 50 mm', 'diameter: 50 mm\n      kt: 1e200', 'shaft.segments[0].kt', /1e\+200 is out of range; give a factor from 1 to 10/],
    ['radius_of_gyration: 180 mm', 'radius_of_gyration: 180 mm\n        count: 1e300', 'stations[1].parts[0].count', /is out of range; give a whole number from 1 to 10000/],
    [
      'radius_of_gyration: 180 mm',
      'radius_of_gyration: 180 mm\n        speed_ratio: 1e200',
      'stations[1].parts[0].speed_ratio',
      /is out of range; give the part's speed over the shaft's, from 0\.001 to 1000/,
    ],
  ])('%s → %s', (from, to, path, message) => {
    const text = edit(from, to);
    const needle = to.split('\n').pop()!.trim();
    const out = problems(text);
    expect(out).toMatch(new RegExp(`^case\\.yaml:${lineOf(text, needle)}:\\d+ ${path.replace(/[.[\]]/g, '\\$&')}: `, 'm'));
    expect(out).toMatch(message);
  });

  it('an inertia of 1e300 kg*m^2 and a shear modulus of 1e-300 Pa are refused', () => {
    const inertia = base.replace('      - shape: mass\n        mass: 40 kg\n        radius_of_gyration: 180 mm', '      - { shape: inertia, inertia: 1e300 kg*m^2 }');
    expect(problems(inertia)).toMatch(/stations\[1\]\.parts\[0\]\.inertia: "1e300 kg\*m\^2" is out of range/);
    const soft = withMaterial('    density: 7850 kg/m^3').replace('shear_modulus: 79 GPa', 'shear_modulus: 1e-300 Pa');
    expect(problems(soft)).toMatch(/materials\.m1\.shear_modulus: "1e-300 Pa" is out of range \(0\.1 GPa to 1000 GPa\)/);
  });

  it('a zero where the field allows it is not held to the lower limit', () => {
    expect(parseCase(edit('at: jam', 'at: jam\n  duration: 0 s')).stop.duration).toBe(0);
  });

  it('analysis.samples above 100 000 and dynamic_samples above 1000 are refused before any work', () => {
    expect(problems(`${base}analysis:\n  samples: 1000000000\n`)).toMatch(/analysis\.samples: 1000000000 is out of range; give a whole number from 1 to 100000/);
    expect(problems(`${base}analysis:\n  dynamic_samples: 100000\n`)).toMatch(/analysis\.dynamic_samples: 100000 is out of range; give a whole number from 0 to 1000/);
    expect(problems(`${base}analysis:\n  duration: 1000 s\n`)).toMatch(/analysis\.duration: "1000 s" is out of range \(0\.01 ms to 10 s\)/);
  });
});

describe('parseCase refuses material properties that cannot be', () => {
  it('a reduction of area of 100 %, an elongation above 100 % and a tensile strength below yield', () => {
    const text = withMaterial('    reduction_of_area: 100 %\n    elongation: 200 %\n    tensile_strength: 400 MPa');
    const out = problems(text);
    expect(out).toMatch(new RegExp(`case\\.yaml:${lineOf(text, 'reduction_of_area')}:\\d+ materials\\.m1\\.reduction_of_area: "100 %" is out of range \\(0\\.01 % to 99 %\\)`));
    expect(out).toMatch(/materials\.m1\.elongation: "200 %" is out of range \(0\.01 % to 100 %\)/);
    expect(out).toMatch(new RegExp(`case\\.yaml:${lineOf(text, 'tensile_strength')}:\\d+ materials\\.m1\\.tensile_strength: is below the yield strength \\(500 MPa\\)`));
  });
});

describe('parseCase refuses dates that do not exist and an empty id', () => {
  it('2026-13-45 and 2026-02-30T25:00 are no dates; 2024-02-29T23:59:59Z is one', () => {
    expect(isIsoDate('2026-13-45')).toBe(false);
    expect(isIsoDate('2026-02-30')).toBe(false);
    expect(isIsoDate('2026-03-14T25:00')).toBe(false);
    expect(isIsoDate('2024-02-29T23:59:59Z')).toBe(true);
    expect(isIsoDate('2026-03-14 06:40+01:00')).toBe(true);
    const text = edit('id: T-1', 'id: T-1\n  occurred: 2026-13-45');
    expect(problems(text)).toMatch(new RegExp(`case\\.yaml:${lineOf(text, 'occurred')}:\\d+ case\\.occurred: "2026-13-45" is not an ISO date`));
  });

  it('an empty id is refused', () => {
    expect(problems(edit('id: T-1', 'id: ""'))).toMatch(/case\.yaml:3:\d+ case\.id: is empty; give an incident id such as "INC-2026-014"/);
  });
});

describe('parseCase refuses a motor curve with negative torque or no points', () => {
  const drive = (curve: string) => base.replace('        radius_of_gyration: 180 mm', `        radius_of_gyration: 180 mm\n    drive:\n      curve: ${curve}`);
  it('a negative torque', () => {
    expect(problems(drive('[{ speed: 0 rpm, torque: -5 N*m }, { speed: 200 rpm, torque: 10 N*m }]'))).toMatch(/stations\[1\]\.drive\.curve\[0\]\.torque: "-5 N\*m" must be zero or more/);
  });
  it('no points', () => {
    expect(problems(drive('[]'))).toMatch(/stations\[1\]\.drive\.curve: give at least two points/);
  });
});
