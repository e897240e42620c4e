import type { ReportData } from '../report-context.ts';

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

/**
 * Draws a figure (or one per item, such as per measured twist) from what the report shows, or
 * returns undefined (or none) when the case has nothing to show in it.
 */
export type FigureDrawer = (data: ReportData) => ReportFigure | readonly ReportFigure[] | undefined;
