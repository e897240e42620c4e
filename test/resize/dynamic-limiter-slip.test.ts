import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { dynamicLimiterSlip } from '../../src/resize/dynamic-limiter-slip.ts';
import { limiterSlip } from '../../src/resize/limiter-slip.ts';
import { resizeCase } from '../../src/resize/resize-case.ts';
import { caseText } from '../helpers/layout.ts';

const sample = (f: string) => parseCase(readFileSync(new URL(`../../sample-cases/${f}`, import.meta.url), 'utf8'));

describe('a torque limiter\'s slip through the dynamic model, where the verdict stands on it', () => {
  it('the granulator\'s limiter slip energy and angle are those of a slip element in an independent rerun of the changed case', () => {
    const c = sample('granulator-tramp-metal.yaml');
    const r = analyseCase(c);
    expect(r.verdictBasis).toBe('dynamic model');
    const z = resizeCase(c, r);
    const s = z.limiter.slip;
    expect(s.slipMethod).toBe('dynamic model');
    // The sheave seat holds the drive sheave's station inside it, so the limiter goes in the next
    // piece toward the stop: the bearing journal, segment index 1. Built here by hand, not by the program.
    expect(s.segment).toBe(1);
    const changed = { ...c, shaft: { segments: c.shaft.segments.map((g) => (g.index === 1 ? { ...g, slipTorque: z.limiter.max } : g)) } };
    const rerun = analyseCase(changed);
    const element = rerun.dynamic.slips.find((x) => x.element === 'the torque limiter in "bearing journal"')!;
    expect(element.energy).toBeGreaterThan(0);
    expect(s.slipEnergy).toBe(element.energy);
    expect(s.slipAngle).toBe(element.angle);
    // Coulomb slip: the work is the slip torque times the angle slipped (friction work at constant torque).
    expect(Math.abs(element.energy - z.limiter.max * element.angle) / element.energy).toBeLessThan(1e-6);
    // The energy books of the rerun close: what came in (parts, motor) went to slip (limiter and
    // belt), damping and what is left; tolerance 0.1 % of what came in, for the integration.
    const b = rerun.dynamic.energy;
    const slips = rerun.dynamic.slips.reduce((sum, x) => sum + x.energy, 0);
    const input = b.initial + b.motorWork + b.boundaryWork;
    expect(Math.abs(slips + b.dampingWork + b.final + b.released - input)).toBeLessThan(1e-3 * input);
    expect(JSON.stringify(z.limiter.slip.method)).toMatch(/dynamic model/);
  });

  it('the roll line\'s existing limiter is taken as the limiter\'s place and set to the option\'s setting', () => {
    const c = sample('roll-line-limiter-two-sides.yaml');
    const r = analyseCase(c);
    const z = resizeCase(c, r);
    expect(z.limiter.slip.segment).toBe(1);
    const changed = { ...c, shaft: { segments: c.shaft.segments.map((g) => (g.index === 1 ? { ...g, slipTorque: z.limiter.max } : g)) } };
    const element = analyseCase(changed).dynamic.slips.find((x) => x.kind === 'torque limiter')!;
    expect(z.limiter.slip.slipEnergy).toBe(element.energy);
    expect(element.slipTorque).toBe(z.limiter.max);
  });

  it('with one mass and a short stop ramp, the slip energy and the energy left account for the side\'s energy within the damping losses', () => {
    // One disc (J = 1 kg·m², 50 rad/s, 1250 J) on a 40 mm shaft; a 0.1 ms stop ramp puts the verdict on the dynamic model.
    const text = caseText({ rpm: 1, segments: [[100, 40, 0], [400, 40, 0]], stations: [['disc', 0, 1], ['jam', 500, 0]], stop: 'jam' })
      .replace('speed: 1 rpm', 'speed: 50 rad/s')
      .replace('stop: { at: jam }', 'stop: { at: jam, duration: 0.1 ms }');
    const r = analyseCase(parseCase(text));
    expect(r.verdictBasis).toBe('dynamic model');
    const d = dynamicLimiterSlip(r.case, 'disc', 'A', 500)!;
    expect(d.segment).toBe(0);
    const b = d.rerun.dynamic.energy;
    // The side's energy is the disc's ½Jω² plus the shaft's own; it goes into slip, damping or stays.
    expect(b.initial).toBeGreaterThan(1250);
    const unaccounted = b.initial - d.slipEnergy - d.energyLeft;
    // Tolerance: the damping work plus 0.1 % of the side's energy (integration error).
    expect(Math.abs(unaccounted - d.dampingWork)).toBeLessThan(1e-3 * b.initial);
    expect(unaccounted).toBeGreaterThanOrEqual(-1e-3 * b.initial);
    // The energy method's slip, E − T_s²C/2 = 1250 − 1.25 J (REFERENCE 10.11, derived), is near: the
    // dynamic model adds the shaft's own inertia and the ramp; within 3 % of the side's energy.
    expect(Math.abs(d.slipEnergy - (1250 - 500 ** 2 / 2 / ((79.3e9 * Math.PI * 0.04 ** 4) / 32 / 0.5)))).toBeLessThan(0.03 * 1250);
    expect(limiterSlip(r, { station: 'disc', side: 'A' }, 500).slipEnergy).toBe(d.slipEnergy);
  });

  it('keeps the energy method and says so when no segment between the limiter and the stop can hold it', () => {
    // One segment holds both the disc (inside it) and the stop (inside it): nowhere to put a limiter.
    const text = caseText({ rpm: 300, segments: [[600, 40, 0]], stations: [['disc', 100, 1], ['jam', 500, 0]], stop: 'jam' }).replace('stop: { at: jam }', 'stop: { at: jam, duration: 1 ms }');
    const r = analyseCase(parseCase(text));
    const s = limiterSlip(r, { station: 'disc', side: 'A' }, 500);
    expect(s.slipMethod).toBe('energy method');
    expect(s.note).toMatch(/No shaft segment between "disc" and the stop can hold a limiter/);
  });
});
