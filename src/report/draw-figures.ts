import type { Results } from '../results/results.ts';
import { REPORT_FIGURES } from './registry.ts';
import type { PlacedFigure } from './render-report.ts';

/** Draws every registered figure that has something to show for these results, in order. */
export function drawFigures(results: Results, registry = REPORT_FIGURES): PlacedFigure[] {
  return registry.flatMap(({ section, draw }) => {
    const figure = draw(results);
    return figure ? [{ section, figure }] : [];
  });
}
