import fc from 'fast-check';
import MarkdownIt from 'markdown-it';
import { describe, expect, it } from 'vitest';
import { codeBlock, escapeMarkdown, escapeParagraphs } from '../../src/report/markdown-text.ts';

const md = new MarkdownIt({ html: false, linkify: false, typographer: false });

/** The text a reader sees: tags dropped, the five entities markdown-it writes decoded. */
function visibleText(html: string): string {
  return html
    .replace(/<[^>]*>/g, '')
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&amp;/g, '&')
    .trim();
}

// Printable ASCII and a few non-ASCII letters and symbols (every Markdown special character is
// ASCII), and strings built from the tokens Markdown gives meaning to, which random characters
// rarely line up into.
const TOKENS = [
  '---',
  '- ',
  '+ ',
  '* ',
  '1. ',
  '2) ',
  '# ',
  '> ',
  '===',
  '**',
  '__',
  '_',
  '*',
  '[',
  '](',
  ')',
  '![',
  '<',
  '>',
  '`',
  '```',
  '|',
  '~~',
  '&amp;',
  '&#60;',
  '&copy;',
  '\\',
  'a',
  'b1',
  ' ',
  '\n',
  '\n\n',
  'http://x.y',
  '<http://x.y>',
  '<b>',
  '</p>',
  'é',
];
const userText = fc.oneof(
  fc.string({ unit: fc.constantFrom(...' \n\t!"#$%&\'()*+,-./0123456789:;<=>?@AZaz[\\]^_`{|}~éØ°·'.split('')), maxLength: 40 }),
  fc.array(fc.constantFrom(...TOKENS), { maxLength: 8 }).map((t) => t.join('')),
);

describe('escapeMarkdown', () => {
  it('escapeMarkdown(text) renders as exactly the text, white space collapsed, for any text', () => {
    fc.assert(
      fc.property(userText, (text) => {
        const expected = text.replace(/\s+/g, ' ').trim();
        const html = md.render(escapeMarkdown(text));
        expect(visibleText(html)).toBe(expected);
        // One paragraph of text and nothing else: no link, image, emphasis, code, heading, list or quote.
        if (expected !== '') expect(html).toMatch(/^<p>[^<]*<\/p>\n$/);
      }),
      { numRuns: 3000 },
    );
  });

  it('escapeMarkdown keeps a table cell one cell whatever the text holds', () => {
    fc.assert(
      fc.property(userText, (text) => {
        const html = md.render(`| a | b |\n| --- | --- |\n| ${escapeMarkdown(text) || '—'} | x |`);
        expect(html.match(/<td>/g)).toHaveLength(2);
      }),
      { numRuns: 1000 },
    );
  });

  it('escapeMarkdown leaves ordinary words, units and intraword underscores readable', () => {
    expect(escapeMarkdown('Shaft Ø55 mm, 1.5 in & J_p, shaftcase 0.1.0')).toBe('Shaft Ø55 mm, 1.5 in & J_p, shaftcase 0.1.0');
  });

  it('escapeMarkdown escapes HTML, links and images so they stay text', () => {
    expect(escapeMarkdown('<script>x</script> [a](b) ![c](d)')).toBe('\\<script>x\\</script> \\[a\\](b) !\\[c\\](d)');
  });
});

describe('escapeParagraphs', () => {
  it('escapeParagraphs keeps paragraphs apart and escapes each', () => {
    expect(escapeParagraphs('# one\n\n- two\nthree')).toBe('\\# one\n\n\\- two three');
  });
});

describe('codeBlock', () => {
  it('codeBlock shows text with backtick fences inside it verbatim, as one code block', () => {
    const text = 'a: 1\n```\n<script>x</script>\n````\nb: 2\n';
    const html = md.render(codeBlock(text, 'yaml'));
    expect(html.match(/<pre>/g)).toHaveLength(1);
    expect(visibleText(html)).toBe(text.trim());
  });
});
