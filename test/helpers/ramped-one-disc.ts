import { readFileSync } from 'node:fs';
import { parseCase } from '../../src/case/parse-case.ts';
import type { Case } from '../../src/case/case.ts';

/**
 * The one-disc fixture stopped over a 20 ms ramp (so the verdict stands on the dynamic model), at
 * 610 rpm ± 10 % so that about a third of the dynamic runs reach yield; no shaft inertia, so the
 * dynamic model is one element and a run takes a few milliseconds. Its dynamic yield ratio is a
 * fixed share of the energy method's (both linear in speed over strength here), so the control is
 * close to perfect and 40 runs give about the energy method's own sureness.
 */
export function rampedOneDisc(samples: number, dynamicSamples: number): Case {
  const fixture = readFileSync(new URL('../data/one-disc.yaml', import.meta.url), 'utf8');
  return parseCase(
    fixture.replace('speed: 150 rpm', 'speed: 610 rpm ± 10 %').replace('  at: jam\n', '  at: jam\n  duration: 20 ms\n') +
      `analysis:\n  shaft_inertia: false\n  samples: ${samples}\n  dynamic_samples: ${dynamicSamples}\n`,
  );
}
