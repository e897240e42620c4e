// Where a link on the report's first page lands: the heading it names, by the same rule in the
// Markdown (GitHub and most viewers give each heading this id) and in report.html (renderHtml sets it).

/**
 * A heading's anchor: lower case, punctuation dropped, spaces to hyphens ("Results of the
 * governing model" → "results-of-the-governing-model"), as GitHub's Markdown gives it.
 */
export function anchorOf(heading: string): string {
  return heading
    .trim()
    .toLowerCase()
    .replace(/[^\p{L}\p{N}\s_-]/gu, '')
    .replace(/\s/g, '-');
}

/** A Markdown link to a heading of the report, with the link text given (already safe Markdown). */
export function linkTo(heading: string, text: string): string {
  return `[${text}](#${anchorOf(heading)})`;
}
