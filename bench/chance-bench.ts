import { readFileSync } from 'node:fs';
import { parseCase } from '../src/case/parse-case.ts';
import { dynamicMetrics, investigate } from '../src/finding/investigate.ts';
import { controlVariateChance } from '../src/uncertainty/chance.ts';
import { uncertainInputs } from '../src/uncertainty/inputs.ts';
import { monteCarlo } from '../src/uncertainty/monte-carlo.ts';
import { runDynamicUncertainty } from '../src/uncertainty/uncertainty.ts';

function best(f: () => void, runs: number): number {
  let t = Infinity;
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    f();
    t = Math.min(t, performance.now() - t0);
  }
  return t;
}

/**
 * Times the chance of yield on the screw-conveyor sample (its verdict stands on the dynamic model):
 * the control-variate estimate alone (the dynamic runs against the energy method's samples), and the
 * dynamic runs it stands on at the base run's element count, against each refining on its own.
 */
export function benchChance(): string[] {
  const url = new URL('../../sample-cases/screw-conveyor-jam-us.yaml', import.meta.url);
  const c = parseCase(readFileSync(url, 'utf8'));
  const r = investigate(c);
  const u = r.uncertainty!;
  const d = u.dynamic!;
  const settings = { samples: d.samples, seed: u.seed, strengthScatter: u.strengthScatter };
  const fixed = (k: typeof c) => dynamicMetrics(k, r.dynamic.elementTarget);
  const fine = monteCarlo(c, uncertainInputs(c, u.strengthScatter).inputs, fixed, d.samples, u.seed).yieldRatio;
  const tChance = best(() => controlVariateChance(fine, u.yieldRatioSamples), 10);
  const tFixed = best(() => runDynamicUncertainty(c, fixed, settings, u.yieldRatioSamples), 3);
  const tRefined = best(() => runDynamicUncertainty(c, (k) => dynamicMetrics(k), settings, u.yieldRatioSamples), 3);
  const pct = (x: number) => (100 * x).toFixed(1);
  const [lo, hi] = d.yieldChance.interval;
  return [
    `Chance of yield, sample case screw-conveyor-jam-us (${d.samples} dynamic runs, ${u.samples} energy-method samples), best of 10 / 3:`,
    `  control-variate estimate alone          ${tChance.toFixed(1).padStart(8)} ms  (${pct(d.yieldChance.probability)} %, 95 %: ${pct(lo)} to ${pct(hi)} %)`,
    `  dynamic runs at the base element count  ${tFixed.toFixed(1).padStart(8)} ms`,
    `  dynamic runs each refining on its own   ${tRefined.toFixed(1).padStart(8)} ms`,
  ];
}
