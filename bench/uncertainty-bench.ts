import { readFileSync } from 'node:fs';
import { parseCase } from '../src/case/parse-case.ts';
import { investigate } from '../src/finding/investigate.ts';

/**
 * Times the Monte Carlo on a sample case with tolerances: samples through the same engine as
 * `check`. The closed-form cost per sample is the difference between 10,000 and 1,000 samples
 * over the 9,000 between, so what the uncertainty run pays once (the single run, the dynamic
 * model's samples where the case has them) is not counted in it. Best of 3.
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
  const few = time(1000);
  const many = time(10_000);
  return [
    '',
    'Monte Carlo, sample case screw-conveyor-jam-us (best of 3):',
    `  no samples ${none.toFixed(1)} ms; 1,000 samples ${few.toFixed(1)} ms; 10,000 samples ${many.toFixed(1)} ms`,
    `  closed-form cost per sample (10,000 less 1,000, over 9,000): ${((1000 * (many - few)) / 9000).toFixed(2)} µs`,
  ];
}
