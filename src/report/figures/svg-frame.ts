import { parseHTML } from 'linkedom';

/** Width of every figure, px: fits a printed A4 or Letter page at 96 px to the inch. */
export const FIGURE_WIDTH = 720;
const TITLE_HEIGHT = 30;
const CAPTION_LINE = 16;
/** Characters of 12 px system-ui per caption line across FIGURE_WIDTH (about 6.5 px each, measured by eye). */
const CAPTION_CHARS = 110;

let cached: Document | undefined;

/**
 * A DOM document for @observablehq/plot to draw into in Node (linkedom, no browser). Plot only
 * creates detached elements in it, so one document serves every figure.
 */
export function plotDocument(): Document {
  cached ??= parseHTML('<!DOCTYPE html><html><head></head><body></body></html>').document as unknown as Document;
  return cached;
}

/** Text escaped for SVG/XML content and attribute values. */
export function escapeXml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

/** Words wrapped into lines of at most `width` characters. */
export function wrapWords(text: string, width: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/).filter(Boolean)) {
    if (line && line.length + 1 + word.length > width) {
      lines.push(line);
      line = word;
    } else line = line ? `${line} ${word}` : word;
  }
  if (line) lines.push(line);
  return lines;
}

/**
 * A standalone SVG: white background, the title above, Plot's chart, the caption below. Plot's
 * `<svg>` children are moved into a group so the chart keeps its own styles (its class goes on the
 * outer element) and no nested viewport is needed.
 */
export function frameFigure(plot: Element, title: string, caption: string): string {
  const width = Number(plot.getAttribute('width'));
  const height = Number(plot.getAttribute('height'));
  const lines = wrapWords(caption, CAPTION_CHARS);
  const total = TITLE_HEIGHT + height + 8 + lines.length * CAPTION_LINE + 6;
  const keep = ['class', 'font-family', 'font-size', 'fill', 'text-anchor'];
  const attrs = keep
    .map((a) => [a, plot.getAttribute(a)] as const)
    .filter(([, v]) => v !== null)
    .map(([a, v]) => ` ${a}="${escapeXml(v!)}"`)
    .join('');
  const captionText = lines.map((l, i) => `<text x="0" y="${TITLE_HEIGHT + height + 8 + (i + 1) * CAPTION_LINE - 4}" font-size="12" text-anchor="start">${escapeXml(l)}</text>`).join('');
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" role="img" width="${width}" height="${total}" viewBox="0 0 ${width} ${total}"${attrs}>` +
    `<title>${escapeXml(title)}</title><desc>${escapeXml(caption)}</desc>` +
    `<rect x="0" y="0" width="${width}" height="${total}" fill="white" />` +
    `<text x="0" y="20" font-size="15" font-weight="bold" text-anchor="start">${escapeXml(title)}</text>` +
    `<g transform="translate(0,${TITLE_HEIGHT})">${plot.innerHTML}</g>` +
    captionText +
    `</svg>\n`
  );
}

/** Left margin wide enough for the longest of `labels` at Plot's 10 px font (Plot cannot measure text in Node). */
export function marginFor(labels: readonly string[], min = 40, max = 300): number {
  const longest = Math.max(0, ...labels.map((l) => l.length));
  return Math.min(max, Math.max(min, Math.ceil(longest * 6) + 12));
}
