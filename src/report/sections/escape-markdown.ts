/**
 * Text made safe to put in Markdown as plain words, inline (after "- ", in a table cell or a
 * paragraph): the characters that start emphasis, code, links, images, HTML, strikethrough or a
 * table cell are backslash-escaped, `&` is written as an entity, and line breaks become spaces so
 * a value cannot end a table row or start a block of its own.
 */
export function escapeMarkdown(text: string): string {
  return text
    .replace(/\r?\n|\r/g, ' ')
    .replace(/&/g, '&amp;')
    .replace(/[\\`*_[\]<>|~]/g, (c) => `\\${c}`);
}
