import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { parseCase } from '../src/case/parse-case.ts';
import { buildShaftModel } from '../src/model/shaft-model.ts';
import { solveDynamics } from '../src/results/dynamic-solve.ts';

const SAMPLES = fileURLToPath(new URL('../../sample-cases/', import.meta.url));

/**
 * The dynamic model's solve of each sample case at the element count its refinement settles on
 * (fixed, so one solve), as time per element-step: the integrator with its real laws, drives and
 * events, against the uniform chain's figure above. Best of 3.
 */
export function benchDynamicSolve(): string[] {
  const lines = ['', 'Dynamic solve of each sample case at its refined element count (best of 3):', `  ${'case'.padEnd(36)} elements    steps   time ms   ns per element-step`];
  for (const f of readdirSync(SAMPLES)
    .filter((x) => x.endsWith('.yaml'))
    .sort()) {
    const c = parseCase(readFileSync(SAMPLES + f, 'utf8'), f);
    const model = buildShaftModel(c);
    const target = solveDynamics(c, model).target;
    const fixed = { ...c, analysis: { ...c.analysis, elements: target } };
    let best = Infinity;
    let work = 0;
    let elements = 0;
    let steps = 0;
    for (let i = 0; i < 3; i++) {
      const t0 = performance.now();
      const sol = solveDynamics(fixed, model).final;
      best = Math.min(best, performance.now() - t0);
      elements = sol.chain.elements.length;
      steps = sol.run.steps;
      work = elements * steps;
    }
    lines.push(`  ${f.padEnd(36)} ${String(elements).padStart(8)} ${String(steps).padStart(8)} ${best.toFixed(1).padStart(9)} ${((best * 1e6) / work).toFixed(1).padStart(10)}`);
  }
  return lines;
}
