import { dirname, isAbsolute, relative, resolve } from 'node:path';
import { CaseError } from '../case/case-error.ts';
import type { Investigation } from '../finding/investigation.ts';
import { investigate } from '../finding/investigate.ts';
import { findCases, newestReport } from '../io/find-cases.ts';
import { loadCase, type LoadedCase } from '../io/load-case.ts';
import { hasLogFields, incidentRow, type IncidentRow } from '../log/incident-row.ts';
import { resultsToJson } from '../views/results-json.ts';

export interface CollectedIncidents {
  rows: IncidentRow[];
  /** What the reader should know: where the engine ran and why, cases skipped, limits reached. */
  notes: string[];
}

/**
 * One row per case under `dir`: from the case's newest report where it was made from the case file
 * as it is now and carries the fatigue estimate, else from the engine (no Monte Carlo: the log
 * reads no chance), saying so. A case that does not read is skipped with its first problem.
 * `known` gives cases already investigated (by resolved path), used as they are.
 */
export function collectIncidents(dir: string, known: ReadonlyMap<string, { loaded: LoadedCase; results: Investigation }> = new Map()): CollectedIncidents {
  const found = findCases(dir);
  const rows: IncidentRow[] = [];
  const notes: string[] = found.truncated.map((t) => `The search ${t} (README, Limits).`);
  for (const file of found.files) {
    const shown = display(file);
    const given = known.get(resolve(file));
    let loaded: LoadedCase;
    try {
      loaded = given?.loaded ?? loadCase(file);
    } catch (e) {
      if (e instanceof CaseError) {
        notes.push(`${shown}: skipped, the case does not read (${e.problems[0]?.message ?? e.message}).`);
        continue;
      }
      throw e;
    }
    const meta = loaded.case.meta;
    if (given) {
      rows.push(incidentRow(resultsToJson(given.results), meta, { caseFile: resolve(file), report: null, source: 'engine' }));
      continue;
    }
    const report = newestReport(file, dirname(file));
    if (report && report.json.case_sha256 === loaded.sha256 && hasLogFields(report.json)) {
      rows.push(incidentRow(report.json, meta, { caseFile: resolve(file), report: display(report.folder), source: 'report' }));
      continue;
    }
    const why = !report
      ? 'no report yet'
      : report.json.case_sha256 !== loaded.sha256
        ? 'its newest report was made from another version of the case file'
        : 'its newest report has no fatigue estimate';
    notes.push(`${meta.id} (${shown}): ${why}; the engine ran on the case file.`);
    rows.push(incidentRow(resultsToJson(investigate(loaded.case, { samples: 0 })), meta, { caseFile: resolve(file), report: null, source: 'engine' }));
  }
  return { rows, notes };
}

/** A path as the reader gave it: relative to the working folder when it lies below it, else absolute. */
function display(path: string): string {
  const rel = relative(process.cwd(), path);
  return rel === '' || rel.startsWith('..') || isAbsolute(rel) ? path : rel;
}
