import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { investigate, metricsOf } from '../../src/finding/investigate.ts';
import { sampleMetrics } from '../../src/uncertainty/sample-engine.ts';

const dir = new URL('../../sample-cases/', import.meta.url);
const samples = readdirSync(dir).filter((f) => f.endsWith('.yaml'));

describe('sampleMetrics, the engine a Monte Carlo sample runs', () => {
  it.each(samples)('gives the same numbers as the full run on %s (its past-yield read-back on the energy balance)', (f) => {
    // The lean sampler runs the energy balance; a case whose read-back stands on the dynamic model
    // is compared with its energy-balance run (dynamic plasticity off).
    const c0 = parseCase(readFileSync(new URL(f, dir), 'utf8'));
    const c = { ...c0, analysis: { ...c0.analysis, dynamicPlasticity: false } };
    const full = metricsOf(analyseCase(c));
    const lean = sampleMetrics(c);
    expect(lean.yieldRatio).toBe(full.yieldRatio);
    expect(lean.maxShearStress).toBe(full.maxShearStress);
    expect(lean.peakTorque).toBeCloseTo(full.peakTorque, 6);
    expect(lean.permanentTwist).toBeCloseTo(full.permanentTwist!, 9);
    lean.speedsForMeasured!.forEach((w, k) => {
      const ref = full.speedsForMeasured![k];
      if (ref === undefined) expect(w === undefined || w >= 0).toBe(true);
      else expect(w! / ref).toBeCloseTo(1, 6);
    });
  });
});

describe('the speed interval behind a measured twist', () => {
  // The energy balance's read-back (dynamic plasticity off), which the uncertainty run samples.
  const text = readFileSync(new URL('granulator-tramp-metal.yaml', dir), 'utf8');
  const balance = '\nanalysis:\n  dynamic_plasticity: false\n  samples: 400\n';

  it("contains the single run's speed for the measured twist, and the finding is judged by it", () => {
    const c = parseCase(text.replace('angle: 4 deg', 'angle: 4 deg ± 1 deg').concat(balance));
    const r = investigate(c);
    const [lo, hi] = r.uncertainty!.observed[0].speedInterval!;
    const single = analyseCase(c).observedFindings.twist[0].speedForMeasured!;
    expect(lo).toBeLessThan(single);
    expect(hi).toBeGreaterThan(single);
    expect(r.uncertainty!.observed[0].recordedInside).toBe(c.speed >= lo && c.speed <= hi);
    expect(r.observedFindings.twist[0].band.basis).toBe('monte-carlo');
    // Judged against the recorded speed's band (the single run's), which the interval must meet.
    const band = r.observedFindings.twist[0].band;
    expect([band.low, band.high]).toEqual([analyseCase(c).observedFindings.twist[0].band.low, analyseCase(c).observedFindings.twist[0].band.high]);
    expect(r.observedFindings.twist[0].finding).toBe(lo > band.high ? 'more' : hi < band.low ? 'less' : 'consistent');
  });

  it('a measured twist equal to the prediction at the recorded speed puts the recorded speed inside the interval', () => {
    const c0 = parseCase(text.concat(balance));
    const predicted = analyseCase(c0).observedFindings.twist[0].predicted;
    const deg = (predicted * 180) / Math.PI;
    const c = parseCase(text.replace('angle: 4 deg', `angle: ${deg} deg ± 0.5 deg`).concat(balance));
    const u = investigate(c).uncertainty!;
    expect(u.observed[0].recordedInside).toBe(true);
  });

  it('is not drawn where the read-back stands on the dynamic model: the finding keeps its speed band and a warning says why', () => {
    const c = parseCase(text.replace('angle: 4 deg', 'angle: 4 deg ± 1 deg').concat('\nanalysis:\n  samples: 200\n  dynamic_samples: 2\n'));
    const r = investigate(c);
    expect(r.pastYieldBasis).toBe('dynamic model');
    expect(r.uncertainty!.observed).toEqual([]);
    expect(r.observedFindings.twist[0].band.basis).toBe('default');
    expect(r.warnings.some((w) => /uncertainty run samples the energy balance/.test(w))).toBe(true);
  });
});
