import type { Results } from '../results/results.ts';
import { inputsToJson } from '../views/inputs-json.ts';
import { resultsToJson } from '../views/results-json.ts';
import type { CaseSource } from './report-context.ts';
import type { RunInfo } from './run-info.ts';

/**
 * results.json of a report: exactly what `check --json` prints, then the inputs as parsed (SI), the
 * tool's version, when it ran and the case file's SHA-256. Full precision throughout.
 */
export function reportJson(r: Results, run: RunInfo, source: CaseSource): Record<string, unknown> {
  return {
    ...resultsToJson(r),
    inputs: inputsToJson(r.case),
    tool_version: run.version,
    ran_at: run.iso,
    case_file: source.file,
    case_sha256: source.sha256,
  };
}
