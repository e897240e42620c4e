import { jStat } from 'jstat';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { investigate } from '../../src/finding/investigate.ts';
import { monteCarloChance } from '../../src/uncertainty/chance.ts';
import { strengthSpread, uncertainInputs } from '../../src/uncertainty/inputs.ts';
import { monteCarlo } from '../../src/uncertainty/monte-carlo.ts';
import { sampleMetrics } from '../../src/uncertainty/sample-engine.ts';

const fixture = readFileSync(new URL('../data/one-disc.yaml', import.meta.url), 'utf8');
const withSpeed = (band: string, extra = '') => fixture.replace('speed: 150 rpm', `speed: 150 rpm ± ${band}`) + extra;

describe('how sure the finding is', () => {
  it('with every tolerance zero, the percentiles collapse onto the single run exactly', () => {
    const r = investigate(parseCase(withSpeed('0 %', 'analysis:\n  strength_scatter: 0 %\n  samples: 500\n')));
    const u = r.uncertainty!;
    expect(u.percentiles.yieldRatio).toEqual([r.yieldRatio, r.yieldRatio, r.yieldRatio]);
    expect(u.percentiles.maxShearStress).toEqual([r.maxShearStress, r.maxShearStress, r.maxShearStress]);
    expect(u.yieldProbability).toBe(r.yieldRatio >= 1 ? 1 : 0);
  });

  it('in an elastic case the spread of the stress is the spread of the speed (stress ∝ speed)', () => {
    // Closed form for the chosen distribution: a ± band is 2σ of a normal, so with a 4 % band the
    // speed has σ = 2 % and the stress, proportional to it, has its 5th/95th percentiles at
    // s0·(1 ∓ z·0.02) with z = 1.6449 (normal quantile; jstat as the reference library).
    const r = investigate(parseCase(withSpeed('4 %', 'analysis:\n  strength_scatter: 0 %\n  samples: 20000\n')));
    const z = -jStat.normal.inv(0.05, 0, 1);
    const [p5, p50, p95] = r.uncertainty!.percentiles.maxShearStress;
    expect(p5 / r.maxShearStress).toBeCloseTo(1 - z * 0.02, 3);
    expect(p50 / r.maxShearStress).toBeCloseTo(1, 3);
    expect(p95 / r.maxShearStress).toBeCloseTo(1 + z * 0.02, 3);
  });

  it('a handbook minimum strength is the 5th percentile of its spread (jstat normal.cdf as reference)', () => {
    const s = strengthSpread(530e6, 'minimum', 0.07);
    expect(jStat.normal.cdf(530e6, s.mean, s.sd)).toBeCloseTo(0.05, 10);
    expect(strengthSpread(530e6, 'typical', 0.07)).toEqual({ kind: 'normal', mean: 530e6, sd: 0.07 * 530e6 });
  });

  it('the same seed gives the same numbers; another seed agrees within the Monte Carlo error', () => {
    const text = withSpeed('6 %', 'analysis:\n  samples: 4000\n');
    const a = investigate(parseCase(text), { seed: 5 }).uncertainty!;
    const b = investigate(parseCase(text), { seed: 5 }).uncertainty!;
    const c = investigate(parseCase(text), { seed: 6 }).uncertainty!;
    expect(b.percentiles).toEqual(a.percentiles);
    expect(c.percentiles.yieldRatio).not.toEqual(a.percentiles.yieldRatio);
    // Standard error of a median of n draws ≈ 1.2533·σ/√n; allow four of them.
    const sigma = (a.percentiles.yieldRatio[2] - a.percentiles.yieldRatio[0]) / (2 * 1.645);
    expect(Math.abs(c.percentiles.yieldRatio[1] - a.percentiles.yieldRatio[1])).toBeLessThan((4 * 1.2533 * sigma) / Math.sqrt(4000));
  });

  it('the sensitivity ranking puts first the input built to dominate', () => {
    const text = fixture
      .replace('speed: 150 rpm', 'speed: 150 rpm ± 1 %')
      .replace('      diameter: 50 mm', '      diameter: 50 mm ± 8 mm')
      .concat('analysis:\n  strength_scatter: 0.2 %\n  samples: 200\n');
    const u = investigate(parseCase(text)).uncertainty!;
    expect(u.sensitivity.map((s) => s.input)).toEqual(['shaft.segments[0].diameter', 'speed', 'materials.aisi-1045-cd.yield_strength']);
  });

  it('no tolerance, no uncertainty run; --samples 0 switches it off', () => {
    expect(investigate(parseCase(fixture)).uncertainty).toBeUndefined();
    expect(investigate(parseCase(withSpeed('3 %')), { samples: 0 }).uncertainty).toBeUndefined();
  });
});

describe('the chance of yield from the samples', () => {
  it('is the share of samples at 1 or more, with its Wilson interval, and yieldProbability is its point', () => {
    const u = investigate(parseCase(withSpeed('6 %', 'analysis:\n  samples: 3000\n'))).uncertainty!;
    expect(u.yieldChance).toEqual(monteCarloChance(u.yieldRatioSamples));
    expect(u.yieldProbability).toBe(u.yieldChance.probability);
  });

  it('the first M samples of a run of N are the M samples of a run of M with the same seed (so the dynamic runs pair with them)', () => {
    const c = parseCase(withSpeed('6 %', 'analysis:\n  samples: 10\n'));
    const { inputs } = uncertainInputs(c, 0.07);
    expect(inputs.length).toBe(2); // speed and yield strength: an even count of draws per sample
    const odd = parseCase(withSpeed('6 %', 'analysis:\n  samples: 10\n').replace('      diameter: 50 mm', '      diameter: 50 mm ± 0.1 mm'));
    for (const k of [c, odd]) {
      const ins = uncertainInputs(k, 0.07).inputs;
      const long = monteCarlo(k, ins, sampleMetrics, 500, 9);
      const short = monteCarlo(k, ins, sampleMetrics, 37, 9);
      expect(short.yieldRatio).toEqual(long.yieldRatio.subarray(0, 37));
    }
    expect(uncertainInputs(odd, 0.07).inputs.length).toBe(3);
  });
});
