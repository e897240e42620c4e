import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { buildShaftModel } from '../../src/model/shaft-model.ts';
import { energyMethodSide, type SideResult } from '../../src/physics/energy-method.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';

const fixture = readFileSync(new URL('../data/one-disc.yaml', import.meta.url), 'utf8');

interface Layout {
  rpm: number;
  /** Segments from the shaft's start: [length mm, diameter mm, bore mm]. */
  segments: [number, number, number][];
  /** Stations: [name, at mm, inertia kg·m² (0 = no parts)]. */
  stations: [string, number, number][];
  stop: string;
}

/** A case file's text for a layout, so the laws are tested through the whole engine. */
function caseText(l: Layout): string {
  const seg = l.segments.map(([len, d, b]) => `    - { length: ${len} mm, diameter: ${d} mm${b > 0 ? `, bore: ${b} mm` : ''} }`).join('\n');
  const st = l.stations.map(([n, at, j]) => `  - name: ${n}\n    at: ${at} mm\n${j > 0 ? `    parts:\n      - { shape: inertia, inertia: ${j} kg*m^2 }\n` : ''}`).join('');
  return `case: { id: P }\nspeed: ${l.rpm} rpm\nstop: { at: ${l.stop} }\nshaft:\n  material: aisi-1045-cd\n  segments:\n${seg}\nstations:\n${st}`;
}

/**
 * The energy method through the case reader and the shaft model, as the engine runs it (analyseCase
 * calls the same energyMethodSide per side) without the dynamic model, which these laws are not
 * about: a property run is then milliseconds, and the suite never waits on it.
 */
function energyRun(l: Layout): { sides: SideResult[]; maxShearStress: number } {
  const c = parseCase(caseText(l));
  const sides = buildShaftModel(c).sides.map((side) => energyMethodSide(side, c.speed, c.materials, c.analysis.criterion));
  return { sides, maxShearStress: Math.max(...sides.flatMap((s) => s.pieces.map((p) => p.shearStress))) };
}

const run = (l: Layout) => analyseCase(parseCase(caseText(l)));

