import fc from 'fast-check';
import MarkdownIt from 'markdown-it';
import { describe, expect, it } from 'vitest';
import { escapeMarkdown } from '../../../src/report/sections/escape-markdown.ts';

// markdown-it (a general-purpose Markdown library) is the reference: escaped text must render as
// exactly the original characters, HTML-escaped, with line breaks as spaces.
const md = new MarkdownIt();
const plain = (s: string) => md.utils.escapeHtml(s.replace(/\r?\n|\r/g, ' '));

describe('escapeMarkdown', () => {
  it('renders emphasis, code, links, HTML and table bars as the characters themselves', () => {
    for (const s of ['*bold* _it_', '`code`', '[link](http://x)', '<b>&amp;</b>', 'a | b', '~~gone~~', 'back\\slash', '![img](x.png)']) {
      expect(md.renderInline(escapeMarkdown(s))).toBe(plain(s));
    }
  });

  it('keeps any text as it is when rendered inline (property)', () => {
    fc.assert(
      fc.property(fc.string({ unit: fc.constantFrom(...'ab *_`[]()<>&|~!\\#-+.:/;"\'\n'.split('')), maxLength: 40 }), (s) => {
        const t = s.replace(/\r?\n|\r/g, ' ');
        if (t !== t.trim() || /  /.test(t)) return true; // markdown-it trims and may fold spaces at ends of inline text
        return md.renderInline(escapeMarkdown(s)) === plain(s);
      }),
      { numRuns: 500 },
    );
  });

  it('cannot end a table cell or a line', () => {
    const cell = `| ${escapeMarkdown('pulley | key\nnext')} |`;
    const html = md.render(`| a |\n| --- |\n${cell}\n`);
    expect(html).toMatch(/<td>pulley \| key next<\/td>/);
  });
});
