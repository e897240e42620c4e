import * as Plot from '@observablehq/plot';
import { parseHTML } from 'linkedom';

/** A figure for the report: a file name without extension, a title, a caption and standalone SVG text. */
export interface ReportFigure {
  name: string;
  title: string;
  caption: string;
  svg: string;
}

/**
 * Draws a Plot chart server-side with linkedom's document and returns standalone SVG text. Plot
 * wraps the chart in a <figure> when it has a legend or caption, so the inner <svg> is taken; the
 * svg namespace is set because neither DOM library adds it (shared STACK.md, pitfalls).
 */
export function plotToSvg(options: Plot.PlotOptions): string {
  const { document } = parseHTML('<!doctype html><html><body></body></html>');
  const el = Plot.plot({ ...options, document: document as unknown as Document }) as unknown as Element;
  const svg = el.tagName.toLowerCase() === 'svg' ? el : el.querySelector('svg');
  if (!svg) throw new Error('plotToSvg: the plot has no <svg>');
  svg.setAttribute('xmlns', 'http://www.w3.org/2000/svg');
  return svg.outerHTML;
}
