import { describe, expect, it } from 'vitest';
import { runningTorque } from '../../src/results/running-torque.ts';
import { caseOf, type Layout } from '../helpers/layout.ts';

const layout = (drive?: string): Layout => ({
  rpm: 1460,
  segments: [[500, 50, 0]],
  stations: [
    ['motor end', 0, 1, drive ? `    drive: ${drive}` : undefined],
    ['jam', 500, 0],
  ],
  stop: 'jam',
});

describe('runningTorque: the torque at shaft speed in normal running', () => {
  it("is the drive's power over the shaft speed, T = P/ω (Shigley 9th ed. Sec. 3-12)", () => {
    const t = runningTorque(caseOf(layout('{ power: 7.5 kW }')))!;
    // Independent: T[N·m] = 9549.3·P[kW]/n[rpm] (REFERENCE 1.1.9, 60 000/2π).
    expect(Math.abs(t.torque / ((9549.2966 * 7.5) / 1460) - 1)).toBeLessThan(1e-7);
    expect(t.source).toMatch(/power of the drive at "motor end" over the shaft speed, T = P\/ω/);
    expect(t.station).toBe('motor end');
  });

  it('takes running_torque as given when the case states it', () => {
    const t = runningTorque(caseOf(layout('{ power: 7.5 kW, running_torque: 60 N*m }')))!;
    expect(t.torque).toBe(60);
    expect(t.source).toMatch(/running_torque/);
  });

  it('is undefined when no station has a drive with power or running torque', () => {
    expect(runningTorque(caseOf(layout()))).toBeUndefined();
    expect(runningTorque(caseOf(layout('{ speed_ratio: 3 }')))).toBeUndefined();
  });
});
