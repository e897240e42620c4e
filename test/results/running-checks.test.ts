import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';

const fixture = readFileSync(new URL('../data/one-disc.yaml', import.meta.url), 'utf8');
const withDrive = (drive: string) => fixture.replace('        radius_of_gyration: 180 mm\n', `        radius_of_gyration: 180 mm\n    drive: ${drive}\n`);

describe('checks on how the drive ran before the stop', () => {
  it("warns when the running torque is off the motor's curve at the running speed", () => {
    const r = analyseCase(parseCase(withDrive('{ rotor_inertia: 0.1 kg*m^2, running_torque: 50 N*m, curve: [{ speed: 0 rpm, torque: 200 N*m }, { speed: 160 rpm, torque: 0 N*m }] }')));
    // On the line from (0, 200) to (160 rpm, 0) the motor gives 200·(1 − 150/160) = 12.5 N·m at 150 rpm.
    expect(r.warnings.join(' ')).toMatch(/running torque of the motor at "flywheel" \(50 N·m\) is not on its curve at the running speed \(12\.5 N·m\)/);
  });

  it('warns when a belt or a limiter could not have carried the running torque', () => {
    const belt = analyseCase(parseCase(withDrive('{ rotor_inertia: 0.1 kg*m^2, speed_ratio: 2, running_torque: 100 N*m, belt: { slip_torque: 150 N*m } }')));
    expect(belt.warnings.join(' ')).toMatch(/The belt at "flywheel" can carry 150 N·m at the shaft, less than the running torque there \(200 N·m\)/);
    const limiter = analyseCase(parseCase(withDrive('{ rotor_inertia: 0.1 kg*m^2, running_torque: 100 N*m }').replace('      diameter: 50 mm', '      diameter: 50 mm\n      slip_torque: 80 N*m')));
    expect(limiter.warnings.join(' ')).toMatch(/The torque limiter in segment 1 is set at 80 N·m, below the running torque through it \(100 N·m\)/);
  });

  it('says nothing for the sample cases, whose drives are consistent', () => {
    const r = analyseCase(parseCase(readFileSync(new URL('../../sample-cases/granulator-tramp-metal.yaml', import.meta.url), 'utf8')));
    expect(r.warnings.join(' ')).not.toMatch(/normal running|not on its curve/);
  });
});
