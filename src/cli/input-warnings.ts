import { CaseError } from '../case/case-error.ts';
import { checkPlausibility, formatInputWarning } from '../case/plausibility.ts';
import type { LoadedCase } from '../io/load-case.ts';
import type { InputWarnings } from '../results/input-warnings.ts';
import type { Io } from './io.ts';

/**
 * The loaded case's plausibility warnings, before the engine runs: printed on stderr one line each
 * (`case.yaml:14:17 shaft.segments[1].diameter: …`) and returned for the results; with `strict`,
 * thrown as a `CaseError` instead, so the command exits 2 like any other mistake in the case.
 */
export function screenInputs(loaded: LoadedCase, strict: boolean | undefined, io: Io): InputWarnings {
  const warnings = checkPlausibility(loaded.case, loaded.text);
  if (strict && warnings.length > 0) {
    throw new CaseError(
      loaded.file,
      warnings.map((w) => ({ code: 'E_IMPLAUSIBLE', path: w.path, message: w.message, position: { line: w.line, column: w.column } })),
    );
  }
  for (const w of warnings) io.err(`${formatInputWarning(loaded.file, w)}\n`);
  return { file: loaded.file, warnings };
}
