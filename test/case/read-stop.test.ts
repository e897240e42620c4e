import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { lineOf, problems } from './problems.ts';

const base = readFileSync(new URL('../data/one-disc.yaml', import.meta.url), 'utf8');

describe('the stop section', () => {
  it("reads the duration and the jam's torque capacity", () => {
    const c = parseCase(base.replace('  at: jam', '  at: jam\n  duration: 4 ms\n  torque_capacity: 2.5 kN*m'));
    expect(c.stop).toEqual({ at: 'jam', duration: 0.004, torqueCapacity: 2500 });
    expect(parseCase(base).stop).toEqual({ at: 'jam', duration: 0 });
  });

  it('refuses a capacity that is not a positive torque', () => {
    const text = base.replace('  at: jam', '  at: jam\n  torque_capacity: 0 N*m');
    expect(problems(text).join('\n')).toMatch(
      new RegExp(`:${lineOf(text, 'torque_capacity')}:\\d+ stop\\.torque_capacity: "0 N\\*m" must be greater than zero; give the most torque the jam could hold`),
    );
    const unit = base.replace('  at: jam', '  at: jam\n  torque_capacity: 2500 rpm');
    expect(problems(unit).join('\n')).toMatch(/stop\.torque_capacity: "2500 rpm" is angular speed, not torque/);
  });
});
