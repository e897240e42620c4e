import * as Plot from '@observablehq/plot';
import { frameFigure, plotDocument } from './svg-frame.ts';

/**
 * The one way the report draws a chart: @observablehq/plot in Node with linkedom's document
 * (`plotDocument`), framed as a standalone SVG with the title and caption drawn in (`frameFigure`:
 * white background, `xmlns` set). Plot wraps the chart in a <figure> when it has a legend or
 * caption, so the inner <svg> is taken (shared STACK.md, pitfalls). Plot cannot measure text in
 * Node: set margins for long labels (`marginFor`). Avoid Plot's `clip` and `marker` options, whose
 * ids count up across plots and break byte-identical output.
 */
export function plotToSvg(options: Plot.PlotOptions, title: string, caption: string): string {
  const el = Plot.plot({ ...options, document: plotDocument() }) as unknown as Element;
  const svg = el.tagName.toLowerCase() === 'svg' ? el : el.querySelector('svg');
  if (!svg) throw new Error('plotToSvg: the plot has no <svg>');
  return frameFigure(svg, title, caption);
}
