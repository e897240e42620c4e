import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { resultsToJson } from '../../src/views/results-json.ts';
import { renderSummary } from '../../src/views/summary.ts';
import { dynamicPastYieldLines } from '../../src/views/dynamic-past-yield.ts';
import { withFinding } from '../../src/finding/investigation.ts';

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
    const r = withFinding(analyseCase(parseCase(ep5('300 rpm', true))));
    expect(r.dynamic.yielded).toBe(true);
    expect(rel(r.dynamic.peakTorque, 4859.34)).toBeLessThan(0.01);
    expect(rel(r.dynamic.pieces[0].permanentTwist, 0.041193)).toBeLessThan(0.03);
  });

  it('writes permanent_twist_rad per segment and one summary line once an element yielded', () => {
    const r = withFinding(analyseCase(parseCase(ep5('300 rpm', true))));
    const j = resultsToJson(r) as any;
    expect(j.dynamic.segments[0].permanent_twist_rad).toBe(r.dynamic.pieces[0].permanentTwist);
    expect(dynamicPastYieldLines(r).filter((l) => /: peak torque .*, permanent /.test(l))).toHaveLength(1);
  });

  it('below yield (150 rpm, T = 3114.81 N·m) gives the same results as the elastic model and no permanent twist', () => {
    const a = withFinding(analyseCase(parseCase(ep5('150 rpm', true))));
    const b = withFinding(analyseCase(parseCase(ep5('150 rpm', false))));
    expect(a.dynamic.yielded).toBe(false);
    expect(a.dynamic.peakTorque).toBe(b.dynamic.peakTorque);
    expect(a.dynamic.pieces.map((p) => p.permanentTwist)).toEqual([0]);
    expect(rel(a.dynamic.peakTorque, 3114.81)).toBeLessThan(0.005);
    expect(renderSummary(a)).not.toMatch(/Past yield in time/);
  });
});

describe('fracture in time, through analyseCase', () => {
  const J = 0.98646;
  const shaft = (material: string, speed: number, extra = '') => `case: { id: F }
speed: ${speed} rad/s
stop: { at: jam${extra} }
shaft:
  material: ${material}
  segments:
    - { length: 500 mm, diameter: 40 mm }
stations:
  - { name: disc, at: 0 mm, parts: [{ shape: inertia, inertia: ${J} kg*m^2 }] }
  - { name: jam, at: 500 mm }
analysis: { shaft_inertia: false, damping_ratio: 0 }
`;

  it('a ductile shaft breaks in time just above the speed whose energy the energy balance says breaks it, and not just below (±3 %)', () => {
    // The balance's energy to the first break (the area under the torque–twist curve to the
    // fracture strain, checked in plastic-balance's tests) gives the speed √(2E/J).
    const probe = withFinding(analyseCase(parseCase(shaft('aisi-1045-cd', 10))));
    const wf = Math.sqrt((2 * probe.plastic.sides[0].fractureEnergy) / J);
    const above = withFinding(analyseCase(parseCase(shaft('aisi-1045-cd', 1.03 * wf))));
    const below = withFinding(analyseCase(parseCase(shaft('aisi-1045-cd', 0.97 * wf))));
    expect(above.dynamic.fractured).toBe(true);
    expect(above.dynamic.pieces[0].broken).toBe(true);
    expect(above.dynamic.pieces[0].breakTime).toBeGreaterThan(0);
    expect(above.dynamic.events.some((e) => /breaks\.$/.test(e.text))).toBe(true);
    expect(below.dynamic.fractured).toBe(false);
    expect(below.dynamic.yielded).toBe(true);
  });

  it('where the verdict stands on the dynamic model, a break in time makes the verdict "fracture predicted" and the JSON marks the segment', () => {
    const probe = withFinding(analyseCase(parseCase(shaft('aisi-1045-cd', 10))));
    const wf = Math.sqrt((2 * probe.plastic.sides[0].fractureEnergy) / J);
    const r = withFinding(analyseCase(parseCase(shaft('aisi-1045-cd', 1.2 * wf, ', duration: 0.2 ms'))));
    expect(r.pastYieldBasis).toBe('dynamic model');
    expect(r.verdict).toBe('fracture predicted');
    const j = resultsToJson(r) as any;
    expect(j.dynamic.segments[0].broken).toBe(true);
    expect(j.dynamic.segments[0].break_time_s).toBeGreaterThan(0);
    expect(j.past_yield_basis).toBe('dynamic model');
  });

  it('a brittle shaft (gray iron) breaks when its elastic torque reaches S_ut·J_p/c, and not below (±3 %), with no permanent twist', () => {
    // Brittle torsion: fracture when the outer-fibre shear reaches S_ut (Shigley 9th ed. Sec. 5-9;
    // from memory, confident); below it the elastic stop gives T ∝ ω (energy method).
    const probe = withFinding(analyseCase(parseCase(shaft('gray-iron-30', 10))));
    const m = probe.case.materials['gray-iron-30'];
    const Tf = (m.tensileStrength! * Math.PI * 0.04 ** 3) / 16;
    const w = (10 * Tf) / probe.sides[0].peakTorque;
    const above = withFinding(analyseCase(parseCase(shaft('gray-iron-30', 1.03 * w))));
    const below = withFinding(analyseCase(parseCase(shaft('gray-iron-30', 0.97 * w))));
    expect(above.dynamic.fractured).toBe(true);
    expect(below.dynamic.fractured).toBe(false);
    expect(above.dynamic.pieces[0].permanentTwist).toBe(0);
    expect(below.dynamic.yielded).toBe(false);
  });

  it('where the verdict stands on the dynamic model, a brittle shaft that breaks in time makes the verdict "fracture predicted" from the dynamic model, with no word of dynamic_plasticity being off', () => {
    // Same S_ut·J_p/c as above; a ramped stop puts the verdict on the dynamic model.
    const probe = withFinding(analyseCase(parseCase(shaft('gray-iron-30', 10, ', duration: 0.2 ms'))));
    const m = probe.case.materials['gray-iron-30'];
    const Tf = (m.tensileStrength! * Math.PI * 0.04 ** 3) / 16;
    const w = (10 * Tf) / probe.dynamic.peakTorque;
    const r = withFinding(analyseCase(parseCase(shaft('gray-iron-30', 1.5 * w, ', duration: 0.2 ms'))));
    expect(r.verdictBasis).toBe('dynamic model');
    expect(r.dynamic.fractured).toBe(true);
    expect(r.pastYieldBasis).toBe('dynamic model');
    expect(r.verdict).toBe('fracture predicted');
    expect(r.warnings.join(' ')).not.toMatch(/dynamic_plasticity: false/);
  });
});

