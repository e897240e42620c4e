import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { dynamicPeakMetrics } from '../../src/results/dynamic-result.ts';
import { solveDynamics } from '../../src/results/dynamic-solve.ts';
import { buildShaftModel } from '../../src/model/shaft-model.ts';
import { polarMoment } from '../../src/physics/torsion.ts';
import { odexSlip } from '../physics/integrator/chain-fixtures.ts';

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

  it("with the shaft's own inertia and default damping it stays within a few percent of the energy method", () => {
    const r = analyseCase(parseCase(fixture));
    expect(r.dynamic.shaftInertia).toBe(true);
    expect(r.dynamic.converged).toBe(true);
    expect(Math.abs(r.dynamic.peakTorque / r.sides[0].peakTorque - 1)).toBeLessThan(0.02);
  });

  it("a torque limiter set below the shaft's yield torque keeps every segment below it, and its slip energy accounts for the rest", () => {
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

  it("with the shaft's own inertia and damping, the limiter still keeps the shaft below yield", () => {
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

describe('the laws of the dynamic model', () => {
  /** A drive, a limiter and a flywheel on one side of the stop; `mirror` puts them on the other. */
  const layout = (mirror: boolean, rpm: number, slip: number, ramp: number) => {
    const segs = [
      '{ length: 300 mm, diameter: 45 mm, label: drive end }',
      `{ length: 200 mm, diameter: 50 mm, slip_torque: ${slip} N*m, label: limiter }`,
      '{ length: 400 mm, diameter: 55 mm, label: to the jam }',
    ];
    const at = (x: number) => (mirror ? 900 - x : x);
    return `case: { id: M }
speed: ${rpm} rpm
stop: { at: jam, duration: ${ramp} ms }
analysis: { elements: 18 }
shaft:
  material: aisi-4140-qt540
  segments:
${(mirror ? [...segs].reverse() : segs).map((s) => `    - ${s}`).join('\n')}
stations:
  - name: pulley
    at: ${at(100)} mm
    parts: [{ shape: inertia, name: sheave, inertia: 0.8 kg*m^2 }, { shape: inertia, name: rotor, inertia: 0.05 kg*m^2, speed_ratio: 4 }]
    drive: { running_torque: 60 N*m, torque: 150 N*m, belt: { slip_torque: 900 N*m } }
  - { name: flywheel, at: ${at(300)} mm, parts: [{ shape: inertia, inertia: 2 kg*m^2 }] }
  - { name: jam, at: ${at(900)} mm }
`;
  };

  it('a mirrored shaft gives the same peaks, slips and frequencies on the other side', () => {
    fc.assert(
      fc.property(fc.integer({ min: 200, max: 900 }), fc.integer({ min: 500, max: 4000 }), fc.integer({ min: 0, max: 8 }), (rpm, slip, ramp) => {
        const a = analyseCase(parseCase(layout(false, rpm, slip, ramp))).dynamic;
        const b = analyseCase(parseCase(layout(true, rpm, slip, ramp))).dynamic;
        // Equal to rounding: the mirrored positions (900 − x) and eigenvalues differ in the last digits.
        const close = (x: number, y: number) => Math.abs(x - y) <= 1e-5 * Math.max(Math.abs(x), Math.abs(y), 1);
        return (
          a.sides[0].side === 'A' &&
          b.sides[0].side === 'B' &&
          close(a.peakTorque, b.peakTorque) &&
          a.pieces.every((p, i) => close(p.peakTorque, b.pieces[a.pieces.length - 1 - i].peakTorque)) &&
          a.slips.every((s, i) => close(s.energy, b.slips[i].energy) && close(s.angle, b.slips[i].angle)) &&
          a.naturalFrequencies.every((f, i) => close(f, b.naturalFrequencies[i]))
        );
      }),
      { numRuns: 8 },
    );
  });

  it('a slower stop never raises the peak torque of a single mass (the velocity-ramp factor falls with τ)', () => {
    const peak = (ramp: number) =>
      analyseCase(parseCase(fixture.replace('  at: jam', `  at: jam\n  duration: ${ramp} ms`) + 'analysis: { shaft_inertia: false, damping_ratio: 0 }\n')).dynamic.peakTorque;
    const values = [0, 2, 5, 10, 20, 40].map(peak);
    for (let i = 1; i < values.length; i++) expect(values[i]).toBeLessThan(values[i - 1] * (1 + 1e-6));
  });
});

describe('dynamicResult: a torque limiter in a massless shaft, damped', () => {
  // The reference (test/physics/chain-fixtures.ts `odexSlip`, odex): the elastic shaft with its
  // dashpot c = 2ζk/ω₁ in parallel, in series with the Coulomb slider, the flywheel at its end.
  const J = 4;
  const w0 = (400 * 2 * Math.PI) / 60;
  const run = (zeta: number) => analyseCase(parseCase(limiterCase('3 kN*m', `analysis: { shaft_inertia: false, damping_ratio: ${zeta} }`)));

  it("slips later, and more, the less it is damped; at ζ = 0, 0.5 %, 5 %, 20 % its slip energy and start are odex's within 0.1 %", () => {
    const runs = [0, 0.005, 0.05, 0.2].map((z) => ({ z, r: run(z) }));
    for (const { z, r } of runs) {
      const k = 1 / r.sides[0].compliance;
      const ref = odexSlip(J, k, ((2 * z) / Math.sqrt(k / J)) * k, 3000, w0);
      const slip = r.dynamic.slips.find((s) => s.kind === 'torque limiter')!;
      expect(Math.abs(slip.energy / ref.slipWork - 1)).toBeLessThan(1e-3);
      expect(Math.abs(slip.firstSlip! - ref.start)).toBeLessThan(1e-3 * ref.start + 1e-9);
    }
    for (let i = 1; i < runs.length; i++) {
      const [a, b] = [runs[i - 1].r, runs[i].r].map((r) => r.dynamic.slips.find((s) => s.kind === 'torque limiter')!);
      expect(b.energy).toBeLessThan(a.energy);
      expect(b.firstSlip!).toBeLessThan(a.firstSlip!);
    }
  });

  it("reports each segment's largest shear strain, the elastic one of the slip torque: T·c/(G·J_p) (Shigley 9th ed. Sec. 3-12)", () => {
    const c = parseCase(limiterCase('3 kN*m'));
    const r = analyseCase(c);
    const G = c.materials['aisi-4140-qt540'].shearModulus!;
    const expected = [0.06, 0.05].map((d) => (r.dynamic.pieces[0].peakTorque * (d / 2)) / (G * polarMoment(d)));
    expect(r.dynamic.pieces.map((p) => p.maxShearStrain)).toEqual(expected.map((e) => expect.closeTo(e, 12)));
    expect(Math.abs(r.dynamic.pieces[0].peakTorque / 3000 - 1)).toBeLessThan(1e-6);
  });
});

describe('a drive given only by its power', () => {
  it('puts its warning in Results.warnings (the screw-conveyor sample: drive: { power: 15 hp })', () => {
    const r = analyseCase(parseCase(readFileSync(new URL('../../sample-cases/screw-conveyor-jam-us.yaml', import.meta.url), 'utf8')));
    expect(r.verdictBasis).toBe('dynamic model');
    expect(r.warnings.filter((w) => /given only by its power.*unconservative/.test(w))).toHaveLength(1);
  });
});

describe('dynamicPeakMetrics: the peaks a Monte Carlo sample keeps', () => {
  it("are dynamicResult's own, to the last digit, where the shaft stays elastic and where it yields", () => {
    for (const [slip, yields] of [
      ['100 kN*m', true],
      ['2 kN*m', false],
    ] as const) {
      const c = parseCase(limiterCase(slip));
      const d = analyseCase(c, { readBack: false }).dynamic;
      expect(d.yieldRatio >= 1).toBe(yields);
      expect(dynamicPeakMetrics(c, buildShaftModel(c))).toEqual({ yieldRatio: d.yieldRatio, maxShearStress: d.maxShearStress, peakTorque: d.peakTorque });
    }
  });
});

describe('solveDynamics without histories', () => {
  it('a rerun that keeps no sampled history has the same peaks, steps, events and laws to the last digit', () => {
    // The peaks are taken at every step, not at the history's samples; a holding jam with a limiter
    // slipping and its elements elastic–plastic (shaft inertia on) exercises events and plastic laws.
    const c = parseCase(limiterCase('2500 N*m', 'analysis: { damping_ratio: 0.02 }'));
    const model = buildShaftModel(c);
    const full = solveDynamics(c, model).final;
    const bare = solveDynamics(c, model, { histories: false }).final;
    expect(full.run.history.time.length).toBeGreaterThan(100);
    expect(bare.run.history.time.length).toBe(0);
    expect(bare.piecePeak).toEqual(full.piecePeak);
    expect(bare.pieceTime).toEqual(full.pieceTime);
    expect(bare.run.steps).toBe(full.run.steps);
    expect(bare.run.events).toEqual(full.run.events);
    expect(bare.run.energy).toEqual(full.run.energy);
  });
});
