import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { lineOf, problems } from '../helpers/case-problems.ts';
import { caseText } from '../helpers/layout.ts';

const withDrive = (drive: string) =>
  caseText({ rpm: 300, segments: [[500, 50, 0]], stations: [['drive', 0, 1, `    drive: ${drive}`], ['jam', 500, 0]], stop: 'jam' });

describe('a station\'s drive: power, running_torque, speed_ratio', () => {
  it('reads the power, the running torque and the speed ratio in SI', () => {
    const c = parseCase(withDrive('{ power: 15 hp, running_torque: 330 lbf*ft, speed_ratio: 38.9 }'));
    const d = c.stations[0].drive!;
    // 1 hp = 550 ft·lbf/s = 745.69987 W; 1 lbf·ft = 1.3558179 N·m (NIST SP 811 App. B.8, REFERENCE 12).
    expect(d.power).toBeCloseTo(15 * 745.69987158227, 6);
    expect(d.runningTorque).toBeCloseTo(330 * 1.3558179483314, 9);
    expect(d.speedRatio).toBe(38.9);
  });

  it('leaves the drive out when a station has none', () => {
    expect(parseCase(withDrive('{ power: 22 kW }')).stations[1].drive).toBeUndefined();
  });

  it('an unknown drive key is reported with a did-you-mean and its line', () => {
    const text = withDrive('{ powr: 22 kW }');
    expect(problems(text)).toMatch(new RegExp(`case\\.yaml:${lineOf(text, 'powr')}:\\d+ stations\\[0\\]\\.drive\\.powr: unknown key; did you mean "power"\\?`));
  });

  it('a power in the wrong unit says what a power looks like', () => {
    const text = withDrive('{ power: 22 N*m }');
    expect(problems(text)).toMatch(new RegExp(`case\\.yaml:${lineOf(text, '22 N*m')}:\\d+ stations\\[0\\]\\.drive\\.power: "22 N\\*m" is torque, not power; give a power such as "22 kW"`));
  });

  it('a zero running torque is out of range', () => {
    expect(problems(withDrive('{ running_torque: 0 N*m }'))).toMatch(/stations\[0\]\.drive\.running_torque: "0 N\*m" must be greater than zero; give the torque at shaft speed/);
  });
});
