import { readdirSync, readFileSync, statSync } from 'node:fs';
import { basename, join } from 'node:path';
import { SIZE_LIMITS } from '../case/limits.ts';
import { REPORTS_FOLDER } from '../report/layout.ts';

/** How far `shaftcase log` looks: folder depth below DIR, entries read, case files taken (README, Limits). */
export const LOG_WALK_LIMITS = { depth: 6, entries: 20_000, cases: 500 } as const;

export interface FoundCases {
  /** Case files, in the walk's order (folders sorted by name). */
  files: string[];
  /** What the walk left out because a limit was reached, in plain words; empty when nothing was. */
  truncated: string[];
}

/** A YAML file is a case when it has a top-level `case:` mapping (a site's materials.yaml has none). */
const CASE_START = /^case:[ \t]*(#.*)?$/m;

/**
 * Every case file under `dir`: `.yaml`/`.yml` files with a top-level `case:`, breadth first, folder
 * names sorted; `reports/` folders, hidden folders and `node_modules` are not entered. Bounded by
 * `LOG_WALK_LIMITS`; unreadable folders and files are skipped.
 */
export function findCases(dir: string, limits = LOG_WALK_LIMITS): FoundCases {
  const files: string[] = [];
  const truncated: string[] = [];
  let entries = 0;
  let level = [dir];
  for (let depth = 0; level.length > 0; depth++) {
    const next: string[] = [];
    for (const folder of level) {
      let names: string[];
      try {
        names = readdirSync(folder).sort();
      } catch {
        continue;
      }
      for (const name of names) {
        if (++entries > limits.entries) {
          truncated.push(`stopped after ${limits.entries} folder entries`);
          return { files, truncated };
        }
        const path = join(folder, name);
        let st;
        try {
          st = statSync(path);
        } catch {
          continue;
        }
        if (st.isDirectory()) {
          if (name.startsWith('.') || name === 'node_modules' || name === REPORTS_FOLDER) continue;
          if (depth + 1 > limits.depth) {
            if (!truncated.some((t) => t.startsWith('folders deeper'))) truncated.push(`folders deeper than ${limits.depth} levels below ${dir} were not searched`);
            continue;
          }
          next.push(path);
        } else if (st.isFile() && /\.ya?ml$/i.test(name) && st.size <= SIZE_LIMITS.fileBytes && isCaseFile(path)) {
          if (files.length >= limits.cases) {
            truncated.push(`stopped at ${limits.cases} case files`);
            return { files, truncated };
          }
          files.push(path);
        }
      }
    }
    level = next;
  }
  return { files, truncated };
}

function isCaseFile(path: string): boolean {
  try {
    return CASE_START.test(readFileSync(path, 'utf8'));
  } catch {
    return false;
  }
}

/** A report's results, as the log reads them. */
export interface ReportResults {
  /** The report folder. */
  folder: string;
  json: Record<string, unknown>;
}

/**
 * The newest report of a case file: among `reports/*∕results.json` beside it, the one whose
 * `case_file` is this file's name, newest by the date and number in its folder name (`ID-DATE`,
 * `ID-DATE-2` …, and the older `DATE[-N]`). Undefined when
 * there is none. Unreadable or malformed results are passed over.
 */
/** A report folder's name: the case id made safe (src/io/report-name.ts), the date, a number after the first. */
const REPORT_NAME = /^(?:.*?-)?(\d{4}-\d{2}-\d{2})(?:-(\d+))?$/;

export function newestReport(caseFile: string, caseFolder: string): ReportResults | undefined {
  const reports = join(caseFolder, REPORTS_FOLDER);
  let names: string[];
  try {
    names = readdirSync(reports).filter((n) => REPORT_NAME.test(n));
  } catch {
    return undefined;
  }
  const order = (n: string) => {
    const m = REPORT_NAME.exec(n)!;
    return [m[1], Number(m[2] ?? 1)] as const;
  };
  names.sort((a, b) => {
    const [da, na] = order(a);
    const [db, nb] = order(b);
    return da === db ? nb - na : da < db ? 1 : -1;
  });
  for (const n of names) {
    const folder = join(reports, n);
    try {
      const json = JSON.parse(readFileSync(join(folder, 'results.json'), 'utf8')) as Record<string, unknown>;
      if (typeof json === 'object' && json !== null && json.case_file === basename(caseFile)) return { folder, json };
    } catch {
      continue;
    }
  }
  return undefined;
}
