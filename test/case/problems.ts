import { CaseError } from '../../src/case/case-error.ts';
import { parseCase } from '../../src/case/parse-case.ts';

/** The problems parseCase reports for `text`, as the CLI prints them. */
export function problems(text: string): string[] {
  try {
    parseCase(text, 'case.yaml');
  } catch (e) {
    if (e instanceof CaseError) return e.message.split('\n');
    throw e;
  }
  throw new Error('expected a CaseError');
}

/** Line number (1-based) of the first line of `text` containing `needle`. */
export function lineOf(text: string, needle: string): number {
  return text.split('\n').findIndex((l) => l.includes(needle)) + 1;
}
