import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { minerSum } from '../../../src/physics/fatigue/miner.ts';
import { neuberRange } from '../../../src/physics/fatigue/neuber.ts';
import { notchCycles } from '../../../src/physics/fatigue/notch-damage.ts';
import { rainflow, reversals } from '../../../src/physics/fatigue/rainflow.ts';
import { cyclicStrainAmplitude, cyclicStrainRange } from '../../../src/physics/fatigue/ramberg-osgood.ts';
import { equivalentNormalStress } from '../../../src/physics/fatigue/shear-equivalent.ts';
import { lifeAtStrainAmplitude, strainAmplitudeAtLife } from '../../../src/physics/fatigue/strain-life.ts';
import { uniformMaterialLaw, type StrainLifeProperties } from '../../../src/physics/fatigue/strain-life-properties.ts';

const MPa = 1e6;

// SAE 1045 steel, quenched and tempered to about 225 HB: E = 202 GPa, σ′_f = 1227 MPa, b = −0.095,
// ε′_f = 1.00, c = −0.66, K′ = 1344 MPa, n′ = 0.18 (Dowling, Mechanical Behavior of Materials,
// 4th ed., Table 14.1; from memory — the values are used as a published set of a notched steel's
// constants, and every life below is checked against an independent calculation in this file).
const SAE1045: StrainLifeProperties = {
  elasticModulus: 202e9,
  cyclicStrengthCoefficient: 1344 * MPa,
  cyclicHardeningExponent: 0.18,
  fatigueStrengthCoefficient: 1227 * MPa,
  fatigueStrengthExponent: -0.095,
  fatigueDuctilityCoefficient: 1.0,
  fatigueDuctilityExponent: -0.66,
};

/** Independent solve by plain bisection (not Brent's method), 200 halvings. */
function bisect(f: (x: number) => number, lo: number, hi: number): number {
  let a = lo;
  let b = hi;
  const fa = f(a);
  for (let i = 0; i < 200; i++) {
    const m = (a + b) / 2;
    if (Math.sign(f(m)) === Math.sign(fa)) a = m;
    else b = m;
  }
  return (a + b) / 2;
}

describe('rainflow counting (ASTM E1049-85, Sec. 5.4.4)', () => {
  it("counts the standard's example sequence −2, 1, −3, 5, −1, 3, −4, 4, −2 exactly as its table does", () => {
    // ASTM E1049-85 (2017), Fig. 6 and its table of counts: range 3: ½, 4: 1½, 6: ½, 8: 1, 9: ½
    // (from memory, confident; the four cycles of eight ranges add up, as they must).
    const cycles = rainflow([-2, 1, -3, 5, -1, 3, -4, 4, -2]);
    const byRange = new Map<number, number>();
    for (const c of cycles) byRange.set(c.range, (byRange.get(c.range) ?? 0) + c.count);
    expect([...byRange.entries()].sort((a, b) => a[0] - b[0])).toEqual([
      [3, 0.5],
      [4, 1.5],
      [6, 0.5],
      [8, 1],
      [9, 0.5],
    ]);
  });

  it('reversals(history) keeps only peaks and valleys', () => {
    expect(reversals([0, 1, 2, 2, 3, 1, 0, 0, 4])).toEqual([0, 3, 0, 4]);
    expect(reversals([])).toEqual([]);
  });

  it('counts as many cycles as half the ranges between reversals (a law of the method)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -50, max: 50 }), { minLength: 2, maxLength: 40 }), (h) => {
        const n = reversals(h).length;
        const total = rainflow(h).reduce((s, c) => s + c.count, 0);
        expect(total).toBe(Math.max(0, n - 1) / 2);
      }),
      { numRuns: 200 },
    );
  });
});

describe('Ramberg–Osgood and Neuber', () => {
  it('the Masing branch doubles the cyclic curve', () => {
    const s = 300 * MPa;
    expect(cyclicStrainRange(2 * s, SAE1045)).toBeCloseTo(2 * cyclicStrainAmplitude(s, SAE1045), 15);
  });

  it('neuberRange(ΔS, Kt) is K_t·ΔS where the notch stays elastic (K′ very large)', () => {
    const stiff = { ...SAE1045, cyclicStrengthCoefficient: 5e12 };
    const r = neuberRange(100 * MPa, 2.5, stiff);
    expect(r.stressRange / (250 * MPa)).toBeCloseTo(1, 9);
    expect(r.strainRange).toBeCloseTo((250 * MPa) / stiff.elasticModulus, 12);
  });

  it('neuberRange agrees within 1 % with an independent bisection of Δσ·Δε = (K_t·ΔS)²/E for a notched SAE 1045 bar', () => {
    // Kt = 2.5 and a nominal range of 600 MPa: the notch yields (K_t·ΔS = 1500 MPa elastic).
    const kt = 2.5;
    const dS = 600 * MPa;
    const target = (kt * dS) ** 2 / SAE1045.elasticModulus;
    const E = SAE1045.elasticModulus;
    const K = SAE1045.cyclicStrengthCoefficient;
    const n = SAE1045.cyclicHardeningExponent;
    const ds = bisect((x) => x * (x / E + 2 * (x / (2 * K)) ** (1 / n)) - target, 1, kt * dS);
    const r = neuberRange(dS, kt, SAE1045);
    expect(Math.abs(r.stressRange / ds - 1)).toBeLessThan(0.01);
    expect(Math.abs((r.stressRange * r.strainRange) / target - 1)).toBeLessThan(1e-9);
    expect(r.stressRange).toBeLessThan(kt * dS);
  });
});

