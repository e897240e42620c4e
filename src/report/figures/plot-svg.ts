import * as Plot from '@observablehq/plot';
import { parseHTML } from 'linkedom';

/** A figure for the report: a file name, its title and caption, and standalone SVG text. */
export interface Figure {
  name: string;
  title: string;
  caption: string;
  svg: string;
}

/**
 * Draws a Plot chart server-side with linkedom and returns standalone SVG text: the inner <svg>
 * when Plot wraps it in a <figure>, with the SVG namespace set (neither library adds it). Plot
 * cannot measure text here, so callers set the margins.
 */
export function plotSvg(options: Plot.PlotOptions): string {
  const { document } = parseHTML('<!doctype html><html><body></body></html>');
  const el = Plot.plot({ ...options, document } as Plot.PlotOptions) as unknown as Element;
  const svg = el.tagName.toLowerCase() === 'svg' ? el : el.querySelector('svg')!;
  svg.setAttribute('xmlns', 'http://www.w3.org/2000/svg');
  return svg.outerHTML;
}
