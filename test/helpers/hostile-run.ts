// Runs a case file's text as the CLI's check would, for the hostile-input tests: either it is
// refused with positioned problems (a CaseError), or it runs, with its plausibility warnings, to an
// investigation whose JSON and summary hold only finite numbers. Anything else thrown is a bug and
// is rethrown.
import { CaseError } from '../../src/case/case-error.ts';
import { parseCase } from '../../src/case/parse-case.ts';
import { checkPlausibility } from '../../src/case/plausibility.ts';
import { investigate } from '../../src/finding/investigate.ts';
import { resultsToJson } from '../../src/views/results-json.ts';
import { renderSummary } from '../../src/views/summary.ts';

export type HostileOutcome = { refused: true; message: string } | { refused: false; json: unknown; summary: string };

export function runHostile(text: string, samples = 20): HostileOutcome {
  let c;
  try {
    c = parseCase(text, 'case.yaml');
  } catch (e) {
    if (e instanceof CaseError) return { refused: true, message: e.message };
    throw e;
  }
  const inputWarnings = { file: 'case.yaml', warnings: checkPlausibility(c, text) };
  const r = investigate(c, { samples, inputWarnings });
  return { refused: false, json: resultsToJson(r), summary: renderSummary(r) };
}

/** Every number in `value` (deeply), with its path, that is NaN or infinite. */
export function nonFinite(value: unknown, path = '$'): string[] {
  if (typeof value === 'number') return Number.isFinite(value) ? [] : [`${path} = ${value}`];
  if (Array.isArray(value)) return value.flatMap((v, i) => nonFinite(v, `${path}[${i}]`));
  if (value instanceof Float64Array) return nonFinite([...value], path);
  if (value && typeof value === 'object') return Object.entries(value).flatMap(([k, v]) => nonFinite(v, `${path}.${k}`));
  return [];
}

/** Each line of a refusal: `case.yaml[:line:column] [path]: message`. */
export const PROBLEM_LINE = /^case\.yaml(:\d+:\d+)?( .+?)?: \S/;
