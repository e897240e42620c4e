import { sig } from '../../views/display-units.ts';
import { escapeMarkdown } from '../markdown-text.ts';

/** One cell: a number in the column's unit, a text, or nothing ("—"). */
export type Cell = number | string | null;

export interface TableColumn {
  label: string;
  /** Unit label shown in the header, in the case's display units. */
  unit?: string;
  /** Significant figures shown in the report (3 unless more is meaningful); CSVs keep every digit. */
  digits?: number;
}

/**
 * A table of the report. The same object is shown rounded in the Markdown and written at full
 * precision to `tables/NAME.csv`, so the CSVs are exactly the report's tables.
 */
export interface ReportTable {
  /** File name without extension, such as `segments`. */
  name: string;
  title: string;
  columns: TableColumn[];
  rows: Cell[][];
}

/** "diameter (mm)" */
export function columnHeader(c: TableColumn): string {
  return c.unit ? `${c.label} (${c.unit})` : c.label;
}

/** The table as Markdown, numbers rounded to their column's significant figures, text escaped. */
export function markdownTable(t: ReportTable): string {
  const cell = (v: Cell, c: TableColumn) => (v === null ? '—' : typeof v === 'number' ? sig(v, c.digits ?? 3) : escapeMarkdown(v) || '—');
  const align = t.columns.map((_, i) => (t.rows.some((r) => typeof r[i] === 'number') ? '---:' : ':---'));
  const lines = [
    `| ${t.columns.map((c) => escapeMarkdown(columnHeader(c))).join(' | ')} |`,
    `| ${align.join(' | ')} |`,
    ...t.rows.map((r) => `| ${r.map((v, i) => cell(v, t.columns[i])).join(' | ')} |`),
  ];
  return lines.join('\n');
}
