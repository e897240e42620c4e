import { describe, expect, it } from 'vitest';
import { runningTorque } from '../../src/results/running-torque.ts';
import { torqueLimiter } from '../../src/resize/torque-limiter.ts';
import { rel, run, type Layout } from '../helpers/layout.ts';

const tauY = 530e6 / Math.sqrt(3); // 1045 CD: Sy = 530 MPa (Shigley 9th ed. Table A-20, from memory, confident); distortion energy
const layout = (drive?: string, analysis?: string): Layout => ({
  rpm: 300,
  segments: [
    [200, 40, 0, 1.5],
    [300, 50, 0],
    [300, 45, 0],
  ],
  stations: [
    ['pulley', 0, 2, drive ? `    drive: ${drive}` : undefined],
    ['jam', 500, 0],
    ['far', 800, 1],
  ],
  stop: 'jam',
  analysis,
});

const limiterOf = (l: Layout) => {
  const { c, r } = run(l);
  return torqueLimiter(c, r, runningTorque(c), c.analysis.designFactor, c.analysis.serviceFactor);
};

describe("the torque limiter's window of settings", () => {
  it("runs from the running torque × service factor to the weakest piece's yield torque (with kt) over N", () => {
    const l = limiterOf(layout('{ running_torque: 300 N*m }', '  limiter_at: pulley'));
    expect(l.min).toBeCloseTo(450, 12);
    // Independent: the 40 mm piece with kt 1.5 yields at τy·πd³/(16·kt) (REFERENCE 3.1.1).
    expect(rel(l.max, (tauY * Math.PI * 0.04 ** 3) / 16 / 1.5 / 1.5)).toBeLessThan(1e-12);
    expect(l.windowEmpty).toBe(false);
    expect(l.weakest.piece.segment.index).toBe(0);
  });

  it('is empty, and says so, when the running torque × service factor exceeds the allowable torque', () => {
    const l = limiterOf(layout('{ running_torque: 1500 N*m }', '  limiter_at: pulley'));
    expect(l.min!).toBeGreaterThan(l.max);
    expect(l.windowEmpty).toBe(true);
  });

  it('has an unknown lower end when the case gives no running torque', () => {
    const l = limiterOf(layout(undefined, '  limiter_at: pulley'));
    expect(l.min).toBeUndefined();
    expect(l.windowEmpty).toBe(false);
  });

  it('sits by default at the loaded station farthest from the stop on the governing side', () => {
    const { r } = run(layout());
    const l = limiterOf(layout());
    expect(l.side).toBe(r.governing.side.side);
    expect(l.placement).toMatch(/loaded station farthest from the stop/);
    expect(l.otherSides.map((s) => s.side)).toEqual(r.sides.filter((s) => s.side !== l.side).map((s) => s.side));
  });

  it("at its highest setting the protected side's yield ratio in a repeat incident is 1/N, where the energy method is exact", () => {
    const l = limiterOf(layout(undefined, '  limiter_at: pulley'));
    expect(l.slip.slipMethod).toBe('energy method');
    expect(l.slip.peakTorque).toBe(l.max);
    expect(rel(l.yieldRatio, 1 / 1.5)).toBeLessThan(1e-12);
  });

  it('with a drive, the repeat incident goes through the dynamic model: the run carries at least the setting', () => {
    const l = limiterOf(layout('{ running_torque: 300 N*m }', '  limiter_at: pulley'));
    expect(l.slip.slipMethod).toBe('dynamic model');
    expect(l.slip.slipEnergy).toBeGreaterThan(0);
    // Coulomb slip: the limiter passes its setting; the shaft's own inertia between it and the stop adds to it.
    expect(l.slip.peakTorque).toBeGreaterThanOrEqual(l.max * (1 - 1e-6));
    expect(l.yieldRatio).toBe(l.slip.yieldRatio);
  });

  it('the sweep for the figure: the repeat peak torque is the setting up to the unlimited peak, then the peak', () => {
    const l = limiterOf(layout(undefined, '  limiter_at: pulley'));
    for (const s of l.sweep) expect(s.peakTorque).toBeCloseTo(Math.min(s.setting, s.unlimitedTorque), 9);
    expect(l.sweep[l.sweep.length - 1].setting).toBeGreaterThan(l.slip.unlimitedTorque);
  });
});
