import { inputsToJson } from '../views/inputs-json.ts';
import { resizeJson } from '../views/resize-json.ts';
import { resultsToJson } from '../views/results-json.ts';
import type { CaseSource, ReportData } from './report-context.ts';
import type { RunInfo } from './run-info.ts';

/**
 * results.json of a report: exactly what `check --json` prints (with the uncertainty run and its
 * seed where the case states tolerances), the `resize` object `resize --json` adds, then the
 * inputs as parsed (SI), the tool's version, when it ran and the case file's SHA-256. Full
 * precision throughout.
 */
export function reportJson({ results, resize }: ReportData, run: RunInfo, source: CaseSource): Record<string, unknown> {
  return {
    ...resultsToJson(results),
    resize: resizeJson(resize),
    inputs: inputsToJson(results.case),
    tool_version: run.version,
    ran_at: run.iso,
    case_file: source.file,
    case_sha256: source.sha256,
  };
}
