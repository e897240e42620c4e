import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { resultsToJson } from '../../src/views/results-json.ts';
import { dynamicLines } from '../../src/views/summary.ts';

// REFERENCE EP5 (shared REFERENCE.md 3.3, derived): J = 0.986460 kg·m² on a d = 40 mm × L = 0.5 m
// shaft, G = 79.3 GPa, AISI 1045 CD S_y = 530 MPa (Shigley 9th ed. Table A-20), τ_Y = 0.577·S_y
// (distortion energy), stopped at once from 300 rpm: T = 4859.34 N·m, residual twist 0.041193 rad.
const ep5 = (speed: string, plastic: boolean) => `case: { id: EP5 }
speed: ${speed}
stop: { at: jam }
shaft:
  material: aisi-1045-cd
  segments:
    - { length: 500 mm, diameter: 40 mm }
stations:
  - { name: disc, at: 0 mm, parts: [{ shape: inertia, inertia: 0.98646 kg*m^2 }] }
  - { name: jam, at: 500 mm }
analysis: { shaft_inertia: false, damping_ratio: 0, dynamic_plasticity: ${plastic} }
`;
const rel = (a: number, b: number) => Math.abs(a / b - 1);

describe('the dynamic model past yield, through analyseCase (EP5)', () => {
  it('peaks at 4859.34 N·m within 1 % and leaves 0.041193 rad of permanent twist within 3 %', () => {
    const r = analyseCase(parseCase(ep5('300 rpm', true)));
    expect(r.dynamic.yielded).toBe(true);
    expect(rel(r.dynamic.peakTorque, 4859.34)).toBeLessThan(0.01);
    expect(rel(r.dynamic.pieces[0].permanentTwist, 0.041193)).toBeLessThan(0.03);
  });

  it('writes permanent_twist_rad per segment and one summary line once an element yielded', () => {
    const r = analyseCase(parseCase(ep5('300 rpm', true)));
    const j = resultsToJson(r) as any;
    expect(j.dynamic.segments[0].permanent_twist_rad).toBe(r.dynamic.pieces[0].permanentTwist);
    expect(dynamicLines(r).filter((l) => /past yield in time: permanent twist/.test(l))).toHaveLength(1);
  });

  it('below yield (150 rpm, T = 3114.81 N·m) gives the same results as the elastic model and no permanent twist', () => {
    const a = analyseCase(parseCase(ep5('150 rpm', true)));
    const b = analyseCase(parseCase(ep5('150 rpm', false)));
    expect(a.dynamic.yielded).toBe(false);
    expect(a.dynamic.peakTorque).toBe(b.dynamic.peakTorque);
    expect(a.dynamic.pieces.map((p) => p.permanentTwist)).toEqual([0]);
    expect(rel(a.dynamic.peakTorque, 3114.81)).toBeLessThan(0.005);
    expect(dynamicLines(a).some((l) => /past yield in time/.test(l))).toBe(false);
  });
});
