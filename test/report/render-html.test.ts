import { parseHTML } from 'linkedom';
import { describe, expect, it } from 'vitest';
import { drawFigures } from '../../src/report/draw-figures.ts';
import { figureHref, photoHref } from '../../src/report/layout.ts';
import { renderHtml } from '../../src/report/render-html.ts';
import { renderReport } from '../../src/report/render-report.ts';
import { defaultTemplate, fixture, RUN, TINY_PNG } from './report-fixtures.ts';

const PNG_URI = `data:image/png;base64,${TINY_PNG.toString('base64')}`;

function hostileHtml() {
  const f = fixture('hostile.yaml');
  const figures = drawFigures(f.data);
  const md = renderReport(f.data, { run: RUN, source: f.source, figures, template: defaultTemplate() });
  const html = renderHtml(md, {
    title: `${f.results.case.meta.id} ${f.results.case.meta.title}`,
    figures: Object.fromEntries(figures.map((x) => [figureHref(x.figure.name), x.figure.svg])),
    images: Object.fromEntries(f.results.case.observed.photos.map((p) => [photoHref(p.path), PNG_URI])),
  });
  return { html, figures, document: parseHTML(html).document, md };
}

describe('renderHtml', () => {
  it('hostile text from the case file yields no script, no event handler, no frame and no javascript: link', () => {
    const { document } = hostileHtml();
    expect(document.querySelectorAll('script, iframe, object, embed, form, base, link, meta[http-equiv=refresh]')).toHaveLength(0);
    // The only links are the first page's, each to a heading of the report itself.
    const ids = new Set([...document.querySelectorAll('h2, h3')].map((h) => h.getAttribute('id')));
    for (const a of document.querySelectorAll('a')) expect(ids).toContain(a.getAttribute('href')!.replace(/^#/, ''));
    for (const el of document.querySelectorAll('*')) {
      for (const attr of el.attributes) {
        expect(attr.name, `${el.tagName} ${attr.name}`).not.toMatch(/^on/i);
        expect(attr.value, `${el.tagName} ${attr.name}`).not.toMatch(/^\s*javascript:/i);
      }
    }
  });

  it('hostile text from the case file shows as the same text on the page', () => {
    const { document } = hostileHtml();
    const text = document.querySelector('main')!.textContent!;
    expect(text).toContain('Hostile <script>alert(1)</script> title [click](javascript:alert(1)) **bold**');
    expect(text).toContain('<img src=x onerror=alert(1)>');
    expect(text).toContain('| pipe | table |');
    expect(text).toContain("<script>document.title='pwned'</script>");
    expect(text).toContain('# not a heading - not a list 1. not a list');
    expect(text).toContain('<a href="javascript:alert(2)" onclick="alert(3)">x</a> &lt;b&gt; &amp; `code` _under_ ~~strike~~');
    expect(document.querySelector('title')!.textContent).toBe("<script>alert('id')</script> Hostile <script>alert(1)</script> title [click](javascript:alert(1)) **bold**");
  });

  it('user text inside a figure stays text in the inline SVG', () => {
    const { document, figures } = hostileHtml();
    const svgText = [...document.querySelectorAll('.figure svg text')].map((t) => t.textContent).join('\n');
    expect(svgText).toContain('<svg onload=alert(5)>');
    expect(document.querySelectorAll('.figure svg')).toHaveLength(figures.length);
    expect(document.querySelectorAll('svg svg, svg foreignObject, svg script')).toHaveLength(0);
  });

  it('photos are embedded as data URIs, also with spaces and brackets in their names, and nothing else is fetched', () => {
    const { document, md } = hostileHtml();
    expect(md).toContain('](../../photos/a%20b%20(1).png)');
    const imgs = [...document.querySelectorAll('img')];
    expect(imgs).toHaveLength(1);
    expect(imgs[0].getAttribute('src')).toBe(PNG_URI);
    expect(imgs[0].getAttribute('alt')).toBe('Photo 1: <img src=x onerror=alert(8)> caption');
  });

  it('an image the page has no data for is shown as text, never fetched', () => {
    const html = renderHtml('![a plan](http://example.invalid/plan.png) ![b](photos/b.heic)', { title: 't', figures: {}, images: { 'photos/b.heic': 'http://example.invalid/x' } });
    expect(html).not.toContain('<img');
    expect(html).toContain('<span class="not-embedded">[a plan: not embedded]</span>');
    expect(html).toContain('<span class="not-embedded">[b: not embedded]</span>');
  });

  it('the page forbids scripts and outside requests in its content security policy', () => {
    const { document } = hostileHtml();
    const csp = document.querySelector('meta[http-equiv="Content-Security-Policy"]')!.getAttribute('content');
    expect(csp).toMatch(/default-src 'none'/);
    expect(csp).toMatch(/img-src data:/);
    expect(csp).not.toMatch(/script-src/);
  });
});
