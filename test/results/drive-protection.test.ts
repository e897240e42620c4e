import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { capLine } from '../../src/physics/motor-torque.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';

// A motor (rotor 0.5 kg·m², locked-rotor torque 1200 N·m, 1000 N·m at 900 rpm, 300 N·m at 1000 rpm)
// drives a shaft at 1000 rpm through a torque limiter set at 800 N·m; the far end jams. Pulled down,
// the motor settles where its curve gives 800 N·m and the limiter would slip for as long as the
// window lasts; a trip after 250 ms cuts the torque, and the rotor then stops on the limiter's friction.
const tripCase = (lines: string) => `
case: { id: TRIP }
speed: 1000 rpm
stop: { at: jam }
shaft:
  material: aisi-4140-qt540
  segments:
    - { length: 300 mm, diameter: 45 mm }
    - { length: 300 mm, diameter: 45 mm, slip_torque: 800 N*m }
stations:
  - name: motor
    at: 0 mm
    drive:
      rotor_inertia: 0.5 kg*m^2
      running_torque: 300 N*m
      curve: [{ speed: 0 rpm, torque: 1200 N*m }, { speed: 900 rpm, torque: 1000 N*m }, { speed: 1000 rpm, torque: 300 N*m }]
${lines}
  - name: jam
    at: 600 mm
`;
const limiterEnergy = (text: string) => analyseCase(parseCase(text)).dynamic.slips.find((s) => s.kind === 'torque limiter')!;

describe("the drive's protection: trip_after and torque_limit", () => {
  it('reads trip_after and torque_limit in SI', () => {
    const c = parseCase(tripCase('      trip_after: 250 ms\n      torque_limit: 700 N*m'));
    expect(c.stations[0].drive).toMatchObject({ tripAfter: 0.25, torqueLimit: 700 });
  });

  it("a trip cuts the motor at its time, and the limiter's slip energy no longer grows with the window: doubling it moves the energy by less than 0.5 %", () => {
    const r = analyseCase(parseCase(tripCase('      trip_after: 250 ms') + 'analysis: { duration: 600 ms }'));
    const trip = r.dynamic.events.find((e) => /trips/.test(e.text))!;
    expect(trip.time).toBeCloseTo(0.25, 9);
    const a = r.dynamic.slips.find((s) => s.kind === 'torque limiter')!;
    const b = limiterEnergy(tripCase('      trip_after: 250 ms') + 'analysis: { duration: 1200 ms }');
    expect(a.slippingAtEnd).toBe(false);
    expect(Math.abs(b.energy / a.energy - 1)).toBeLessThan(0.005);
    // Without the trip the same limiter slips for the whole window: the check above can fail.
    const c = limiterEnergy(tripCase('') + 'analysis: { duration: 600 ms }');
    const d = limiterEnergy(tripCase('') + 'analysis: { duration: 1200 ms }');
    expect(d.energy / c.energy).toBeGreaterThan(1.5);
  });

  it('the default window covers the trip and the ring-down after it', () => {
    const r = analyseCase(parseCase(tripCase('      trip_after: 250 ms')));
    expect(r.dynamic.duration).toBeGreaterThan(0.25);
    expect(r.dynamic.slips.find((s) => s.kind === 'torque limiter')!.slippingAtEnd).toBe(false);
  });

  it('a torque limit holds the motor at the limit: the peak is T_b + √((T_b − T_d)² + J·k·ω0²) (shared reference 10.4, derived, ODE-checked there) within 0.5 %', () => {
    // J = 1 kg·m², ω0 = 10 rad/s, T_d = 50 N·m running, the motor's 5000 N·m held to T_b = 150 N·m.
    const text = `
case: { id: LIMIT }
speed: 10 rad/s
stop: { at: jam }
shaft:
  material: aisi-1045-cd
  segments: [{ length: 500 mm, diameter: 28.31 mm }]
stations:
  - { name: jam, at: 0 mm }
  - name: motor
    at: 500 mm
    drive: { rotor_inertia: 1 kg*m^2, running_torque: 50 N*m, torque: 5000 N*m, torque_limit: 150 N*m }
analysis: { shaft_inertia: false, damping_ratio: 0, dynamic_plasticity: false }
`;
    const c = parseCase(text);
    const k = (79.3e9 * Math.PI * 0.02831 ** 4) / 32 / 0.5;
    const expected = 150 + Math.sqrt(100 ** 2 + 1 * k * 10 ** 2);
    expect(Math.abs(analyseCase(c).dynamic.peakTorque / expected - 1)).toBeLessThan(0.005);
  });

  it('capLine holds a curve to the limit, with a point where a piece crosses it', () => {
    const line = capLine({ speeds: [0, 100, 110], torques: [1200, 1000, 300] }, 800);
    expect(line.speeds[0]).toBe(0);
    expect(line.torques).toEqual([800, 800, 800, 300]);
    expect(line.speeds[2]).toBeCloseTo(100 + (200 / 700) * 10, 12);
  });
});
