import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../src/case/parse-case.ts';
import { analyseCase } from '../src/results/analyse-case.ts';

const dir = new URL('../sample-cases/', import.meta.url);
const files = readdirSync(dir).filter((f) => f.endsWith('.yaml'));

describe('the sample cases', () => {
  it('there are at least three, one of them in US units', () => {
    expect(files.length).toBeGreaterThanOrEqual(3);
    expect(files.some((f) => /^units: us/m.test(readFileSync(new URL(f, dir), 'utf8')))).toBe(true);
  });

  it.each(files)('%s says it is invented and runs through the engine', (f) => {
    const text = readFileSync(new URL(f, dir), 'utf8');
    expect(text).toMatch(/INVENTED DEMO DATA/);
    const r = analyseCase(parseCase(text, f));
    expect(Number.isFinite(r.yieldRatio)).toBe(true);
  });

  it.each(files)("%s shows the dynamic model beside the energy method, with the reason for the verdict's basis", (f) => {
    const r = analyseCase(parseCase(readFileSync(new URL(f, dir), 'utf8'), f));
    expect(r.dynamic.sides.map((s) => s.side)).toEqual(r.sides.map((s) => s.side));
    for (const s of r.dynamic.sides) expect(s.dynamicPeakTorque).toBeGreaterThan(0);
    expect(r.dynamic.naturalFrequencies.length).toBeGreaterThan(0);
    expect(r.verdictReason).toMatch(new RegExp(`^The verdict uses the ${r.verdictBasis}`));
    const e = r.dynamic.energy;
    expect(Math.abs(e.final - (e.initial + e.motorWork + e.boundaryWork - e.dampingWork - e.slipWork - e.released)) / e.initial).toBeLessThan(1e-8);
  });

  it("the roll line's torque limiter slips and keeps the flywheel side of the shaft below yield", () => {
    const r = analyseCase(parseCase(readFileSync(new URL('roll-line-limiter-two-sides.yaml', dir), 'utf8')));
    const limiter = r.dynamic.slips.find((s) => s.kind === 'torque limiter')!;
    expect(limiter.firstSlip).toBeDefined();
    expect(limiter.energy).toBeGreaterThan(0);
    const A = r.dynamic.sides.find((s) => s.side === 'A')!;
    expect(A.energyYieldRatio).toBeGreaterThan(1);
    expect(A.dynamicYieldRatio).toBeLessThan(1);
    // Between the flywheel and the limiter the shaft carries no more than the slip torque (the
    // limiter's own segment a little more, for the few elements between the device and the stop).
    const flywheelSide = r.dynamic.pieces.filter((x) => x.side === 'A' && x.piece.end <= 0.35 + 1e-9);
    expect(flywheelSide.length).toBeGreaterThan(0);
    for (const p of flywheelSide) expect(p.peakTorque).toBeLessThan(1.02 * limiter.slipTorque);
    expect(r.verdictBasis).toBe('dynamic model');
    expect(r.dynamic.slips.some((s) => s.kind === 'belt' && s.firstSlip !== undefined)).toBe(true);
  });

  it("the granulator's belt slips, which the energy method cannot show", () => {
    const r = analyseCase(parseCase(readFileSync(new URL('granulator-tramp-metal.yaml', dir), 'utf8')));
    const belt = r.dynamic.slips.find((s) => s.kind === 'belt')!;
    expect(belt.firstSlip).toBeDefined();
    expect(r.dynamic.peakTorque).toBeLessThan(r.sides[0].peakTorque);
    expect(r.dynamic.belts[0].slip.capstan).toBeDefined();
  });

  it('the US screw-conveyor case matches an independent hand calculation within 0.5 %', () => {
    const r = analyseCase(parseCase(readFileSync(new URL('screw-conveyor-jam-us.yaml', dir), 'utf8')));
    // Hand calculation from the case's numbers. Factors: NIST SP 811 App. B.8 (in = 0.0254 m exactly,
    // lb·ft² = 0.04214011 kg·m²). G = 11.5 Mpsi, Sy = 77 kpsi for 1045 CD (Shigley 9th ed. Tables A-5,
    // A-20; from memory, confident). Energy method T = √(2E/C) with C = L/(G·J_p).
    const J = (2.2 + 0.45 * 38.9 ** 2) * 0.04214011; // kg·m²
    const w = (40 * 2 * Math.PI) / 60;
    const E = 0.5 * J * w ** 2;
    const d = (2 + 7 / 16) * 0.0254;
    const Jp = (Math.PI * d ** 4) / 32;
    const G = 11.5e6 * 6894.757;
    const C = (30 * 0.0254) / (G * Jp);
    const T = Math.sqrt((2 * E) / C);
    const tau = (1.4 * T * d) / 2 / Jp;
    const tauY = 0.577 * 77e3 * 6894.757;
    const side = r.sides[0];
    expect(Math.abs(side.kineticEnergy / E - 1)).toBeLessThan(0.005);
    expect(Math.abs(side.peakTorque / T - 1)).toBeLessThan(0.005);
    expect(Math.abs(side.twist / (T * C) - 1)).toBeLessThan(0.005);
    expect(Math.abs(r.maxShearStress / tau - 1)).toBeLessThan(0.005);
    expect(Math.abs(r.yieldRatio / (tau / tauY) - 1)).toBeLessThan(0.005);
  });
});
