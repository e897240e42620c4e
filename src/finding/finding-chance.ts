import type { Results } from '../results/results.ts';

/** The chance of yield under the case's tolerances, from the model the finding stands on. */
export interface FindingChance {
  /** Which model's runs it comes from. */
  model: 'energy method' | 'dynamic model';
  probability: number;
  /** 95 % interval on the estimate, within [0, 1]. */
  interval: [number, number] | undefined;
  /** How it was obtained. */
  method: string;
  /** Full runs of that model. */
  runs: number;
}

/**
 * The chance of yield from the finding's own model: the dynamic model's runs where the finding
 * stands on it, the energy method's samples otherwise; undefined without an uncertainty run, or
 * where the finding stands on the dynamic model and no dynamic sample was run.
 */
export function findingChance(r: Results): FindingChance | undefined {
  const u = r.uncertainty;
  if (!u) return undefined;
  if (r.verdictBasis === 'dynamic model') {
    if (!u.dynamic) return undefined;
    return { model: 'dynamic model', probability: u.dynamic.yieldProbability, interval: undefined, method: 'monte-carlo', runs: u.dynamic.samples };
  }
  return { model: 'energy method', probability: u.yieldProbability, interval: undefined, method: 'monte-carlo', runs: u.samples };
}
