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
