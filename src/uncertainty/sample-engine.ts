import type { Case } from '../case/case.ts';
import type { Engine } from './monte-carlo.ts';
import { planSamples } from './sample-plan.ts';

const NO_VALUES = new Float64Array(0);

/**
 * The engine a Monte Carlo sample runs: the same functions as the single run (energy method,
 * energy balance past yield, reading measured twist back), without what only the report needs
 * (figure curves, texts). `analyseCase` gives the same numbers; a test says so. Called on a case it
 * plans and runs once (the sensitivity swings); the Monte Carlo plans once per case through its
 * `plan` and runs each sample from the drawn values.
 *
 * `readBack` false: the speeds behind a measured twist are not sought (where the read-back stands
 * on the dynamic model, the energy balance's speeds are not shown).
 */
export function sampleEngine(readBack: boolean): Engine {
  const engine = (c: Case) => planSamples(c, [], readBack)(NO_VALUES);
  return Object.assign(engine, { plan: (c: Case, inputs: Parameters<typeof planSamples>[1]) => planSamples(c, inputs, readBack) });
}

/** The sample engine with the read-back of measured twist. */
export const sampleMetrics = sampleEngine(true);
