import { formatInputWarning, type InputWarning } from '../case/plausibility.ts';
import type { Results } from './results.ts';

/** The plausibility warnings of a case file (`checkPlausibility`), with the file's name for their positions. */
export interface InputWarnings {
  file: string;
  warnings: readonly InputWarning[];
}

/**
 * The results with the case file's plausibility warnings carried in: first among `warnings`, each
 * as its positioned line (`case.yaml:14:17 shaft.segments[1].diameter: …`), so every view that
 * lists the warnings shows them, and as they are in `inputWarnings`, for the JSON. Pure.
 */
export function withInputWarnings(results: Results, given: InputWarnings | undefined): Results {
  if (!given || given.warnings.length === 0) return results;
  return {
    ...results,
    warnings: [...given.warnings.map((w) => formatInputWarning(given.file, w)), ...results.warnings],
    inputWarnings: [...given.warnings],
  };
}
