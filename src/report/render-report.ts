import type { Investigation } from '../finding/investigation.ts';
import { verdictWord } from '../views/finding-words.ts';
import { fillTemplate } from './fill-template.ts';
import type { ReportFigure } from './figures/report-figure.ts';
import { figureHref } from './layout.ts';
import { escapeMarkdown } from './markdown-text.ts';
import { REPORT_SECTIONS } from './registry.ts';
import type { CaseSource, ReportContext, ReportData, ReportSection } from './report-context.ts';
import type { RunInfo } from './run-info.ts';

/** A drawn figure and the id of the section it closes. */
export interface PlacedFigure {
  section: string;
  figure: ReportFigure;
}

export interface ReportInput {
  run: RunInfo;
  source: CaseSource;
  figures: readonly PlacedFigure[];
  /** The template's text and its file name (for error messages). */
  template: { text: string; file: string };
  /** The sections, in order; the registry's by default. */
  sections?: readonly ReportSection[];
}

/** The template fields: case metadata (escaped user text), the run, the finding's verdict word. */
export function templateFields(r: Investigation, run: RunInfo, source: CaseSource): Record<string, string> {
  const m = r.case.meta;
  const text = (v: string | undefined) => (v === undefined || v.trim() === '' ? 'not given' : escapeMarkdown(v));
  return {
    'case.id': text(m.id),
    'case.title': text(m.title),
    'case.occurred': text(m.occurred?.replace('T', ' ')),
    'case.site': text(m.site),
    'case.machine': text(m.machine),
    'case.ticket': text(m.ticket),
    'case.investigator': text(m.investigator),
    'case.file': text(source.file),
    'case.sha256': source.sha256,
    'run.date': run.date,
    'run.time': run.time,
    'run.iso': run.iso,
    'run.version': escapeMarkdown(run.version),
    verdict: verdictWord(r.finding),
  };
}

/** A figure as Markdown: the SVG file as an image, its title and caption as the alternative text. */
export function figureMarkdown(f: ReportFigure, number: number): string {
  return `![${escapeMarkdown(`Figure ${number}: ${f.title}. ${f.caption}`)}](${figureHref(f.name)})`;
}

/**
 * The report as Markdown: every section rendered from what the report shows (the results and
 * what goes back in, computed before), figures placed at the end of their sections and numbered
 * in order, all set into the template. Pure: the run's date and the figures are given.
 */
export function renderReport(data: ReportData, input: ReportInput): string {
  const { results } = data;
  const ctx: ReportContext = { ...data, run: input.run, source: input.source };
  let number = 0;
  const all = input.sections ?? REPORT_SECTIONS;
  const sections = all.flatMap((s) => {
    const body = s.render(ctx);
    if (body === undefined) return [];
    const figures = input.figures.filter((f) => f.section === s.id).map((f) => figureMarkdown(f.figure, ++number));
    return [{ id: s.id, markdown: [`## ${s.title}`, body, ...figures].join('\n\n') }];
  });
  return fillTemplate(input.template.text, input.template.file, {
    fields: templateFields(results, input.run, input.source),
    sections,
    knownSections: all.map((s) => s.id),
  });
}
