/** Lays out rows of cells (headings first) as a plain-text table with a rule under the headings. */
export function textTable(rows: readonly (readonly string[])[]): string[] {
  const widths = rows[0].map((_, i) => Math.max(...rows.map((r) => r[i].length)));
  const lines = rows.map((r) =>
    r
      .map((c, i) => c.padEnd(widths[i]))
      .join('  ')
      .trimEnd(),
  );
  lines.splice(1, 0, widths.map((w) => '-'.repeat(w)).join('  '));
  return lines;
}
