/**
 * shaftcase as a library: read a case, run the engine, decide the finding, size what goes back in,
 * render the JSON and the report. The same functions the command line uses; all SI.
 *
 *   import { parseCase, investigate } from 'shaftcase';
 *   const r = investigate(parseCase(text, 'case.yaml'));
 *   r.finding.verdict; // 'elastic' | 'yielded locally' | 'yielded' | 'fracture predicted'
 */
export { parseCase } from './case/parse-case.ts';
export { loadCase, type LoadedCase } from './io/load-case.ts';
export { CaseError, type CaseProblem, type CaseErrorCode } from './case/case-error.ts';
export type { Case } from './case/case.ts';
export { analyseCase, type AnalyseOptions } from './results/analyse-case.ts';
export type { Results, Verdict } from './results/results.ts';
export { investigate, type InvestigateOptions } from './finding/investigate.ts';
export { decideFinding, type Finding, type FindingVerdict, type FindingBasis } from './finding/finding.ts';
export { withFinding, type Investigation } from './finding/investigation.ts';
export type { FindingChance } from './finding/finding-chance.ts';
export { resizeCase } from './resize/resize-case.ts';
export type { OptionId, Recommended, ResizeResult } from './resize/resize-result.ts';
export { resultsToJson } from './views/results-json.ts';
export { resizeToJson } from './views/resize-json.ts';
export { findingToJson } from './views/finding-json.ts';
export { findingSentence, verdictWord } from './views/finding-words.ts';
export { renderSummary } from './views/summary.ts';
export { SCHEMA_VERSION } from './views/schema-version.ts';
export { MATERIAL_LIBRARY } from './materials/library.ts';
export type { Material } from './materials/material.ts';
export { writeCaseReport } from './cli/write-case-report.ts';
