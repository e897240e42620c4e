import type { Case } from '../case/case.ts';
import { analyseCase } from '../results/analyse-case.ts';
import type { Results } from '../results/results.ts';

/**
 * The engine run on a changed case, as a design check: does the changed shaft stay below yield
 * with the design factor? The dynamic model's shaft elements are kept elastic here
 * (`dynamic_plasticity: false`): where the changed shaft stays elastic the elastic model is the
 * same result, and where it would yield the option fails either way, with the elastic stress / shear yield
 * saying by how much (a yielding model would cap it). No twist read-back is made.
 */
export function designRun(c: Case): Results {
  return analyseCase({ ...c, analysis: { ...c.analysis, dynamicPlasticity: false } }, { readBack: false });
}
