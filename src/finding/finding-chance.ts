import type { Results } from '../results/results.ts';
import type { ChanceEstimate } from '../uncertainty/chance.ts';

/** The chance of yield under the case's tolerances, from the model the finding stands on. */
export interface FindingChance extends ChanceEstimate {
  /** Which model's runs it comes from. */
  model: 'energy method' | 'dynamic model';
}

/**
 * The chance of yield from the finding's own model: the dynamic model's runs (corrected by the
 * energy method's samples of the same draws, `controlVariateChance`) where the finding stands on it,
 * the energy method's samples otherwise; undefined without an uncertainty run, or where the finding
 * stands on the dynamic model and no dynamic run was made (`analysis.dynamic_samples: 0`): the
 * energy method's chance is then not the finding's, and is shown only as a comparison.
 */
export function findingChance(r: Results): FindingChance | undefined {
  const u = r.uncertainty;
  if (!u) return undefined;
  if (r.verdictBasis === 'dynamic model') return u.dynamic ? { ...u.dynamic.yieldChance, model: 'dynamic model' } : undefined;
  return { ...u.yieldChance, model: 'energy method' };
}
