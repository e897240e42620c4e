import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';

// A disc of 2 kg·m² at 100 rpm on a 40 mm × 500 mm steel shaft (G = 79.3 GPa, Shigley 9th ed. Table
// A-5) with a flexible coupling of 20 kN·m/rad in it; the other end jams. Two springs in series:
// k = k_s·k_c/(k_s + k_c) (shared reference 1.1.5, from memory, confident); ω_n = √(k/J) (10.1) and
// the peak of an instantaneous stop T = ω0·√(J·k) (10.2).
const text = (coupling: string, analysis = 'analysis: { shaft_inertia: false, damping_ratio: 0 }') => `
case: { id: COUPLED }
speed: 100 rpm
stop: { at: jam }
shaft:
  material: aisi-1045-cd
  segments:
    - { length: 500 mm, diameter: 40 mm, coupling: ${coupling} }
stations:
  - { name: jam, at: 0 mm }
  - { name: disc, at: 500 mm, parts: [{ shape: inertia, inertia: 2 kg*m^2 }] }
${analysis}
`;
const ks = (79.3e9 * Math.PI * 0.04 ** 4) / 32 / 0.5;
const kc = 20e3;
const k = (ks * kc) / (ks + kc);
const w0 = (100 * 2 * Math.PI) / 60;

describe('couplingChecks: a coupling in series with the shaft', () => {
  const r = analyseCase(parseCase(text('{ stiffness: 20 kN*m/rad, rated_torque: 1 kN*m, peak_torque: 2.5 kN*m }')));

  it('the first natural frequency and the peak torque agree with two springs in series within 0.5 %', () => {
    expect(Math.abs(r.dynamic.naturalFrequencies[0] / (Math.sqrt(k / 2) / (2 * Math.PI)) - 1)).toBeLessThan(0.005);
    expect(Math.abs(r.dynamic.peakTorque / (w0 * Math.sqrt(2 * k)) - 1)).toBeLessThan(0.005);
    expect(Math.abs(r.sides[0].peakTorque / (w0 * Math.sqrt(2 * k)) - 1)).toBeLessThan(1e-9);
  });

  it('rates the coupling against the torque it carried: by its maximum torque where given', () => {
    const c = r.couplings[0];
    expect(c.capacity).toBe(2500);
    expect(c.capacityRatio).toBeCloseTo(r.dynamic.peakTorque / 2500, 9);
    expect(c.ratedRatio).toBeCloseTo(r.dynamic.peakTorque / 1000, 9);
  });

  it('per degree is per degree: 349.07 N·m/deg is 20 kN·m/rad (derived, 1 rad = 180/π deg)', () => {
    const same = analyseCase(parseCase(text(`{ stiffness: ${(20e3 * Math.PI) / 180} N*m/deg, rated_torque: 1 kN*m }`)));
    expect(same.sides[0].peakTorque).toBeCloseTo(r.sides[0].peakTorque, 6);
  });

  it('a rigid coupling (no stiffness) leaves the torque as the shaft alone gives it, and is only rated', () => {
    const rigid = analyseCase(parseCase(text('{ rated_torque: 1 kN*m }')));
    expect(Math.abs(rigid.sides[0].peakTorque / (w0 * Math.sqrt(2 * ks)) - 1)).toBeLessThan(1e-9);
    expect(rigid.couplings[0].stiffness).toBeUndefined();
  });

  it('a soft coupling left out changes the peak by a large factor: here √(k_s/k) = 1.73', () => {
    const rigid = analyseCase(parseCase(text('{ rated_torque: 1 kN*m }')));
    expect(rigid.sides[0].peakTorque / r.sides[0].peakTorque).toBeCloseTo(Math.sqrt(ks / k), 6);
  });
});
