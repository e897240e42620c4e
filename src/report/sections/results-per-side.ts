import type { Investigation } from '../../finding/investigation.ts';
import { escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';
import { piecesTable } from '../tables/pieces-table.ts';
import { markdownTable } from '../tables/report-table.ts';
import { sidesTable } from '../tables/sides-table.ts';
import { renderDynamicsBody, renderDynamicsSection } from './dynamics.ts';

/** The energy method's numbers: energy, torque, twist and stress of each loaded side, then piece by piece. */
function energyMethodResults(r: Investigation): string {
  const sides = r.sides.map((s) => `side ${s.side}`).join(' and ');
  const intro = escapeMarkdown(
    `The energy method puts all of a side's kinetic energy into its run of shaft at once. The parts turn on ${r.sides.length === 1 ? 'one side of the stop' : 'both sides of the stop'} (${sides}). A side's pieces of shaft are in series and all carry its peak torque; their stresses differ with diameter, bore and kt.`,
  );
  return [intro, markdownTable(sidesTable(r)), '**Shaft pieces under load**', markdownTable(piecesTable(r))].join('\n\n');
}

/** The body's evidence for the finding: the numbers of the model the finding stands on. */
export const resultsSection: ReportSection = {
  id: 'results',
  title: 'Results of the governing model',
  render({ results: r }) {
    return r.finding.basis === 'dynamic model' ? renderDynamicsBody(r) : `${escapeMarkdown(`The finding stands on the energy method. ${r.finding.basisReason}`)}\n\n${energyMethodResults(r)}`;
  },
};

/** The model the finding does not stand on, like for like, in an appendix. */
export const comparisonSection: ReportSection = {
  id: 'comparison',
  title: 'Appendix: the other model, for comparison',
  render({ results: r }) {
    return r.finding.basis === 'dynamic model'
      ? `${escapeMarkdown('The finding stands on the dynamic model; the elastic energy method, the hand method for one mass stopped instantly, is shown here for comparison.')}\n\n${energyMethodResults(r)}`
      : `${escapeMarkdown('The finding stands on the energy method; the dynamic model (the shaft as a chain of inertias and springs, solved in time) is shown here for comparison.')}\n\n${renderDynamicsSection(r)}`;
  },
};
