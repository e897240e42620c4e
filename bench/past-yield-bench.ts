import { readFileSync } from 'node:fs';
import { parseCase } from '../src/case/parse-case.ts';
import { analyseCase } from '../src/results/analyse-case.ts';

/**
 * Times `analyseCase` on the sample cases whose shaft yields, with the dynamic model's elements
 * elastic and elastic–plastic (the default), with and without the twist read-back (which reruns
 * the dynamic model where the read-back stands on it).
 */
export function benchPastYield(): string[] {
  const lines = ['', 'analyseCase past yield (best of 3, ms): elastic dynamics | elastic–plastic | elastic–plastic with the read-back'];
  for (const name of ['granulator-tramp-metal', 'screw-conveyor-jam-us', 'exhaust-fan-seized-impeller', 'edger-arbor-two-sides']) {
    const c = parseCase(readFileSync(new URL(`../../sample-cases/${name}.yaml`, import.meta.url), 'utf8'));
    const elastic = { ...c, analysis: { ...c.analysis, dynamicPlasticity: false } };
    const time = (f: () => void) => {
      let best = Infinity;
      for (let i = 0; i < 3; i++) {
        const t0 = performance.now();
        f();
        best = Math.min(best, performance.now() - t0);
      }
      return best.toFixed(0).padStart(6);
    };
    const a = time(() => analyseCase(elastic, { readBack: false }));
    const b = time(() => analyseCase(c, { readBack: false }));
    const r = analyseCase(c);
    const d = time(() => analyseCase(c));
    lines.push(`  ${name.padEnd(30)} ${a} | ${b} | ${d}   (verdict ${r.verdict}, past yield by the ${r.pastYieldBasis})`);
  }
  return lines;
}
