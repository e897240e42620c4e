// Helpers shared by the report tests: the invented test cases in test/data/report/ as results.
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { basename, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { existsSync } from 'node:fs';
import { parseCase } from '../../src/case/parse-case.ts';
import { buildReportData } from '../../src/report/build-report-data.ts';
import type { CaseSource, ReportContext, ReportData } from '../../src/report/report-context.ts';
import { runInfo } from '../../src/report/run-info.ts';
import type { Investigation } from '../../src/finding/investigation.ts';

export const DATA = fileURLToPath(new URL('../data/report/', import.meta.url));
export const SAMPLE_CASES = fileURLToPath(new URL('../../sample-cases/', import.meta.url));
export const SAMPLE = join(SAMPLE_CASES, 'granulator-tramp-metal.yaml');
/** The sample case with a tolerance on its speed, so its report has the uncertainty section. */
export const TOLERANCED_SAMPLE = join(SAMPLE_CASES, 'screw-conveyor-jam-us.yaml');
export const DEFAULT_TEMPLATE = fileURLToPath(new URL('../../templates/report.md', import.meta.url));

/** A fixed run (vitest pins TZ=UTC), so reports made in tests do not depend on the clock. */
export const FIXED_NOW = new Date('2026-12-01T10:20:30Z');
export const RUN = runInfo(FIXED_NOW, '9.9.9-test');

export interface Fixture {
  /** What the report shows, as the report command builds it (investigate, then resize). */
  data: ReportData;
  results: Investigation;
  source: CaseSource;
  /** The context every section renders from, with the fixed run. */
  ctx: ReportContext;
  path: string;
}

const made = new Map<string, Fixture>();

/**
 * A test case by file name in test/data/report/ (else in sample-cases/), or the granulator sample
 * case for "sample". Built once per name (the Monte Carlo of a toleranced case takes a moment);
 * treat it as read-only.
 */
export function fixture(name: string): Fixture {
  const path = name === 'sample' ? SAMPLE : existsSync(join(DATA, name)) ? join(DATA, name) : join(SAMPLE_CASES, name);
  const cached = made.get(path);
  if (cached) return cached;
  const text = readFileSync(path, 'utf8');
  const data = buildReportData(parseCase(text, basename(path)));
  const source = { file: basename(path), text, sha256: createHash('sha256').update(text).digest('hex') };
  const f = { data, results: data.results, source, ctx: { ...data, run: RUN, source }, path };
  made.set(path, f);
  return f;
}

export function defaultTemplate(): { text: string; file: string } {
  return { text: readFileSync(DEFAULT_TEMPLATE, 'utf8'), file: 'report.md' };
}

/** A 1×1 PNG (the smallest valid one), for photo tests. */
export const TINY_PNG = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8DwHwAFBQIAX8jx0gAAAABJRU5ErkJggg==', 'base64');
