import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { investigate } from '../../src/results/investigate.ts';
import { resultsToJson } from '../../src/views/results-json.ts';
import { withFinding } from '../../src/finding/investigation.ts';

// The screw conveyor sample has a drive, so its verdict stands on the dynamic model.
const text = readFileSync(new URL('../../sample-cases/screw-conveyor-jam-us.yaml', import.meta.url), 'utf8');

describe('the uncertainty run through the dynamic model', () => {
  it('runs where the verdict stands on the dynamic model, and its JSON says how many samples', () => {
    const c = parseCase(text.concat('\nanalysis:\n  samples: 200\n  dynamic_samples: 6\n'));
    const r = withFinding(investigate(c));
    expect(r.verdictBasis).toBe('dynamic model');
    expect(r.uncertainty!.dynamic!.samples).toBe(6);
    const j = resultsToJson(r) as { uncertainty: { dynamic: { samples: number; percentiles: { yield_ratio: number[] } } } };
    expect(j.uncertainty.dynamic.samples).toBe(6);
    const [p5, p50, p95] = j.uncertainty.dynamic.percentiles.yield_ratio;
    expect(p5).toBeLessThanOrEqual(p50);
    expect(p50).toBeLessThanOrEqual(p95);
  });

  it('with every tolerance zero, its percentiles collapse onto the single run\'s dynamic yield ratio', () => {
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
