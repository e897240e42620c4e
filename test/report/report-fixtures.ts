// Helpers shared by the report tests: the invented test cases in test/data/report/ as results.
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { basename, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseCase } from '../../src/case/parse-case.ts';
import type { CaseSource } from '../../src/report/report-context.ts';
import { runInfo } from '../../src/report/run-info.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import type { Results } from '../../src/results/results.ts';

export const DATA = fileURLToPath(new URL('../data/report/', import.meta.url));
export const SAMPLE = fileURLToPath(new URL('../../sample-cases/granulator-tramp-metal.yaml', import.meta.url));
export const DEFAULT_TEMPLATE = fileURLToPath(new URL('../../templates/report.md', import.meta.url));

/** A fixed run (vitest pins TZ=UTC), so reports made in tests do not depend on the clock. */
export const FIXED_NOW = new Date('2026-12-01T10:20:30Z');
export const RUN = runInfo(FIXED_NOW, '9.9.9-test');

export interface Fixture {
  results: Results;
  source: CaseSource;
  path: string;
}

/** A test case by file name in test/data/report/, or the sample case for "sample". */
export function fixture(name: string): Fixture {
  const path = name === 'sample' ? SAMPLE : join(DATA, name);
  const text = readFileSync(path, 'utf8');
  return {
    results: analyseCase(parseCase(text, basename(path))),
    source: { file: basename(path), text, sha256: createHash('sha256').update(text).digest('hex') },
    path,
  };
}

export function defaultTemplate(): { text: string; file: string } {
  return { text: readFileSync(DEFAULT_TEMPLATE, 'utf8'), file: 'report.md' };
}

/** A 1×1 PNG (the smallest valid one), for photo tests. */
export const TINY_PNG = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8DwHwAFBQIAX8jx0gAAAABJRU5ErkJggg==', 'base64');
