import type { Case } from '../case/case.ts';
import { resizeCase } from '../resize/resize-case.ts';
import type { InputWarnings } from '../results/input-warnings.ts';
import { investigate } from '../finding/investigate.ts';
import type { ReportData } from './report-context.ts';

/** Overrides from the command line, as `check` and `resize` take them. */
export interface ReportDataOptions {
  /** Monte Carlo samples; 0 switches the uncertainty run off. */
  samples?: number;
  seed?: number;
  /** Design factor N on shear yield for what goes back in. */
  factor?: number;
  /** Progress of the dynamic-model samples, for a terminal. */
  onDynamicProgress?: (done: number, total: number) => void;
  /** The case file's plausibility warnings, carried into the results as `check` carries them. */
  inputWarnings?: InputWarnings;
}

/**
 * Everything a report shows, computed once: the investigation (`check`'s results, with the
 * uncertainty run where the case states tolerances) and the options for what goes back in
 * (`resize`'s). Pure; the report's sections and figures only read it.
 */
export function buildReportData(c: Case, opts: ReportDataOptions = {}): ReportData {
  const results = investigate(c, { samples: opts.samples, seed: opts.seed, onDynamicProgress: opts.onDynamicProgress, inputWarnings: opts.inputWarnings });
  return { results, resize: resizeCase(c, results, { factor: opts.factor }) };
}
