import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { dynamicMetrics, investigate } from '../../src/finding/investigate.ts';
import { runDynamicUncertainty } from '../../src/uncertainty/uncertainty.ts';
import { resultsToJson } from '../../src/views/results-json.ts';
import { withFinding } from '../../src/finding/investigation.ts';
import { rampedOneDisc } from '../helpers/ramped-one-disc.ts';

// The screw conveyor sample has a drive, so its verdict stands on the dynamic model.
const text = readFileSync(new URL('../../sample-cases/screw-conveyor-jam-us.yaml', import.meta.url), 'utf8');

describe('the uncertainty run through the dynamic model', () => {
  it('runs where the verdict stands on the dynamic model, and its JSON says how many samples', () => {
    const c = parseCase(text.concat('\nanalysis:\n  samples: 200\n  dynamic_samples: 6\n'));
    const r = investigate(c);
    expect(r.verdictBasis).toBe('dynamic model');
    expect(r.uncertainty!.dynamic!.samples).toBe(6);
    const j = resultsToJson(r) as { uncertainty: { dynamic: { samples: number; percentiles: { yield_ratio: { p5: number; p50: number; p95: number } } } } };
    expect(j.uncertainty.dynamic.samples).toBe(6);
    const { p5, p50, p95 } = j.uncertainty.dynamic.percentiles.yield_ratio;
    expect(p5).toBeLessThanOrEqual(p50);
    expect(p50).toBeLessThanOrEqual(p95);
  });

  it("with every tolerance zero, its percentiles collapse onto the single run's dynamic yield ratio", () => {
    const c = parseCase(text.replace('speed: 40 rpm ± 5 %', 'speed: 40 rpm ± 0 %').concat('\nanalysis:\n  samples: 50\n  dynamic_samples: 3\n  strength_scatter: 0 %\n'));
    const single = withFinding(analyseCase(c)).verdictYieldRatio;
    expect(investigate(c).uncertainty!.dynamic!.percentiles.yieldRatio).toEqual([single, single, single]);
  });

  it('dynamic_samples: 0 leaves it out, and reports progress sample by sample when asked', () => {
    const off = parseCase(text.concat('\nanalysis:\n  samples: 50\n  dynamic_samples: 0\n'));
    expect(investigate(off).uncertainty!.dynamic).toBeUndefined();
    const seen: number[] = [];
    investigate(parseCase(text.concat('\nanalysis:\n  samples: 50\n  dynamic_samples: 4\n')), { onDynamicProgress: (d) => seen.push(d) });
    expect(seen).toEqual([1, 2, 3, 4]);
  });
});

describe("the dynamic model's chance of yield", () => {
  it("is a control-variate estimate whose point is the JSON's yield_probability, within its interval", () => {
    const r = investigate(parseCase(text.concat('\nanalysis:\n  samples: 2000\n  dynamic_samples: 12\n')));
    const d = r.uncertainty!.dynamic!;
    expect(d.yieldChance).toMatchObject({ method: 'control-variates', runs: 12, controlSamples: 2000 });
    expect(d.yieldProbability).toBe(d.yieldChance.probability);
    expect(d.yieldChance.interval[0]).toBeLessThanOrEqual(d.yieldProbability);
    expect(d.yieldChance.interval[1]).toBeGreaterThanOrEqual(d.yieldProbability);
    const j = resultsToJson(withFinding(r)) as { uncertainty: { dynamic: { yield_probability: number } } };
    expect(j.uncertainty.dynamic.yield_probability).toBe(d.yieldChance.probability);
  });

  it("each sample takes the base run's element count: at that count a run gives the refined run's verdict yield ratio", () => {
    const c = parseCase(text);
    const base = analyseCase(c);
    expect(base.dynamic.refinement.length).toBeGreaterThan(1);
    expect(dynamicMetrics(c, base.dynamic.elementTarget).yieldRatio).toBe(base.verdictYieldRatio);
    expect(analyseCase(c, { readBack: false, elements: base.dynamic.elementTarget }).dynamic.refinement).toHaveLength(1);
  });

  it('on a small ramped stop, agrees with a brute-force Monte Carlo of 400 dynamic runs within their joint error', () => {
    // A bigger version (2000 runs) is in test/slow/dynamic-chance.test.ts.
    const c = rampedOneDisc(4000, 40);
    const r = investigate(c);
    expect(r.verdictBasis).toBe('dynamic model');
    const chance = r.uncertainty!.dynamic!.yieldChance;
    expect(chance.method).toBe('control-variates');
    const u = c.analysis.uncertainty;
    const brute = runDynamicUncertainty(c, (k) => dynamicMetrics(k, r.dynamic.elementTarget), { samples: 400, seed: u.seed + 1, strengthScatter: u.strengthScatter }).yieldChance;
    expect(brute.method).toBe('monte-carlo');
    expect(brute.probability).toBeGreaterThan(0.1);
    expect(brute.probability).toBeLessThan(0.9);
    // Two independent estimates: their difference within 2.58 of its standard error, a 99 % bound
    // (each error read back from its 95 % interval's half-width).
    const se = (e: typeof chance) => (e.interval[1] - e.interval[0]) / (2 * 1.96);
    expect(Math.abs(chance.probability - brute.probability)).toBeLessThan(2.58 * Math.hypot(se(chance), se(brute)));
    // And 40 runs with the control are surer than 400 without.
    expect(chance.interval[1] - chance.interval[0]).toBeLessThan(brute.interval[1] - brute.interval[0]);
  });
});
