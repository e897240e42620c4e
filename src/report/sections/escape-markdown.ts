/**
 * User text (case notes, labels, station names) made safe to put in Markdown as plain text: the
 * characters that can open emphasis, code, links, images, inline HTML, table cells or
 * strikethrough anywhere in a line get a backslash (CommonMark 0.31, Sec. 2.4: any ASCII
 * punctuation may be escaped); so do `:`, `@` and a `.` before a letter, which a renderer with
 * linkify on would otherwise turn into links (http://…, name@host, example.com); the characters
 * that only matter at the start of a line (list, heading, quote, numbered list) are escaped
 * there; `&` becomes an entity; line breaks become spaces so the text cannot open a block or end
 * a table row.
 */
export function escapeMarkdown(text: string): string {
  return text
    .replace(/\r\n?|\n/g, ' ')
    .replace(/&/g, '&amp;')
    .replace(/[\\`*_{}[\]()!|<>~:@]/g, (c) => `\\${c}`)
    .replace(/\.(?=[A-Za-z])/g, '\\.')
    .replace(/^(\s*)([-+#=])/, '$1\\$2')
    .replace(/^(\s*\d+)([.)])/, '$1\\$2');
}
