import { readFileSync } from 'node:fs';
import { parseCase } from '../src/case/parse-case.ts';
import { investigate } from '../src/finding/investigate.ts';

/** Times the Monte Carlo on a sample case with tolerances: samples through the same engine as `check`. */
export function benchUncertainty(): string[] {
  const url = new URL('../../sample-cases/screw-conveyor-jam-us.yaml', import.meta.url);
  const c = parseCase(readFileSync(url, 'utf8'));
  const lines: string[] = ['Monte Carlo (energy method), sample case screw-conveyor-jam-us:'];
  for (const samples of [1000, 10_000]) {
    investigate(c, { samples: 200 }); // warm up
    const t0 = performance.now();
    investigate(c, { samples });
    const ms = performance.now() - t0;
    lines.push(`  ${String(samples).padStart(6)} samples  ${ms.toFixed(1).padStart(8)} ms  ${((1000 * ms) / samples).toFixed(2)} µs/sample`);
  }
  return lines;
}
