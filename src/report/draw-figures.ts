import type { ReportFigure } from './figures/report-figure.ts';
import { REPORT_FIGURES } from './registry.ts';
import type { PlacedFigure } from './render-report.ts';
import type { ReportData } from './report-context.ts';

/** Draws every registered figure that has something to show for this report, in order. */
export function drawFigures(data: ReportData, registry = REPORT_FIGURES): PlacedFigure[] {
  return registry.flatMap(({ section, draw }) => {
    const drawn = draw(data);
    const figures = drawn === undefined ? [] : Array.isArray(drawn) ? drawn : [drawn];
    const placed = typeof section === 'string' ? section : section(data);
    return figures.map((figure: ReportFigure) => ({ section: placed, figure }));
  });
}
