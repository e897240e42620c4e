import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { lineOf, problems } from '../helpers/case-problems.ts';

const text = (station: string) => `
case: { id: G }
speed: 76 rpm
stop: { at: jam }
shaft:
  material: aisi-1045-cd
  segments:
    - { length: 500 mm, diameter: 60 mm }
stations:
  - { name: jam, at: 0 mm }
  - name: reducer
    at: 500 mm
    parts: [{ shape: inertia, inertia: 2 kg*m^2 }]
${station}
`;
const gearbox = (g: string) => text(`    gearbox: ${g}`);
/** The one problem's text, with its position checked against the line that holds `needle`. */
const at = (t: string, needle: string, path: string) => {
  const p = problems(t);
  expect(p).toMatch(new RegExp(`case\\.yaml:${lineOf(t, needle)}:\\d+ ${path.replaceAll('.', '\\.').replaceAll('[', '\\[').replaceAll(']', '\\]')}: `));
  return p;
};

describe("a station's gearbox: ratio, rated_output_torque, service_factor, efficiency, back_drivable", () => {
  it('reads it in SI, the service factor and efficiency 1 and the unit back-drivable where left out', () => {
    const c = parseCase(gearbox('{ ratio: 19.4, rated_output_torque: 2000 lbf*ft }'));
    // 1 lbf·ft = 1.3558179483314 N·m (NIST SP 811 App. B.8).
    expect(c.stations[1].gearbox).toMatchObject({ ratio: 19.4, serviceFactor: 1, efficiency: 1, backDrivable: true });
    expect(c.stations[1].gearbox!.ratedOutputTorque).toBeCloseTo(2000 * 1.3558179483314, 6);
    const worm = parseCase(gearbox('{ ratio: 40, rated_output_torque: 1.2 kN*m, service_factor: 1.5, efficiency: 0.55, back_drivable: false }'));
    expect(worm.stations[1].gearbox).toEqual({ ratio: 40, ratedOutputTorque: 1200, serviceFactor: 1.5, efficiency: 0.55, backDrivable: false });
  });

  it.each(['0', '-2'])('a ratio of %s is refused at its line with an example', (ratio) => {
    const t = gearbox(`{ ratio: ${ratio}, rated_output_torque: 2 kN*m }`);
    expect(at(t, 'gearbox', 'stations[1].gearbox.ratio')).toMatch(/is out of range; give the gear unit's ratio, input speed over output speed, from the nameplate, from 0\.001 to 1000, such as 19\.4/);
  });

  it('a missing ratio and a missing rated output torque are each refused', () => {
    expect(problems(gearbox('{ rated_output_torque: 2 kN*m }'))).toMatch(/stations\[1\]\.gearbox\.ratio: is required/);
    expect(problems(gearbox('{ ratio: 10 }'))).toMatch(/stations\[1\]\.gearbox\.rated_output_torque: is required; give the output torque on the gearmotor's nameplate/);
  });

  it('a rated output torque in a stress unit, or of zero, is refused', () => {
    expect(at(gearbox('{ ratio: 10, rated_output_torque: 2 MPa }'), 'gearbox', 'stations[1].gearbox.rated_output_torque')).toMatch(/torque/);
    expect(at(gearbox('{ ratio: 10, rated_output_torque: 0 N*m }'), 'gearbox', 'stations[1].gearbox.rated_output_torque')).toMatch(/greater than zero/);
  });

  it.each(['0', '1.2', '-0.5'])('an efficiency of %s (outside (0, 1]) is refused with an example', (eta) => {
    const t = gearbox(`{ ratio: 10, rated_output_torque: 2 kN*m, efficiency: ${eta} }`);
    expect(at(t, 'gearbox', 'stations[1].gearbox.efficiency')).toMatch(/is out of range; give the gear unit's efficiency as a fraction above 0 and at most 1, such as 0\.96/);
  });

  it('a service factor below 1 is refused, and back_drivable must be true or false', () => {
    expect(at(gearbox('{ ratio: 10, rated_output_torque: 2 kN*m, service_factor: 0.8 }'), 'gearbox', 'stations[1].gearbox.service_factor')).toMatch(/out of range; give the service factor fB/);
    expect(at(gearbox('{ ratio: 10, rated_output_torque: 2 kN*m, back_drivable: no way }'), 'gearbox', 'stations[1].gearbox.back_drivable')).toMatch(/should be true or false/);
  });

  it('an unknown key in the gearbox is named', () => {
    expect(problems(gearbox('{ ratio: 10, rated_output_torque: 2 kN*m, efficency: 0.9 }'))).toMatch(/stations\[1\]\.gearbox.*efficency/);
  });

  it("the drive turns at the gearbox's ratio where it leaves its own out; a different one without a belt is refused", () => {
    const drive = (ratio: string) => `    gearbox: { ratio: 19.4, rated_output_torque: 2.65 kN*m }\n    drive: { ${ratio}rotor_inertia: 0.12 kg*m^2, torque: 300 N*m }`;
    expect(parseCase(text(drive(''))).stations[1].drive!.speedRatio).toBe(19.4);
    expect(parseCase(text(drive('speed_ratio: 19.4, '))).stations[1].drive!.speedRatio).toBe(19.4);
    const t = text(drive('speed_ratio: 20, '));
    expect(at(t, 'drive:', 'stations[1].drive.speed_ratio')).toMatch(/20 differs from this station's gearbox ratio 19\.4, and no belt lies between/);
  });
});

describe("a station's backstop: backstop: true, backstop_rated_torque", () => {
  it('reads a backstop with and without its rated torque', () => {
    expect(parseCase(text('    backstop: true')).stations[1].backstop).toEqual({});
    expect(parseCase(text('    backstop: true\n    backstop_rated_torque: 6 kN*m')).stations[1].backstop).toEqual({ ratedTorque: 6000 });
    expect(parseCase(text('    backstop: false')).stations[1].backstop).toBeUndefined();
  });

  it('a backstop that is not true or false is refused at its line', () => {
    const t = text('    backstop: yes please');
    expect(at(t, 'backstop:', 'stations[1].backstop')).toMatch(/should be true or false/);
  });

  it('a rated torque without the backstop, or in a wrong unit, is refused', () => {
    const t = text('    backstop_rated_torque: 6 kN*m');
    expect(at(t, 'backstop_rated_torque', 'stations[1].backstop_rated_torque')).toMatch(/is given without a backstop; add backstop: true/);
    expect(at(text('    backstop: true\n    backstop_rated_torque: 6 kN'), 'backstop_rated_torque', 'stations[1].backstop_rated_torque')).toMatch(/torque/);
  });
});

describe("a gearbox's output gear teeth: module, face_width, teeth", () => {
  it('reads all three, and refuses two without the third or a tooth count below the Lewis table', () => {
    const c = parseCase(gearbox('{ ratio: 10, rated_output_torque: 2 kN*m, module: 4 mm, face_width: 60 mm, teeth: 78 }'));
    expect(c.stations[1].gearbox!.outputGear).toEqual({ module: 0.004, faceWidth: 0.06, teeth: 78 });
    expect(problems(gearbox('{ ratio: 10, rated_output_torque: 2 kN*m, module: 4 mm, face_width: 60 mm }'))).toMatch(
      /stations\[1\]\.gearbox\.teeth: the tooth bending estimate needs module, face_width and teeth together/,
    );
    expect(problems(gearbox('{ ratio: 10, rated_output_torque: 2 kN*m, module: 4 mm, face_width: 60 mm, teeth: 9 }'))).toMatch(/gearbox\.teeth: 9 is out of range; give the output gear's tooth count/);
  });
});
