import { escapeMarkdown, escapeParagraphs } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';

const NOT_GIVEN = '*not given*';

/** Who, what, when and where, as the case file states it. */
export const incidentSection: ReportSection = {
  id: 'incident',
  title: 'The incident',
  render({ results: r }) {
    const m = r.case.meta;
    const field = (v: string | undefined) => (v === undefined || v.trim() === '' ? NOT_GIVEN : escapeMarkdown(v));
    const rows: [string, string | undefined][] = [
      ['Incident', m.id],
      ['Title', m.title],
      ['When', m.occurred?.replace('T', ' ')],
      ['Where', m.site],
      ['Machine', m.machine],
      ['Ticket', m.ticket],
      ['Investigator', m.investigator],
    ];
    const table = ['| | as the case file gives it |', '| :--- | :--- |', ...rows.map(([k, v]) => `| ${k} | ${field(v)} |`)].join('\n');
    const notes = m.notes?.trim() ? `**Notes from the case file:**\n\n${escapeParagraphs(m.notes)}` : 'The case file gives no notes.';
    return `${table}\n\n${notes}`;
  },
};
