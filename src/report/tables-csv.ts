import * as aq from 'arquero';
import type { Results } from '../results/results.ts';
import { REPORT_TABLES } from './registry.ts';
import { columnHeader, type Cell, type ReportTable } from './tables/report-table.ts';

/**
 * A text cell a spreadsheet would run as a formula (starting with =, +, -, @, tab or return) gets a
 * leading apostrophe, the usual guard against formula injection from user text. Numbers are left as they are.
 */
export function guardCell(v: Cell): Cell {
  return typeof v === 'string' && /^[=+\-@\t\r]/.test(v) ? `'${v}` : v;
}

/**
 * A number as a spreadsheet should read it: 15 significant digits, the most a double holds for every
 * value (IEEE 754 binary64 keeps 15 decimal digits exactly: DBL_DIG in C's <float.h>), so that the noise of
 * binary arithmetic (2.9999999999999996) is written as the number it stands for (3).
 */
export function csvNumber(v: number): string {
  return String(Number(v.toPrecision(15)));
}

/** The byte-order mark that tells a spreadsheet program the file is UTF-8 (so °, ·, ² in the headers survive). */
export const UTF8_BOM = '\uFEFF';

/**
 * One table as CSV (arquero) in the form RFC 4180 gives and spreadsheet programs open as they should:
 * a UTF-8 byte-order mark, header "label (unit)", numbers at 15 significant digits, empty for "—",
 * every line (and a line break inside a quoted text) ended by CR LF.
 */
export function tableToCsv(t: ReportTable): string {
  const columns: Record<string, Cell[]> = {};
  const format: Record<string, (v: Cell) => Cell> = {};
  t.columns.forEach((c, i) => {
    const header = columnHeader(c);
    columns[header] = t.rows.map((r) => guardCell(r[i]));
    format[header] = (v) => (typeof v === 'number' ? csvNumber(v) : v);
  });
  const lf = aq.table(columns).toCSV({ format }) + '\n';
  return UTF8_BOM + lf.replace(/\r?\n/g, '\r\n');
}

/** Every registered table that has something to show for these results, as `{ name, csv }`. */
export function reportTablesCsv(r: Results, registry = REPORT_TABLES): { name: string; csv: string }[] {
  return registry.flatMap((build) => {
    const t = build(r);
    return t ? [{ name: t.name, csv: tableToCsv(t) }] : [];
  });
}
