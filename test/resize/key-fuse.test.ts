import { describe, expect, it } from 'vitest';
import { runningTorque } from '../../src/results/running-torque.ts';
import { keyFuses } from '../../src/resize/key-fuse.ts';
import { withFinding } from '../../src/finding/investigation.ts';
import { rel, run, type Layout } from '../helpers/layout.ts';

const key = (k: string, drive = '{ running_torque: 500 N*m }') => `    drive: ${drive}\n    key: ${k}`;
const layout = (k: string): Layout => ({
  rpm: 200,
  segments: [
    [100, 40, 0],
    [400, 50, 0],
  ],
  stations: [
    ['pulley', 50, 3, key(k)],
    ['jam', 500, 0],
  ],
  stop: 'jam',
});
const fusesOf = (l: Layout, limiter?: { station: string; setting: number }) => {
  const { c, r: results } = run(l);
  const r = withFinding(results);
  const lim = limiter && { ...limiter, sidePeakTorque: r.sides[0].peakTorque };
  return { r, fuses: keyFuses(c, r, lim, runningTorque(c)) };
};

describe('the key as a fuse', () => {
  it('under a running torque of 500 N·m a 12 × 8 × 50 mm key on 40 mm matches the derived metric example', () => {
    // REFERENCE 7.6 (derived): τ = 41.67 MPa, σ = 125.0 MPa (h/2), 166.7 MPa with 3 mm in the hub.
    const [k] = fusesOf(layout('{ width: 12 mm, height: 8 mm, length: 50 mm, material: aisi-1045-cd }')).fuses;
    expect(k.segment.diameter).toBe(0.04);
    expect(k.atRunning!.shearStress / 1e6).toBeCloseTo(41.667, 3);
    expect(k.atRunning!.bearingStress / 1e6).toBeCloseTo(125.0, 6);
    const [h] = fusesOf(layout('{ width: 12 mm, height: 8 mm, length: 50 mm, material: aisi-1045-cd, hub_depth: 3 mm }')).fuses;
    expect(h.atRunning!.bearingStress / 1e6).toBeCloseTo(166.667, 3);
    // Factor to the first of shear yield (0.577·Sy) and bearing yield (Sy), Sy = 530 MPa (Shigley 9th ed. Table A-20).
    expect(k.atRunning!.factor).toBeCloseTo(Math.min(530e6 / Math.sqrt(3) / 41.667e6, 530e6 / 125e6), 3);
  });

  it("under the incident torque the key carries the torque the finding's drive train gives it: τ = 2T/(d·w·l) (Shigley 9th ed. Sec. 7-7)", () => {
    const { r, fuses } = fusesOf(layout('{ width: 12 mm, height: 8 mm, length: 50 mm, material: aisi-1045-cd }'));
    const T = r.finding.driveTrain.find((e) => e.kind === 'key')!.torque;
    expect(fuses[0].incident.torque).toBe(T);
    expect(T).toBe(r.keys[0].torque);
    expect(rel(fuses[0].incident.shearStress, (2 * T) / (0.04 * 0.012 * 0.05))).toBeLessThan(1e-12);
    expect(rel(fuses[0].incident.bearingStress, (4 * T) / (0.04 * 0.008 * 0.05))).toBeLessThan(1e-12);
  });

  it('a small key shears off before the shaft yields, a full-size one does not', () => {
    const small = fusesOf(layout('{ width: 3 mm, height: 3 mm, length: 10 mm, material: aisi-1018-cd }')).fuses[0];
    const full = fusesOf(layout('{ width: 12 mm, height: 8 mm, length: 50 mm, material: aisi-1045-cd }')).fuses[0];
    // Shear-off at S_su ≈ 0.67·Sut (Shigley 9th ed. Sec. 6-15), 1018 CD Sut = 440 MPa (Table A-20);
    // the shaft's 40 mm piece yields at τy·πd³/16 (REFERENCE 3.1.1).
    expect(rel(small.shearOffTorque, (0.67 * 440e6 * 0.04 * 0.003 * 0.01) / 2)).toBeLessThan(1e-12);
    expect(rel(small.shaftYieldTorque, ((530e6 / Math.sqrt(3)) * Math.PI * 0.04 ** 3) / 16)).toBeLessThan(1e-12);
    expect(small.shearsBeforeShaftYields).toBe(true);
    expect(full.shearsBeforeShaftYields).toBe(false);
  });

  it("under the limiter's setting the key sees the setting, when it is below the incident torque", () => {
    const { fuses } = fusesOf(layout('{ width: 12 mm, height: 8 mm, length: 50 mm, material: aisi-1045-cd }'), { station: 'pulley', setting: 400 });
    expect(fuses[0].atLimiter!.torque).toBe(400);
  });

  it("a key at the stop takes both sides' peak torques together", () => {
    const l: Layout = {
      rpm: 200,
      segments: [
        [300, 50, 0],
        [300, 50, 0],
      ],
      stations: [
        ['a', 0, 2],
        ['jam', 300, 0, '    key: { width: 14 mm, height: 9 mm, length: 60 mm, material: aisi-1045-cd }'],
        ['b', 600, 1],
      ],
      stop: 'jam',
    };
    const { r, fuses } = fusesOf(l);
    expect(fuses[0].incident.torque).toBeCloseTo(r.sides[0].peakTorque + r.sides[1].peakTorque, 9);
  });

  it('says when a key is longer than 1.5 d (Shigley 9th ed. p. 391)', () => {
    const [k] = fusesOf(layout('{ width: 12 mm, height: 8 mm, length: 70 mm, material: aisi-1045-cd }')).fuses;
    expect(k.notes.join(' ')).toMatch(/longer than 1\.5 times the shaft's diameter/);
  });
});
