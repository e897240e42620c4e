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

/** One table as CSV (arquero): header "label (unit)", numbers at full precision, empty for "—". */
export function tableToCsv(t: ReportTable): string {
  const columns: Record<string, Cell[]> = {};
  t.columns.forEach((c, i) => {
    columns[columnHeader(c)] = t.rows.map((r) => guardCell(r[i]));
  });
  return aq.table(columns).toCSV() + '\n';
}

/** Every registered table that has something to show for these results, as `{ name, csv }`. */
export function reportTablesCsv(r: Results, registry = REPORT_TABLES): { name: string; csv: string }[] {
  return registry.flatMap((build) => {
    const t = build(r);
    return t ? [{ name: t.name, csv: tableToCsv(t) }] : [];
  });
}
