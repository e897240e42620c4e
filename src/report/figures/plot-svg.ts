import * as Plot from '@observablehq/plot';
import { parseHTML } from 'linkedom';

/**
 * Renders Plot options to standalone SVG text without a browser: Plot draws into linkedom's
 * document; the `<svg>` is taken from inside Plot's `<figure>` when there is one, and given its
 * `xmlns` (neither DOM library adds it, and a .svg without it opens as text).
 */
export function plotSvg(options: Plot.PlotOptions): string {
  const { document } = parseHTML('<!doctype html><html><body></body></html>');
  const node = Plot.plot({ ...options, document: document as unknown as Document }) as unknown as Element;
  const svg = node.tagName.toLowerCase() === 'svg' ? node : node.querySelector('svg');
  if (!svg) throw new Error('plotSvg: Plot returned no <svg>');
  svg.setAttribute('xmlns', 'http://www.w3.org/2000/svg');
  return svg.outerHTML;
}
