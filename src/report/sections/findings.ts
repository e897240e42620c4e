import { show } from '../../views/display-units.ts';
import { describePiece, verdictSentence } from '../../views/summary.ts';
import { bulletList, escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';

/** What the numbers establish, one finding a line. */
export const findingsSection: ReportSection = {
  id: 'findings',
  title: 'Findings',
  render({ results: r }) {
    const u = r.case.units;
    const items = [
      `Verdict of the elastic energy method: ${verdictSentence(r)}`,
      ...r.sides.map((s) => {
        const worst = s.pieces.reduce((a, b) => (b.yieldRatio > a.yieldRatio ? b : a));
        return `Side ${s.side} (${s.stations.join(', ')}): peak torque ${show(s.peakTorque, 'torque', u)}, which every key, hub and coupling between the stop and these stations had to carry; the most stressed piece on this side is ${describePiece(worst, u)} at ${show(worst.shearStress, 'stress', u)}.`;
      }),
      r.warnings.length > 0
        ? `The engine raised ${r.warnings.length} warning${r.warnings.length === 1 ? '' : 's'} about the model's fit to this case (listed under the method); weigh the numbers with them.`
        : 'The engine raised no warning about the model\'s fit to this case.',
    ];
    return bulletList(items.map(escapeMarkdown));
  },
};
