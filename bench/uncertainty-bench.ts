import { readFileSync } from 'node:fs';
import { parseCase } from '../src/case/parse-case.ts';
import { investigate } from '../src/results/investigate.ts';

/**
 * Times the Monte Carlo on a sample case with tolerances: samples through the same engine as
 * `check`. The cost per sample is the run with the samples less the same run with none, so the
 * single run and its dynamic model are not counted in it. Best of 3.
 */
export function benchUncertainty(): string[] {
  const url = new URL('../../sample-cases/screw-conveyor-jam-us.yaml', import.meta.url);
  const c = parseCase(readFileSync(url, 'utf8'));
  const time = (samples: number) => {
    let best = Infinity;
    for (let i = 0; i < 3; i++) {
      const t0 = performance.now();
      investigate(c, { samples });
      best = Math.min(best, performance.now() - t0);
    }
    return best;
  };
  investigate(c, { samples: 200 }); // warm up
  const none = time(0);
  const lines: string[] = ['', `Monte Carlo (energy method), sample case screw-conveyor-jam-us; the same check without samples ${none.toFixed(1)} ms:`];
  for (const samples of [1000, 10_000]) {
    const ms = time(samples) - none;
    lines.push(`  ${String(samples).padStart(6)} samples  ${ms.toFixed(1).padStart(8)} ms beyond it  ${((1000 * ms) / samples).toFixed(2)} µs per sample`);
  }
  return lines;
}
