import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { lineOf, problems } from './problems.ts';

const base = readFileSync(new URL('../data/one-disc.yaml', import.meta.url), 'utf8');
/** The fixture with a drive at the flywheel station (indented under it). */
const withDrive = (drive: string, extraPart = '') =>
  base.replace('        radius_of_gyration: 180 mm\n', `        radius_of_gyration: 180 mm\n${extraPart}    drive:\n${drive.replace(/^/gm, '      ')}\n`);

describe("a station's drive", () => {
  it("reads the rotor's inertia, ratio, power, running torque and a curve, all in SI at the motor", () => {
    const c = parseCase(
      withDrive(
        'rotor_inertia: 0.3 kg*m^2\nspeed_ratio: 10\npower: 15 kW\nrunning_torque: 90 N*m\ncurve:\n  - { speed: 0 rpm, torque: 200 N*m }\n  - { speed: 1500 rpm, torque: 100 N*m }\n  - { speed: 1520 rpm, torque: 0 N*m }',
      ),
    );
    const s = c.stations[1];
    expect(s.drive).toMatchObject({ speedRatio: 10, power: 15000, runningTorque: 90, rotorParts: [1] });
    const t = s.drive!.torque!;
    expect(t.kind).toBe('curve');
    const pts = t.kind === 'curve' ? t.points : [];
    [
      [0, 200],
      [(1500 * 2 * Math.PI) / 60, 100],
      [(1520 * 2 * Math.PI) / 60, 0],
    ].forEach(([w, T], i) => {
      expect(pts[i].speed).toBeCloseTo(w, 10);
      expect(pts[i].torque).toBe(T);
    });
    // rotor_inertia becomes the station's part "motor rotor" at the drive's ratio, so the energy method counts it once.
    expect(s.parts[1]).toMatchObject({ name: 'motor rotor', inertia: 0.3, speedRatio: 10 });
  });

  it("takes the rotor from the parts at the drive's ratio when rotor_inertia is not given", () => {
    const c = parseCase(withDrive('torque: 50 N*m', '      - { shape: inertia, name: rotor, inertia: 0.1 kg*m^2, speed_ratio: 4 }\n'));
    expect(c.stations[1].drive).toMatchObject({ speedRatio: 4, rotorParts: [1], torque: { kind: 'constant', torque: 50 } });
  });

  it('refuses a rotor given twice, as a part and as rotor_inertia', () => {
    const text = withDrive('rotor_inertia: 0.1 kg*m^2', '      - { shape: inertia, name: rotor, inertia: 0.1 kg*m^2, speed_ratio: 4 }\n');
    expect(problems(text).join('\n')).toMatch(
      new RegExp(
        `case\\.yaml:${lineOf(text, 'rotor_inertia')}:\\d+ stations\\[1\\]\\.drive\\.rotor_inertia: the rotor is already listed as the part "rotor" \\(speed_ratio 4\\); give its inertia once`,
      ),
    );
    const direct = withDrive('rotor_inertia: 0.1 kg*m^2', '      - { shape: inertia, name: motor rotor, inertia: 0.1 kg*m^2 }\n');
    expect(problems(direct).join('\n')).toMatch(/drive\.rotor_inertia: the rotor is already listed as the part "motor rotor"/);
  });

  it('refuses a torque and a curve together, a curve that does not start at standstill, and speeds that do not rise', () => {
    const both = withDrive('torque: 50 N*m\ncurve: [{ speed: 0 rpm, torque: 1 N*m }, { speed: 1600 rpm, torque: 0 N*m }]');
    expect(problems(both).join('\n')).toMatch(new RegExp(`:${lineOf(both, 'curve:')}:\\d+ stations\\[1\\]\\.drive\\.curve: give either torque \\(constant\\) or curve`));
    const late = withDrive('curve:\n  - { speed: 100 rpm, torque: 10 N*m }\n  - { speed: 1600 rpm, torque: 0 N*m }');
    expect(problems(late).join('\n')).toMatch(
      new RegExp(`:${lineOf(late, 'speed: 100 rpm')}:\\d+ stations\\[1\\]\\.drive\\.curve\\[0\\]\\.speed: the curve starts at standstill; give the locked-rotor point first`),
    );
    const back = withDrive('curve:\n  - { speed: 0 rpm, torque: 10 N*m }\n  - { speed: 0 rpm, torque: 0 N*m }');
    expect(problems(back).join('\n')).toMatch(/drive\.curve\[1\]\.speed: speeds must rise from one point to the next/);
  });

  it("refuses a curve that ends below the motor's speed at the stop", () => {
    const text = withDrive('speed_ratio: 10\nrotor_inertia: 0.1 kg*m^2\ncurve:\n  - { speed: 0 rpm, torque: 10 N*m }\n  - { speed: 1000 rpm, torque: 0 N*m }');
    expect(problems(text).join('\n')).toMatch(
      new RegExp(`:${lineOf(text, '- { speed: 0 rpm')}:\\d+ stations\\[1\\]\\.drive\\.curve: ends at 1000 rpm, below the motor's speed at the stop \\(1500 rpm = shaft speed × speed_ratio 10\\)`),
    );
  });

  it('refuses an unknown key in a drive, with a did-you-mean', () => {
    const text = withDrive('rotor_inerta: 0.1 kg*m^2');
    expect(problems(text).join('\n')).toMatch(new RegExp(`:${lineOf(text, 'rotor_inerta')}:\\d+ stations\\[1\\]\\.drive\\.rotor_inerta: unknown key; did you mean "rotor_inertia"\\?`));
  });
});

