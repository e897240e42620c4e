import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { energyLimiterSlip, energyMethodSlip, limiterSlip } from '../../src/resize/limiter-slip.ts';
import { caseText, rel } from '../helpers/layout.ts';

describe("a torque limiter's slip in a repeat incident, by the energy method", () => {
  it('matches the derived limiter example: J = 1 kg·m², ω0 = 50 rad/s, k = 10⁵ N·m/rad, T_s = 500 N·m', () => {
    // REFERENCE 10.11 (derived): stored T_s²/(2k) = 1.25 J, dissipated ½Jω0² − T_s²/(2k) = 1248.75 J;
    // without the limiter the peak would be ω0√(Jk) = 15 811 N·m.
    const s = energyMethodSlip(0.5 * 1 * 50 ** 2, 1e-5, 500);
    expect(s.storedEnergy).toBeCloseTo(1.25, 12);
    expect(s.slipEnergy).toBeCloseTo(1248.75, 9);
    expect(s.unlimitedTorque).toBeCloseTo(15811.388, 3);
    expect(s.peakTorque).toBe(500);
    expect(s.slipAngle).toBeCloseTo(1248.75 / 500, 12);
  });

  it('a setting above the unlimited peak never slips', () => {
    const s = energyMethodSlip(1250, 1e-5, 20000);
    expect(s.slipEnergy).toBe(0);
    expect(s.slipAngle).toBe(0);
    expect(s.peakTorque).toBeCloseTo(15811.388, 3);
  });

  it("through a whole case: the energy behind the limiter and the run's compliance come from the engine", () => {
    const text = caseText({
      rpm: 1,
      segments: [[500, 40, 0]],
      stations: [
        ['disc', 0, 1],
        ['jam', 500, 0],
      ],
      stop: 'jam',
    }).replace('speed: 1 rpm', 'speed: 50 rad/s');
    const r = analyseCase(parseCase(text));
    const s = limiterSlip(r, { station: 'disc', side: 'A' }, 500);
    // Independent: k = G·J_p/L with G = 79.3 GPa (Shigley 9th ed. Table A-5), J_p = πd⁴/32.
    const k = (79.3e9 * Math.PI * 0.04 ** 4) / 32 / 0.5;
    expect(s.energy).toBeCloseTo(1250, 9);
    expect(rel(s.storedEnergy, 500 ** 2 / (2 * k))).toBeLessThan(1e-12);
    expect(rel(s.slipEnergy, 1250 - 500 ** 2 / (2 * k))).toBeLessThan(1e-12);
    expect(rel(s.unlimitedTorque, 50 * Math.sqrt(1 * k))).toBeLessThan(1e-12);
    expect(s.method).toMatch(/energy method/);
  });

  it('where the energy method is exact, the limiter keeps its numbers and says so', () => {
    const text = caseText({
      rpm: 1,
      segments: [[500, 40, 0]],
      stations: [
        ['disc', 0, 1],
        ['jam', 500, 0],
      ],
      stop: 'jam',
    }).replace('speed: 1 rpm', 'speed: 50 rad/s');
    const r = analyseCase(parseCase(text));
    expect(r.verdictBasis).toBe('energy method');
    const s = limiterSlip(r, { station: 'disc', side: 'A' }, 500);
    expect(s.slipMethod).toBe('energy method');
    expect(s).toEqual(energyLimiterSlip(r, { station: 'disc', side: 'A' }, 500));
    const k = (79.3e9 * Math.PI * 0.04 ** 4) / 32 / 0.5;
    expect(rel(s.slipEnergy, 1250 - 500 ** 2 / (2 * k))).toBeLessThan(1e-12);
    expect(s.segment).toBeUndefined();
  });
});
