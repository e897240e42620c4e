// Where the parts of a report sit, shared by the Markdown (its links) and the writer (its files).

/** Reports are written into this folder beside the case file. */
export const REPORTS_FOLDER = 'reports';

/** A figure's file, relative to report.md. */
export function figureHref(name: string): string {
  return `figures/${name}.svg`;
}

/** A table's file, relative to report.md. */
export function tableHref(name: string): string {
  return `tables/${name}.csv`;
}

/**
 * A photo's link from report.md (in `reports/ID-DATE/`) back to the case folder. Each path segment is
 * percent-encoded so spaces and brackets cannot end the Markdown link early.
 */
export function photoHref(path: string): string {
  const encoded = path
    .split(/[\\/]+/)
    .filter((p) => p !== '' && p !== '.')
    .map((p) => encodeURIComponent(p))
    .join('/');
  return `../../${encoded}`;
}

/**
 * The name of a new report: its base (`<case-id>-YYYY-MM-DD`, src/io/report-name.ts), or the base
 * with -2, -3 … when a folder or zip of that name is already there. `taken` holds the names present in the reports folder.
 */
export function nextReportName(base: string, taken: ReadonlySet<string>): string {
  for (let n = 1; ; n++) {
    const name = n === 1 ? base : `${base}-${n}`;
    if (!taken.has(name) && !taken.has(`${name}.zip`)) return name;
  }
}
