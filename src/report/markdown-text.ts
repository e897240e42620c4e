// Markdown built by the program around user text. Everything the case file supplies (titles, names,
// notes, captions) goes through `escapeMarkdown` so it reads as the same text after rendering and
// can never become a link, an image, emphasis, a table cell break or HTML.

/**
 * Characters CommonMark (and markdown-it's table and strikethrough rules) can turn into markup
 * anywhere in a line: backslash, code, emphasis, link and image brackets, autolinks and HTML, table
 * pipes, strikethrough. CommonMark 0.31 Sec. 2.4: any ASCII punctuation may be backslash-escaped,
 * and an escaped character is always literal. Left alone, to keep the Markdown readable: `_`
 * between two letters or digits (it can neither open nor close emphasis there, Sec. 6.2) and `&`
 * that does not start an entity reference (`&amp;`, `&#60;`).
 */
const INLINE_SPECIAL = /[\\`*[\]<|~]|(?<![\p{L}\p{N}])_|_(?![\p{L}\p{N}])|&(?=#?[A-Za-z0-9]+;)/gu;
/**
 * Line starts that open a block: an ATX heading, a quote, a bullet or ordered list item, a
 * thematic break of dashes, a setext underline of equals signs (CommonMark Sec. 4.1–4.3, 5.1–5.2).
 */
const BLOCK_START = /^(?:#{1,6}(?=\s|$)|>|[-+](?=\s|$)|-[-\s]*$|=[=\s]*$|\d{1,9}[.)](?=\s|$))/;

/**
 * User text as one line of literal Markdown text: runs of white space (newlines included) become
 * one space, and every character that could become markup is escaped.
 */
export function escapeMarkdown(text: string): string {
  const line = text.replace(/\s+/g, ' ').trim().replace(INLINE_SPECIAL, '\\$&');
  return line.replace(BLOCK_START, (m) => (/^\d/.test(m) ? m.replace(/[.)]$/, '\\$&') : `\\${m}`));
}

/** User text that may hold paragraphs (separated by blank lines): each paragraph escaped. */
export function escapeParagraphs(text: string): string {
  return text
    .split(/\n\s*\n/)
    .map(escapeMarkdown)
    .filter((p) => p !== '')
    .join('\n\n');
}

/** A fenced code block whose fence no backtick run in `text` can close. Code is never Markdown. */
export function codeBlock(text: string, info = ''): string {
  const longest = Math.max(0, ...[...text.matchAll(/`+/g)].map((m) => m[0].length));
  const fence = '`'.repeat(Math.max(3, longest + 1));
  return `${fence}${info}\n${text.replace(/\n$/, '')}\n${fence}`;
}

/** A bulleted list, one escaped item a line. */
export function bulletList(items: readonly string[]): string {
  return items.map((i) => `- ${i}`).join('\n');
}
