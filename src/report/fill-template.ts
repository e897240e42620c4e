import { CaseError, type CaseProblem } from '../case/case-error.ts';
import { controlCharacters } from '../case/control-characters.ts';

/**
 * The report template's syntax (templates/report.md; a site passes its own with --template):
 *
 * - `{{sections}}`: every report section the template does not place by name, in the report's order;
 * - `{{section:ID}}`: one section (summary, incident, machine, method, results, material,
 *   observations, findings, recommendations, cautions, sources, appendix, and any added later);
 * - `{{NAME}}`: a field such as `case.id` or `run.date` (see `TEMPLATE_FIELDS`);
 * - `{{! any text }}`: a comment, dropped (a line holding only a comment is dropped whole).
 *
 * The cautions are part of every report: a template that places neither them nor `{{sections}}`
 * gets them appended at the end.
 */
export interface TemplateInput {
  /** Field values, already safe as Markdown text. */
  fields: Record<string, string>;
  /** Rendered sections (heading included), in the report's order. */
  sections: { id: string; markdown: string }[];
  /** Ids of every section the report knows, including those left out for this case; default: the rendered ones. */
  knownSections?: string[];
}

/** Sections a report always carries, whatever the template says. */
const ALWAYS = ['cautions'];
const TOKEN = /\{\{(!?)([\s\S]*?)\}\}/g;

/** Fills a report template. Pure; `file` only names the template in error messages. */
export function fillTemplate(template: string, file: string, input: TemplateInput): string {
  const problems: CaseProblem[] = controlCharacters(template, 'E_TEMPLATE', 'a report template');
  if (problems.length > 0) throw new CaseError(file, problems);
  const ids = input.knownSections ?? input.sections.map((s) => s.id);
  const tokens = [...template.matchAll(TOKEN)].map((m) => ({ index: m.index!, raw: m[0], comment: m[1] === '!', name: m[2].trim() }));
  const placed = new Set(tokens.filter((t) => !t.comment && t.name.startsWith('section:')).map((t) => t.name.slice('section:'.length).trim()));
  const hasAll = tokens.some((t) => !t.comment && t.name === 'sections');

  let out = '';
  let last = 0;
  for (const t of tokens) {
    let text = template.slice(last, t.index);
    checkStray(text, last, template, problems);
    last = t.index + t.raw.length;
    if (t.raw.indexOf('{{', 2) >= 0) {
      // "{{! note" or "{{case.id" left open runs on to the next placeholder's "}}" and would swallow it.
      const what = t.comment ? 'a comment "{{!"' : 'a "{{"';
      problems.push(problem(template, t.index, `${what} without its closing "}}" before the next "{{"; close it with "}}"`));
      continue;
    }
    if (t.comment) {
      // A line that holds only a comment goes away whole, newline included.
      const before = /[^\n]*$/.exec(out + text)![0];
      const after = /^[^\n]*(\n|$)/.exec(template.slice(last))![0];
      if (before.trim() === '' && after.trim() === '') {
        text = text.replace(/[ \t]*$/, '');
        last += after.length;
      }
      out += text;
    } else {
      out += text + fill(t.name, t.index);
    }
  }
  const tail = template.slice(last);
  checkStray(tail, last, template, problems);
  out += tail;
  if (problems.length > 0) throw new CaseError(file, problems);

  const missing = ALWAYS.filter((id) => !hasAll && !placed.has(id) && ids.includes(id));
  for (const id of missing) out += `\n\n${input.sections.find((s) => s.id === id)!.markdown}`;
  return out.replace(/\n{3,}/g, '\n\n').replace(/\s*$/, '\n');

  function fill(name: string, index: number): string {
    if (name === 'sections')
      return input.sections
        .filter((s) => !placed.has(s.id))
        .map((s) => s.markdown)
        .join('\n\n');
    if (name.startsWith('section:')) {
      const id = name.slice('section:'.length).trim();
      const s = input.sections.find((x) => x.id === id);
      if (s) return s.markdown;
      if (!ids.includes(id)) problems.push(problem(template, index, `unknown section "${id}"; give one of ${ids.join(', ')}`));
      return '';
    }
    if (Object.hasOwn(input.fields, name)) return input.fields[name]; // own keys only: {{constructor}} is no field
    problems.push(problem(template, index, `unknown placeholder {{${name}}}; give {{sections}}, {{section:ID}} or a field: ${Object.keys(input.fields).join(', ')}`));
    return '';
  }
}

function checkStray(text: string, offset: number, template: string, problems: CaseProblem[]): void {
  const i = text.indexOf('{{');
  if (i >= 0) problems.push(problem(template, offset + i, 'a "{{" without its closing "}}"; close the placeholder, or write the braces apart'));
}

function problem(template: string, index: number, message: string): CaseProblem {
  const before = template.slice(0, index);
  const line = before.split('\n').length;
  const column = index - before.lastIndexOf('\n');
  return { code: 'E_TEMPLATE', path: '', message, position: { line, column } };
}