describe("a drive's belt", () => {
  const belt = (b: string) => withDrive(`rotor_inertia: 0.05 kg*m^2\nspeed_ratio: 3\nbelt:\n${b.replace(/^/gm, '  ')}`);

  it('reads a stated slip torque, or the capstan data in SI', () => {
    expect(parseCase(belt('slip_torque: 800 N*m')).stations[1].drive!.belt).toEqual({ kind: 'slip torque', slipTorque: 800 });
    const c = parseCase(belt('wrap_angle: 160 deg\nfriction: 0.3\ngroove_angle: 38 deg\ntension: 2 kN\npulley_diameter: 400 mm'));
    const b = c.stations[1].drive!.belt!;
    expect(b).toMatchObject({ kind: 'capstan', friction: 0.3, tension: 2000, tensionIs: 'installed', pulleyDiameter: 0.4 });
    if (b.kind === 'capstan') {
      expect(b.wrapAngle).toBeCloseTo((160 * Math.PI) / 180, 12);
      expect(b.grooveAngle).toBeCloseTo((38 * Math.PI) / 180, 12);
    }
    expect(parseCase(belt('wrap_angle: 160 deg\nfriction: 0.3\ntight_side_tension: 3 kN\npulley_diameter: 400 mm')).stations[1].drive!.belt).toMatchObject({ tensionIs: 'tight side', tension: 3000 });
  });

  it('refuses a slip torque together with belt data, and belt data with a key missing', () => {
    const mixed = belt('slip_torque: 800 N*m\nfriction: 0.3');
    expect(problems(mixed).join('\n')).toMatch(new RegExp(`:${lineOf(mixed, 'friction: 0.3')}:\\d+ stations\\[1\\]\\.drive\\.belt\\.friction: give either slip_torque or the belt data`));
    const short = belt('wrap_angle: 160 deg\nfriction: 0.3\ntension: 2 kN');
    expect(problems(short).join('\n')).toMatch(/stations\[1\]\.drive\.belt\.pulley_diameter: is required with belt data; give the diameter of the pulley on this shaft/);
    const twoTensions = belt('wrap_angle: 160 deg\nfriction: 0.3\ntension: 2 kN\ntight_side_tension: 3 kN\npulley_diameter: 400 mm');
    expect(problems(twoTensions).join('\n')).toMatch(/drive\.belt\.tight_side_tension: give one of tension \(installed/);
  });

  it('needs the rotor behind the belt and the pulley on the shaft', () => {
    const noRotor = withDrive('belt: { slip_torque: 800 N*m }');
    expect(problems(noRotor).join('\n')).toMatch(/stations\[1\]\.drive\.rotor_inertia: a belt drive needs the motor's rotor behind the belt/);
  });
});
