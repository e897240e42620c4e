import { escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';
import { piecesTable } from '../tables/pieces-table.ts';
import { markdownTable } from '../tables/report-table.ts';
import { sidesTable } from '../tables/sides-table.ts';

/** Energy, torque, twist and stress of each loaded side, then piece by piece. */
export const resultsSection: ReportSection = {
  id: 'results',
  title: 'Results per side',
  render({ results: r }) {
    const sides = r.sides.map((s) => `side ${s.side}`).join(' and ');
    const intro = escapeMarkdown(
      `The parts turn on ${r.sides.length === 1 ? 'one side of the stop' : 'both sides of the stop'} (${sides}). A side's pieces of shaft are in series and all carry its peak torque; their stresses differ with diameter, bore and kt.`,
    );
    return [intro, markdownTable(sidesTable(r)), '**Shaft pieces under load**', markdownTable(piecesTable(r))].join('\n\n');
  },
};
