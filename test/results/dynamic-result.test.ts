import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { polarMoment } from '../../src/physics/torsion.ts';

const fixture = readFileSync(new URL('../data/one-disc.yaml', import.meta.url), 'utf8');

/** A flywheel on a shaft with a friction torque limiter in the segment next to it, stopped at the other end. */
function limiterCase(slip: string, analysis = 'analysis: { shaft_inertia: false, damping_ratio: 0 }') {
  return `case: { id: L }
speed: 400 rpm
stop: { at: jam }
shaft:
  material: aisi-4140-qt540
  segments:
    - { length: 200 mm, diameter: 60 mm, label: limiter seat, slip_torque: ${slip} }
    - { length: 600 mm, diameter: 50 mm, label: shaft }
stations:
  - { name: flywheel, at: 0 mm, parts: [{ shape: inertia, inertia: 4 kg*m^2 }] }
  - { name: jam, at: 800 mm }
${analysis}
`;
}

describe('dynamicResult through analyseCase', () => {
  it('one mass on a massless undamped shaft stopped at once agrees with the energy method within 0.1 %', () => {
    // Shared REFERENCE.md 10.2; the energy method is exact for this case (Gere & Goodno, Mechanics of Materials 7th ed., Problem 3.9-11).
    const r = analyseCase(parseCase(fixture + 'analysis: { shaft_inertia: false, damping_ratio: 0 }\n'));
    expect(Math.abs(r.dynamic.peakTorque / r.sides[0].peakTorque - 1)).toBeLessThan(1e-3);
    expect(Math.abs(r.dynamic.yieldRatio / r.sides[0].pieces[0].yieldRatio - 1)).toBeLessThan(1e-3);
    expect(r.verdictBasis).toBe('energy method');
    // Its one natural frequency is √(k/J)/2π (shared REFERENCE.md 10.1).
    const k = 1 / r.sides[0].compliance;
    expect(r.dynamic.naturalFrequencies[0]).toBeCloseTo(Math.sqrt(k / (40 * 0.18 ** 2)) / (2 * Math.PI), 6);
  });

  it('with the shaft\'s own inertia and default damping it stays within a few percent of the energy method', () => {
    const r = analyseCase(parseCase(fixture));
    expect(r.dynamic.shaftInertia).toBe(true);
    expect(r.dynamic.converged).toBe(true);
    expect(Math.abs(r.dynamic.peakTorque / r.sides[0].peakTorque - 1)).toBeLessThan(0.02);
  });

  it('a torque limiter set below the shaft\'s yield torque keeps every segment below it, and its slip energy accounts for the rest', () => {
    const c = parseCase(limiterCase('3 kN*m'));
    const r = analyseCase(c);
    // Yield torque of the thinnest segment: τ_y·J_p/c (shared REFERENCE.md 3.1.1), τ_y = 0.577·Sy.
    const Sy = c.materials['aisi-4140-qt540'].yieldStrength!;
    const Ty = ((Sy / Math.sqrt(3)) * polarMoment(0.05)) / 0.025;
    expect(3000).toBeLessThan(Ty);
    expect(r.sides[0].pieces.some((p) => p.yieldRatio > 1)).toBe(true); // the energy method alone says it yields
    for (const p of r.dynamic.pieces) expect(p.peakTorque).toBeLessThanOrEqual(3000 * (1 + 1e-6));
    expect(r.dynamic.yieldRatio).toBeLessThan(1);
    expect(r.verdict).toBe('elastic');
    expect(r.verdictBasis).toBe('dynamic model');
    // Shared REFERENCE.md 10.11 (derived): dissipated = ½Jω0² − T_s²/(2k), the shaft keeping T_s²/(2k).
    const slip = r.dynamic.slips.find((s) => s.kind === 'torque limiter')!;
    const w0 = (400 * 2 * Math.PI) / 60;
    const k = 1 / r.sides[0].compliance;
    expect(slip.energy / (0.5 * 4 * w0 ** 2 - 3000 ** 2 / (2 * k)) - 1).toBeCloseTo(0, 6);
    expect(slip.firstSlip).toBeGreaterThan(0);
    expect(slip.slippingAtEnd).toBe(false);
  });

  it('with the shaft\'s own inertia and damping, the limiter still keeps the shaft below yield', () => {
    const r = analyseCase(parseCase(limiterCase('3 kN*m', '')));
    expect(r.dynamic.yieldRatio).toBeLessThan(1);
    expect(r.dynamic.slips[0].energy).toBeGreaterThan(0);
    const e = r.dynamic.energy;
    expect(Math.abs(e.final - (e.initial + e.motorWork + e.boundaryWork - e.dampingWork - e.slipWork - e.released)) / e.initial).toBeLessThan(1e-9);
  });

  it('a fixed element count is used as given; automatic refinement stops once the peaks settle', () => {
    const fixed = analyseCase(parseCase(fixture + 'analysis: { elements: 7 }\n'));
    expect(fixed.dynamic.elements).toBe(7);
    expect(fixed.dynamic.refinement).toHaveLength(1);
    const auto = analyseCase(parseCase(fixture));
    const last = auto.dynamic.refinement.slice(-2);
    expect(Math.abs(last[1].peakTorque / last[0].peakTorque - 1)).toBeLessThan(0.005);
  });

  it('lists the natural frequencies ascending and the lowest three mode shapes with the stop at zero', () => {
    const r = analyseCase(parseCase(readFileSync(new URL('../../sample-cases/edger-arbor-two-sides.yaml', import.meta.url), 'utf8')));
    const f = r.dynamic.naturalFrequencies;
    expect([...f].sort((a, b) => a - b)).toEqual(f);
    expect(r.dynamic.modes).toHaveLength(3);
    for (const m of r.dynamic.modes) {
      const stop = m.at.findIndex((x) => Math.abs(x - 0.29) < 1e-9);
      expect(m.amplitude[stop]).toBe(0);
      expect(Math.max(...m.amplitude)).toBeCloseTo(1, 12);
    }
    expect(new Set(r.dynamic.modes.slice(0, 2).map((m) => m.side))).toEqual(new Set(['A', 'B']));
  });
});
