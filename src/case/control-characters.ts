import type { CaseErrorCode, CaseProblem } from './case-error.ts';

/**
 * Control characters no case file needs and a terminal or a report must never receive raw: C0
 * controls but tab, newline and carriage return (NUL, ESC, …), DEL, C1 controls, and the
 * bidirectional embeddings, overrides and isolates (U+202A–U+202E, U+2066–U+2069), which can make
 * a line read otherwise than it is. A case file is refused when it holds any, anywhere (values,
 * keys, comments: the file itself is copied into the report's appendix), and so is a report
 * template; so no raw control character of the user's reaches a terminal, report.md or report.html.
 */
const CONTROL = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F\u202A-\u202E\u2066-\u2069]/g;

/** Where the file holds a control character: one problem per line that holds any, at most 20. */
export function controlCharacters(text: string, code: CaseErrorCode, what: string): CaseProblem[] {
  const problems: CaseProblem[] = [];
  let lastLine = 0;
  for (const m of text.matchAll(CONTROL)) {
    const before = text.slice(0, m.index);
    const line = before.split('\n').length;
    if (line === lastLine) continue;
    lastLine = line;
    const hex = m[0].codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0');
    problems.push({
      code,
      path: '',
      message: `holds the control character U+${hex}, which ${what} may not hold; remove it (tabs and line breaks are fine)`,
      position: { line, column: m.index! - before.lastIndexOf('\n') },
    });
    if (problems.length >= 20) break;
  }
  return problems;
}
