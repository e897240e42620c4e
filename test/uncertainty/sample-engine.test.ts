import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { investigate, metricsOf } from '../../src/results/investigate.ts';
import { sampleMetrics } from '../../src/uncertainty/sample-engine.ts';

const dir = new URL('../../sample-cases/', import.meta.url);
const samples = readdirSync(dir).filter((f) => f.endsWith('.yaml'));

describe('sampleMetrics, the engine a Monte Carlo sample runs', () => {
  it.each(samples)('gives the same numbers as the full run on %s', (f) => {
    const c = parseCase(readFileSync(new URL(f, dir), 'utf8'));
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
  const text = readFileSync(new URL('granulator-tramp-metal.yaml', dir), 'utf8');

  it('contains the single run\'s speed for the measured twist, and the finding is judged by it', () => {
    const c = parseCase(text.replace('angle: 4 deg', 'angle: 4 deg ± 1 deg').concat('\nanalysis:\n  samples: 400\n'));
    const r = investigate(c);
    const [lo, hi] = r.uncertainty!.observed[0].speedInterval!;
    const single = analyseCase(c).observedFindings.twist[0].speedForMeasured!;
    expect(lo).toBeLessThan(single);
    expect(hi).toBeGreaterThan(single);
    expect(r.uncertainty!.observed[0].recordedInside).toBe(c.speed >= lo && c.speed <= hi);
    expect(r.observedFindings.twist[0].band.basis).toBe('monte-carlo');
    expect(r.observedFindings.twist[0].finding).toBe(c.speed > hi ? 'less' : c.speed < lo ? 'more' : 'consistent');
  });

  it('a measured twist equal to the prediction at the recorded speed puts the recorded speed inside the interval', () => {
    const c0 = parseCase(text);
    const predicted = analyseCase(c0).observedFindings.twist[0].predicted;
    const deg = (predicted * 180) / Math.PI;
    const c = parseCase(text.replace('angle: 4 deg', `angle: ${deg} deg ± 0.5 deg`).concat('\nanalysis:\n  samples: 400\n'));
    const u = investigate(c).uncertainty!;
    expect(u.observed[0].recordedInside).toBe(true);
  });
});
