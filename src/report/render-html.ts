import MarkdownIt from 'markdown-it';
import { anchorOf } from './anchor.ts';
import { PAGE_FOOTER_META } from './page-footer.ts';
import { REPORT_CSS } from './report-css.ts';

export interface HtmlAssets {
  /** Plain-text title of the page. */
  title: string;
  /** Inline SVG of each figure, by the image link the Markdown uses (`figures/NAME.svg`). */
  figures: Record<string, string>;
  /** A `data:` URI of each photo, by the image link the Markdown uses. */
  images: Record<string, string>;
  /** What every printed page carries beside its number (the case id and the date); printPdf reads it. */
  pageFooter?: string;
}

/** Text escaped for HTML content and attribute values. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

/**
 * Nothing in the page may load or run anything: no scripts, no requests, images only from data
 * URIs. A second wall behind the escaping of user text.
 */
const CSP = "default-src 'none'; img-src data:; style-src 'unsafe-inline'; base-uri 'none'; form-action 'none'";

/**
 * The report as one self-contained HTML page. markdown-it runs with `html: false`, so raw HTML in
 * the Markdown is shown as text; images are replaced by the inline SVG figures and embedded photos
 * they link to, and any other image is shown as its text, never fetched. Pure.
 */
export function renderHtml(markdown: string, assets: HtmlAssets): string {
  const md = new MarkdownIt({ html: false, linkify: false, typographer: false });
  md.renderer.rules.image = (tokens, idx, options, env, self) => {
    const token = tokens[idx];
    const src = token.attrGet('src') ?? '';
    const alt = self.renderInlineAsText(token.children ?? [], options, env);
    const svg = Object.hasOwn(assets.figures, src) ? assets.figures[src] : undefined;
    if (svg !== undefined) return `<span class="figure" role="figure" aria-label="${escapeHtml(alt)}">${svg.replace(/^<\?xml[^>]*>\s*/, '').trim()}</span>`;
    const data = Object.hasOwn(assets.images, src) ? assets.images[src] : undefined;
    if (data !== undefined && data.startsWith('data:image/')) return `<img class="photo" src="${escapeHtml(data)}" alt="${escapeHtml(alt)}">`;
    return `<span class="not-embedded">[${escapeHtml(alt)}: not embedded]</span>`;
  };
  // Each heading gets the id its anchor names (anchorOf), numbered on a repeat as GitHub does, so
  // the first page's links land on the section that supports them.
  const used = new Map<string, number>();
  md.renderer.rules.heading_open = (tokens, idx, options, _env, self) => {
    const base = anchorOf(tokens[idx + 1].children?.map((t) => t.content).join('') ?? '');
    const n = used.get(base) ?? 0;
    used.set(base, n + 1);
    tokens[idx].attrSet('id', n === 0 ? base : `${base}-${n}`);
    return self.renderToken(tokens, idx, options);
  };
  const body = sectioned(md.render(markdown));
  return [
    '<!DOCTYPE html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    `<meta http-equiv="Content-Security-Policy" content="${CSP}">`,
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    `<title>${escapeHtml(assets.title)}</title>`,
    ...(assets.pageFooter === undefined ? [] : [`<meta name="${PAGE_FOOTER_META}" content="${escapeHtml(assets.pageFooter)}">`]),
    `<style>${REPORT_CSS}</style>`,
    '</head>',
    '<body>',
    '<main>',
    body.trimEnd(),
    '</main>',
    '</body>',
    '</html>',
    '',
  ].join('\n');
}

/**
 * The rendered body cut into one <section> per second-level heading, so the print styles can hold
 * the first page (the title and the first section) to a page of its own and start the appendices
 * (headings that begin with "Appendix") on a fresh page.
 */
function sectioned(body: string): string {
  const parts = body.split(/(?=<h2[ >])/);
  const head = parts[0].startsWith('<h2') ? '' : parts.shift()!;
  let appendix = false;
  const sections = parts.map((p, i) => {
    const isAppendix = /^<h2[^>]*>Appendix/.test(p);
    const cls = [i === 0 ? 'first-section' : '', isAppendix ? 'appendix' : '', isAppendix && !appendix ? 'first-appendix' : ''].filter(Boolean).join(' ');
    appendix ||= isAppendix;
    return `<section${cls ? ` class="${cls}"` : ''}>\n${p.trimEnd()}\n</section>\n`;
  });
  if (sections.length === 0) return head;
  return `<div class="first-page">\n${head}${sections[0]}</div>\n${sections.slice(1).join('')}`;
}