describe('the largest shear strain of a piece that stays elastic', () => {
  it('is the elastic strain of its peak torque, T·c/(G·J_p) (EP5 at 150 rpm: T = 3114.81 N·m), not zero', () => {
    // Elastic torsion γ = τ/G = T·c/(G·J_p) (Shigley 9th ed. Sec. 3-12; from memory, confident).
    const r = withFinding(analyseCase(parseCase(ep5('150 rpm', true))));
    const gamma = (3114.81 * 0.02) / (79.3e9 * ((Math.PI * 0.04 ** 4) / 32));
    expect(r.dynamic.yielded).toBe(false);
    expect(rel(r.dynamic.pieces[0].maxShearStrain, gamma)).toBeLessThan(0.01);
    expect((resultsToJson(r) as any).dynamic.segments[0].max_shear_strain).toBe(r.dynamic.pieces[0].maxShearStrain);
  });

  it('of a brittle piece that broke is the elastic strain of the torque it broke at, T·c/(G·J_p), not zero', () => {
    const r = analyseCase(parseCase(ep5('300 rpm', true).replace('aisi-1045-cd', 'gray-iron-30')));
    const p = r.dynamic.pieces[0];
    expect(p.broken).toBe(true);
    const G = r.case.materials['gray-iron-30'].shearModulus!;
    expect(p.maxShearStrain).toBeGreaterThan(0);
    expect(rel(p.maxShearStrain, (p.peakTorque * 0.02) / (G * ((Math.PI * 0.04 ** 4) / 32)))).toBeLessThan(1e-9);
  });
});

describe('the elastic check of a yielding dynamic model', () => {
  it('takes its stress and yield ratio from the same chain kept elastic, while the peak torque stays capped at T_P', () => {
    const yielding = withFinding(analyseCase(parseCase(ep5('300 rpm', true))));
    const elastic = withFinding(analyseCase(parseCase(ep5('300 rpm', false))));
    expect(yielding.dynamic.yielded).toBe(true);
    expect(yielding.dynamic.pieces[0].yieldRatio).toBe(elastic.dynamic.pieces[0].yieldRatio);
    expect(yielding.dynamic.pieces[0].elasticPeakTorque).toBe(elastic.dynamic.pieces[0].peakTorque);
    // T_P = (4/3)·T_Y = (4/3)·τ_Y·π·c³/2 for the 40 mm bar (REFERENCE 3.1.5), τ_Y = 0.577·530 MPa.
    const tp = (4 / 3) * ((0.577 * 530e6 * Math.PI * 0.02 ** 3) / 2);
    expect(yielding.dynamic.pieces[0].peakTorque).toBeLessThanOrEqual(tp * (1 + 1e-9));
    expect(yielding.dynamic.pieces[0].elasticPeakTorque).toBeGreaterThan(tp);
  });
});
