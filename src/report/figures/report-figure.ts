import type { Results } from '../../results/results.ts';

/** One figure of the report: `figures/NAME.svg`, embedded in the HTML and linked from the Markdown. */
export interface ReportFigure {
  /** File name without extension, such as `energy-share`. */
  name: string;
  title: string;
  /** One line saying what to read from the figure. */
  caption: string;
  /** A standalone SVG document with the title and caption drawn in. */
  svg: string;
}

/** Draws one figure from the results, or returns undefined when the case has nothing to show in it. */
export type FigureDrawer = (results: Results) => ReportFigure | undefined;
