import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { buildShaftModel } from '../../src/model/shaft-model.ts';
import { energyMethodSide } from '../../src/physics/energy-method.ts';
import { verdictBasis } from '../../src/results/verdict-basis.ts';

const fixture = readFileSync(new URL('../data/one-disc.yaml', import.meta.url), 'utf8');
const basis = (text: string) => {
  const c = parseCase(text);
  const sides = buildShaftModel(c).sides.map((s) => energyMethodSide(s, c.speed, c.materials, c.analysis.criterion));
  return verdictBasis(c, sides);
};

describe('verdictBasis: which result the verdict stands on', () => {
  it('one mass, stopped at once, nothing else: the energy method, and it says why', () => {
    expect(basis(fixture)).toEqual({ basis: 'energy method', reason: expect.stringMatching(/^The verdict uses the energy method: each side has one loaded station, the stop is instantaneous/) });
  });

  it('a stop with duration, a drive, a slip element or two loaded stations on a side: the dynamic model, naming each reason', () => {
    expect(basis(fixture.replace('  at: jam', '  at: jam\n  duration: 5 ms')).reason).toMatch(/dynamic model because the stop took 5\.00 ms/);
    expect(basis(fixture.replace('  at: jam', '  at: jam\n  torque_capacity: 1 kN*m')).reason).toMatch(/the case has a jam that can slip/);
    expect(basis(fixture.replace('      diameter: 50 mm', '      diameter: 50 mm\n      shear_torque: 1 kN*m')).reason).toMatch(/the case has a shear pin/);
    expect(basis(fixture.replace('        radius_of_gyration: 180 mm\n', '        radius_of_gyration: 180 mm\n    drive: { rotor_inertia: 0.1 kg*m^2, torque: 10 N*m }\n')).reason).toMatch(
      /a drive acts at "flywheel"/,
    );
    const two = fixture.replace('  - name: flywheel', '  - name: hub\n    at: 400 mm\n    parts: [{ shape: inertia, inertia: 0.2 kg*m^2 }]\n  - name: flywheel');
    const b = basis(two);
    expect(b.basis).toBe('dynamic model');
    expect(b.reason).toMatch(/side B has 2 loaded stations/);
  });
});