describe('analyseCase: the energy method on one mass and a plain shaft', () => {
  it('matches the hand calculation of an energy-limited sudden stop', () => {
    const r = analyseCase(parseCase(fixture));
    // Independent hand calculation (invented fixture numbers): J = m·k² (Beer & Johnston, Vector
    // Mechanics: Dynamics, radius of gyration; from memory, confident); G = 79.3 GPa, Sy = 530 MPa
    // for 1045 CD (Shigley 9th ed. Tables A-5 and A-20; from memory, confident).
    const J = 40 * 0.18 ** 2;
    const G = 79.3e9;
    const d = 0.05;
    const L = 0.8;
    const n = 150;
    // Gere & Goodno, Mechanics of Materials 7th ed., Problem 3.9-11 (flywheel stopped through a
    // shaft): τ_max = (n/(15d))·√(2πGJ/L), θ_max = (2n/(15d²))·√(2πJL/G), n in rpm
    // (formula from memory, confident; its derivation from U = τ²V/(4G) is in Sec. 3.9).
    const tau = (n / (15 * d)) * Math.sqrt((2 * Math.PI * G * J) / L);
    const theta = ((2 * n) / (15 * d ** 2)) * Math.sqrt((2 * Math.PI * J * L) / G);
    const side = r.sides[0];
    expect(r.sides).toHaveLength(1);
    expect(side.side).toBe('B');
    expect(side.kineticEnergy).toBeCloseTo(0.5 * J * ((n * 2 * Math.PI) / 60) ** 2, 9);
    expect(Math.abs(r.maxShearStress / tau - 1)).toBeLessThan(1e-9);
    expect(Math.abs(side.twist / theta - 1)).toBeLessThan(1e-9);
    // Strain energy of a solid bar in terms of its peak stress, U = τ²V/(4G) (Beer & Johnston,
    // Mechanics of Materials, Sec. 11.4; from memory, confident), equals the kinetic energy.
    const V = (Math.PI * d ** 2 * L) / 4;
    expect((r.maxShearStress ** 2 * V) / (4 * G)).toBeCloseTo(side.kineticEnergy, 6);
    // τ_y = 0.577·Sy by distortion energy (Shigley 9th ed. Sec. 5-5).
    expect(r.yieldRatio).toBeCloseTo(tau / (530e6 / Math.sqrt(3)), 9);
    expect(r.verdict).toBe(r.yieldRatio < 1 ? 'elastic' : 'yielded');
  });

  it('the max-shear criterion takes shear yield as 0.5·Sy (Shigley 9th ed. Sec. 5-4)', () => {
    const r = analyseCase(parseCase(fixture + 'analysis:\n  criterion: max-shear\n'));
    expect(r.governing.piece.shearYield).toBe(265e6);
  });

  it('kt multiplies the nominal stress of its segment only', () => {
    const plain = run({
      rpm: 300,
      segments: [
        [200, 40, 0],
        [300, 50, 0],
      ],
      stations: [
        ['jam', 0, 0],
        ['disc', 500, 2],
      ],
      stop: 'jam',
    });
    const text = caseText({
      rpm: 300,
      segments: [
        [200, 40, 0],
        [300, 50, 0],
      ],
      stations: [
        ['jam', 0, 0],
        ['disc', 500, 2],
      ],
      stop: 'jam',
    }).replace('{ length: 200 mm, diameter: 40 mm }', '{ length: 200 mm, diameter: 40 mm, kt: 1.5 }');
    const notched = analyseCase(parseCase(text));
    // Pieces run from the stop outward: [0] is the 40 mm segment next to the jam.
    expect(notched.sides[0].pieces[0].shearStress / plain.sides[0].pieces[0].shearStress).toBeCloseTo(1.5, 12);
    expect(notched.sides[0].pieces[1].shearStress).toBe(plain.sides[0].pieces[1].shearStress);
    expect(notched.sides[0].peakTorque).toBe(plain.sides[0].peakTorque);
  });

  it('parts behind a belt count as J·ratio², and parts at the stop release nothing', () => {
    const text = fixture.replace('        radius_of_gyration: 180 mm', '        radius_of_gyration: 180 mm\n      - { shape: inertia, inertia: 0.1 kg*m^2, speed_ratio: 3 }');
    const r = analyseCase(parseCase(text));
    expect(r.sides[0].parts[1].reflectedInertia).toBeCloseTo(0.9, 12);
    const atStop = fixture.replace('  - name: jam\n    at: 0 mm\n', '  - name: jam\n    at: 0 mm\n    parts:\n      - { shape: inertia, inertia: 5 kg*m^2 }\n');
    expect(analyseCase(parseCase(atStop)).kineticEnergy).toBe(analyseCase(parseCase(fixture)).kineticEnergy);
  });

  it("warns when the shaft's own energy passes 5 % of the side's", () => {
    const light = run({
      rpm: 300,
      segments: [[2000, 80, 0]],
      stations: [
        ['jam', 0, 0],
        ['hub', 2000, 0.05],
      ],
      stop: 'jam',
    });
    expect(light.warnings.join(' ')).toMatch(/shaft's own kinetic energy is \d+ % of the parts' energy/);
  });

  it('warns that the energy method is approximate with several loaded stations on a side, and points to the dynamic model', () => {
    const r = run({
      rpm: 300,
      segments: [[1000, 50, 0]],
      stations: [
        ['jam', 0, 0],
        ['a', 500, 1],
        ['b', 1000, 1],
      ],
      stop: 'jam',
    });
    expect(r.warnings.join(' ')).toMatch(
      /Side B has 2 stations with parts \(a, b\); the energy method .* approximate here; the dynamic model resolves them \(peak torque \d+ N·m against \d+ N·m\) and the verdict uses it/,
    );
    expect(r.verdictBasis).toBe('dynamic model');
    expect(r.verdictYieldRatio).toBe(r.dynamic.yieldRatio);
  });
});