describe('strain–life (Coffin–Manson–Basquin)', () => {
  it('lifeAtStrainAmplitude inverts the relation: the life of a strain amplitude of 0.005 gives back 0.005', () => {
    const life = lifeAtStrainAmplitude(0.005, SAE1045);
    expect(strainAmplitudeAtLife(life.cycles!, SAE1045)).toBeCloseTo(0.005, 12);
  });

  it("with the plastic term left out, the life is Basquin's closed form N = ½(E·ε_a/σ′_f)^(1/b)", () => {
    const elastic = { ...SAE1045, fatigueDuctilityCoefficient: 1e-30 };
    const ea = 0.002;
    const closed = 0.5 * ((elastic.elasticModulus * ea) / elastic.fatigueStrengthCoefficient) ** (1 / elastic.fatigueStrengthExponent);
    expect(Math.abs(lifeAtStrainAmplitude(ea, elastic).cycles! / closed - 1)).toBeLessThan(1e-6);
  });

  it('the life of the notched SAE 1045 bar agrees within 1 % with an independent bisection on log N', () => {
    const r = neuberRange(600 * MPa, 2.5, SAE1045);
    const ea = r.strainRange / 2;
    const E = SAE1045.elasticModulus;
    const logN2 = bisect((x) => ((1227 * MPa) / E) * (10 ** x) ** -0.095 + 1.0 * (10 ** x) ** -0.66 - ea, 0, 20);
    const N = 10 ** logN2 / 2;
    expect(Math.abs(lifeAtStrainAmplitude(ea, SAE1045).cycles! / N - 1)).toBeLessThan(0.01);
    // A low-cycle life: some thousands of cycles at this notch strain.
    expect(N).toBeGreaterThan(100);
    expect(N).toBeLessThan(1e5);
  });

  it("says where a strain amplitude is beyond the relation's reach", () => {
    expect(lifeAtStrainAmplitude(5, SAE1045)).toEqual({ cycles: 0.5, beyond: 'first reversal' });
    expect(lifeAtStrainAmplitude(1e-6, SAE1045)).toEqual({ cycles: undefined, beyond: 'endurance' });
  });

  it('more stress, less life (a law): the notch life falls as the nominal range grows', () => {
    fc.assert(
      fc.property(fc.double({ min: 50, max: 1500, noNaN: true }), fc.double({ min: 1.01, max: 1.5, noNaN: true }), fc.double({ min: 1, max: 4, noNaN: true }), (s, grow, kt) => {
        const life = (S: number) => lifeAtStrainAmplitude(neuberRange(S * MPa, kt, SAE1045).strainRange / 2, SAE1045).cycles ?? Number.MAX_VALUE;
        expect(life(s * grow)).toBeLessThanOrEqual(life(s));
      }),
      { numRuns: 100 },
    );
  });
});

describe('the uniform material law (Bäumel and Seeger 1990)', () => {
  it('gives the published constants for a steel of S_u = 600 MPa', () => {
    // σ′_f = 1.5 S_u, b = −0.087, ε′_f = 0.59 (ψ = 1 as S_u/E = 0.0029 ≤ 0.003), c = −0.58,
    // K′ = 1.65 S_u, n′ = 0.15 (Bäumel and Seeger, Materials Data for Cyclic Loading, Suppl. 1; from memory).
    const p = uniformMaterialLaw(600 * MPa, 207e9, 'steel');
    expect(p.fatigueStrengthCoefficient).toBeCloseTo(900 * MPa, 0);
    expect(p.fatigueDuctilityCoefficient).toBeCloseTo(0.59, 12);
    expect(p.cyclicStrengthCoefficient).toBeCloseTo(990 * MPa, 0);
    expect([p.fatigueStrengthExponent, p.fatigueDuctilityExponent, p.cyclicHardeningExponent]).toEqual([-0.087, -0.58, 0.15]);
  });

  it('lowers ε′_f by ψ = 1.375 − 125·S_u/E for a strong steel', () => {
    const p = uniformMaterialLaw(1000 * MPa, 200e9, 'steel');
    expect(p.fatigueDuctilityCoefficient).toBeCloseTo(0.59 * (1.375 - 0.625), 12);
  });
});

describe('torsion and the Miner sum', () => {
  it('equivalentNormalStress(τ) is √3·τ (von Mises)', () => {
    expect(equivalentNormalStress(100)).toBeCloseTo(173.205, 3);
  });

  it('the Miner sum is additive: the sum of two lists joined is the sum of their sums', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0, max: 1, noNaN: true })), fc.array(fc.double({ min: 0, max: 1, noNaN: true })), (a, b) => {
        expect(minerSum([...a, ...b])).toBeCloseTo(minerSum(a) + minerSum(b), 10);
      }),
      { numRuns: 100 },
    );
    expect(minerSum([])).toBe(0);
  });

  it('notchCycles adds the damage of each counted cycle as count / N', () => {
    const cycles = notchCycles(rainflow([0, 600 * MPa, 0, 300 * MPa, 0]), 2.5, SAE1045);
    for (const c of cycles) expect(c.damage).toBeCloseTo(c.count / c.life.cycles!, 15);
    expect(cycles.map((c) => c.nominalRange).sort((a, b) => a - b)).toEqual([300 * MPa, 600 * MPa, 600 * MPa]);
  });
});
