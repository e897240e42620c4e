import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { BacklashLaw } from '../../src/physics/backlash-law.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { problems } from '../helpers/case-problems.ts';

// A motor's rotor (J = 1 kg·m²) turning at ω0 = 10 rad/s drives a 28.31 mm × 500 mm steel shaft
// (G = 79.3 GPa, Shigley 9th ed. Table A-5) whose far end jams; the motor keeps a constant T = 400
// N·m, and a gap g lies in the shaft. Closed form (derived): across the gap the constant torque
// adds T·g to the kinetic energy, J·v² = J·ω0² + 2·T·g; then against the elastic stop
// J·ẍ = T − k·x, so T_max = T + √(T² + k·J·v²) (shared reference 10.3 and 10.4 with the gap's work added).
const text = (backlash: string) => `
case: { id: GAP }
speed: 10 rad/s
stop: { at: jam }
shaft:
  material: aisi-1045-cd
  segments: [{ length: 500 mm, diameter: 28.31 mm${backlash} }]
stations:
  - { name: jam, at: 0 mm }
  - name: motor
    at: 500 mm
    drive: { rotor_inertia: 1 kg*m^2, torque: 400 N*m }
analysis: { shaft_inertia: false, damping_ratio: 0, dynamic_plasticity: false }
`;
const k = (79.3e9 * Math.PI * 0.02831 ** 4) / 32 / 0.5;
const closed = (g: number) => 400 + Math.sqrt(400 ** 2 + k * (100 + 2 * 400 * g));

describe('BacklashLaw: a gap, then an elastic stop', () => {
  it('carries no torque inside the gap and k·(θ − end) beyond it', () => {
    const law = new BacklashLaw(1000, -0.01, 0, -0.01);
    expect(law.torque(-0.005)).toBe(0);
    expect(law.leave(-0.005)).toBeLessThan(0);
    expect(law.leave(0.001)).toBeGreaterThan(0);
    expect(law.enter(0.001)).toBe('closes its gap');
    expect(law.torque(0.002)).toBeCloseTo(2, 12);
    expect(law.energy(0.002)).toBeCloseTo(0.002, 12);
  });

  it('the peak torque after a 2° gap agrees with the closed form within 1 %, and is higher than without the gap', () => {
    const g = (2 * Math.PI) / 180;
    const withGap = analyseCase(parseCase(text(', backlash: 2 deg'))).dynamic.peakTorque;
    const without = analyseCase(parseCase(text(''))).dynamic.peakTorque;
    expect(Math.abs(withGap / closed(g) - 1)).toBeLessThan(0.01);
    expect(Math.abs(without / closed(0) - 1)).toBeLessThan(0.01);
    expect(withGap / without).toBeGreaterThan(1.05);
  });

  it('a segment with both a limiter and backlash is refused', () => {
    expect(problems(text(', backlash: 1 deg, slip_torque: 500 N*m'))).toMatch(/shaft\.segments\[0\]\.backlash: a segment with a limiter or shear pin cannot also hold the backlash/);
  });
});