describe('the laws of the energy method', () => {
  const arb = fc.record({
    rpm: fc.double({ min: 10, max: 3000, noNaN: true }),
    len: fc.integer({ min: 100, max: 3000 }),
    d: fc.integer({ min: 10, max: 200 }),
    j: fc.double({ min: 0.01, max: 100, noNaN: true }),
  });
  // test/slow/energy-method-laws.test.ts runs the mirrored shaft through the whole engine.
  const RUNS = { numRuns: 100 };

  it('peak stress is proportional to the speed at the stop', () => {
    fc.assert(
      fc.property(arb, fc.double({ min: 0.1, max: 10, noNaN: true }), ({ rpm, len, d, j }, k) => {
        const a = energyRun({
          rpm,
          segments: [[len, d, 0]],
          stations: [
            ['jam', 0, 0],
            ['m', len, j],
          ],
          stop: 'jam',
        });
        const b = energyRun({
          rpm: rpm * k,
          segments: [[len, d, 0]],
          stations: [
            ['jam', 0, 0],
            ['m', len, j],
          ],
          stop: 'jam',
        });
        return Math.abs(b.maxShearStress / a.maxShearStress / k - 1) < 1e-9;
      }),
      RUNS,
    );
  });

  it('a uniform shaft twice as long gives the stress divided by √2', () => {
    fc.assert(
      fc.property(arb, ({ rpm, len, d, j }) => {
        const a = energyRun({
          rpm,
          segments: [[len, d, 0]],
          stations: [
            ['jam', 0, 0],
            ['m', len, j],
          ],
          stop: 'jam',
        });
        const b = energyRun({
          rpm,
          segments: [[2 * len, d, 0]],
          stations: [
            ['jam', 0, 0],
            ['m', 2 * len, j],
          ],
          stop: 'jam',
        });
        return Math.abs((b.maxShearStress * Math.SQRT2) / a.maxShearStress - 1) < 1e-9;
      }),
      RUNS,
    );
  });

  it('two identical sides give equal results', () => {
    fc.assert(
      fc.property(arb, ({ rpm, len, d, j }) => {
        const r = energyRun({
          rpm,
          segments: [
            [len, d, 0],
            [len, d, 0],
          ],
          stations: [
            ['a', 0, j],
            ['jam', len, 0],
            ['b', 2 * len, j],
          ],
          stop: 'jam',
        });
        const [A, B] = r.sides;
        return r.sides.length === 2 && Math.abs(A.peakTorque / B.peakTorque - 1) < 1e-12 && Math.abs(A.twist / B.twist - 1) < 1e-12;
      }),
      RUNS,
    );
  });

  it('a mirrored shaft gives mirrored sides', () => {
    fc.assert(
      fc.property(arb, fc.integer({ min: 10, max: 200 }), fc.double({ min: 0.01, max: 100, noNaN: true }), ({ rpm, len, d, j }, d2, j2) => {
        const fwd = energyRun({
          rpm,
          segments: [
            [len, d, 0],
            [len, d2, 0],
          ],
          stations: [
            ['a', 0, j],
            ['jam', len, 0],
            ['b', 2 * len, j2],
          ],
          stop: 'jam',
        });
        const rev = energyRun({
          rpm,
          segments: [
            [len, d2, 0],
            [len, d, 0],
          ],
          stations: [
            ['b', 0, j2],
            ['jam', len, 0],
            ['a', 2 * len, j],
          ],
          stop: 'jam',
        });
        return (
          Math.abs(fwd.sides[0].peakTorque / rev.sides[1].peakTorque - 1) < 1e-12 &&
          Math.abs(fwd.sides[1].peakTorque / rev.sides[0].peakTorque - 1) < 1e-12 &&
          Math.abs(fwd.maxShearStress / rev.maxShearStress - 1) < 1e-12
        );
      }),
      RUNS,
    );
  });

  it('a hollow shaft of the same outer diameter is more compliant', () => {
    fc.assert(
      fc.property(arb, fc.double({ min: 0.05, max: 0.95, noNaN: true }), ({ rpm, len, d, j }, ratio) => {
        const solid = energyRun({
          rpm,
          segments: [[len, d, 0]],
          stations: [
            ['jam', 0, 0],
            ['m', len, j],
          ],
          stop: 'jam',
        });
        const hollow = energyRun({
          rpm,
          segments: [[len, d, Math.min(d - 1, Math.max(1, Math.round(d * ratio)))]],
          stations: [
            ['jam', 0, 0],
            ['m', len, j],
          ],
          stop: 'jam',
        });
        return hollow.sides[0].compliance > solid.sides[0].compliance && hollow.sides[0].peakTorque < solid.sides[0].peakTorque;
      }),
      RUNS,
    );
  });
});
