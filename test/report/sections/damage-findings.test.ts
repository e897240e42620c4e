import MarkdownIt from 'markdown-it';
import { describe, expect, it } from 'vitest';
import { analyseCase } from '../../../src/results/analyse-case.ts';
import { renderFindingsSection } from '../../../src/report/sections/damage-findings.ts';
import { escapeMarkdown } from '../../../src/report/sections/escape-markdown.ts';
import { ep5Case } from '../../data/ep5-case.ts';

const md = new MarkdownIt({ html: true, linkify: true });
const hostile = '<script>alert(1)</script> *bold* [link](http://example.com) | cell `code` _x_ ~~y~~ & more';

describe('renderFindingsSection', () => {
  const r = analyseCase(
    ep5Case({
      observed: [
        'permanent_twist:',
        `  - { between: [seized bearing, disc], angle: 0.5 deg, method: "${hostile}" }`,
        'fracture: { type: fatigue, at: disc, notes: "# not a heading" }',
        `key: "1. not a list"`,
        `hub: "- not a list either"`,
      ],
    }),
  );
  const text = renderFindingsSection(r);
  const html = md.render(text);

  it('has the section and its parts as headings', () => {
    expect(html).toContain('<h2>Findings</h2>');
    for (const h of ['Past yield', 'Measured permanent twist', 'Fracture', 'Other observations', 'Cautions']) expect(html).toContain(`<h3>${h}</h3>`);
  });

  it('states the verdict, the permanent twist table and the kt statement', () => {
    expect(text).toMatch(/\*\*Verdict: YIELDED/);
    expect(html).toMatch(/<table>[\s\S]*permanent twist[\s\S]*<\/table>/);
    expect(text).toMatch(/not applied to the net-section plastic behaviour of ductile material/);
  });

  it('gives the read-back table row with the finding, and the fracture reading with its source and caution', () => {
    expect(text).toMatch(/\| seized bearing – disc \| 0\.5° \|/);
    expect(text).toMatch(/Less than the recorded speed explains/);
    expect(text).toMatch(/ASM Handbook Vol\. 11/);
    expect(html).toMatch(/<blockquote>[\s\S]*qualified failure examiner/);
  });

  it('escapes user text: no HTML, link, emphasis or code from the case file survives, and lines cannot start a block', () => {
    expect(html).not.toMatch(/<script>/);
    expect(html).not.toMatch(/<a /);
    expect(html).not.toMatch(/<em>|<strong>x|<code>|<s>/);
    expect(html).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
    expect(html).not.toMatch(/<h1>/);
    expect(html).toContain('Key: 1. not a list');
    expect(html).toContain('Hub: - not a list either');
  });

  it('ends with the cautions', () => {
    for (const c of r.cautions) expect(text).toContain(c);
  });
});

describe('escapeMarkdown', () => {
  it('renders back to the same plain text, whatever the input (sample of awkward strings)', () => {
    for (const s of ['see http://example.com or a@b.org', 'a*b*c', '[x](y)', '<b>hi</b>', '1. one', '- item', '# head', 'pipe | here', 'back\\slash', 'amp & co', 'line\nbreak', '> quote', '`tick`']) {
      const rendered = md.renderInline(escapeMarkdown(s));
      const plain = rendered.replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&amp;/g, '&');
      expect(plain).toBe(s.replace(/\n/g, ' '));
    }
  });
});
