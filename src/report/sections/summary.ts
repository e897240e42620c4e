import type { Results } from '../../results/results.ts';
import { show, sig } from '../../views/display-units.ts';
import { describePiece, verdictSentence } from '../../views/summary.ts';
import { escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';

/** The verdict in plain words for someone who will not read further. */
export function verdictInPlainWords(r: Results): string {
  const where = describePiece(r.governing.piece, r.case.units);
  if (r.verdict === 'yielded') {
    return `The shaft cannot have stayed elastic: the calculated stress is ${sig(r.yieldRatio)} times what its material takes before it yields, so expect a permanent twist, or worse, in ${where}. Inspect it before anything goes back into service.`;
  }
  return `The shaft can have stayed elastic: the highest calculated stress is ${sig(100 * r.yieldRatio)} % of what its material takes before it yields. The method puts all the energy into the shaft, so it leans to the high side; keys, hubs and couplings still need their own inspection.`;
}

/** One paragraph: what stopped, how fast, the energy, the torque, the stress; then the verdict. */
export const summarySection: ReportSection = {
  id: 'summary',
  title: 'Summary',
  render({ results: r }) {
    const u = r.case.units;
    const m = r.case.meta;
    const when = m.occurred ? `On ${m.occurred.replace('T', ' ')}, ` : '';
    const machine = m.machine ?? 'the machine';
    const opening = `${when}${when ? machine : machine[0].toUpperCase() + machine.slice(1)} stopped suddenly at "${r.case.stop.at}" while the shaft turned at ${show(r.speed, 'speed', u, 4)}.`;
    const sides = r.sides.map(
      (s) =>
        `On side ${s.side} (${s.stations.join(', ')}) the parts carried ${show(s.kineticEnergy, 'energy', u)} of kinetic energy into the shaft; by the elastic energy method this gives a peak torque of ${show(s.peakTorque, 'torque', u)} and a twist of ${show(s.twist, 'angle', u)}.`,
    );
    const g = r.governing.piece;
    const material = r.case.materials[g.piece.segment.material].name;
    const critical = `The most critical piece is ${describePiece(g, u)}: its stress of ${show(g.shearStress, 'stress', u)} against a shear yield of ${show(g.shearYield, 'stress', u)} (${material}) is ${sig(r.yieldRatio)} × yield.`;
    const warned = r.warnings.length > 0 ? ` The model carries ${r.warnings.length} warning${r.warnings.length === 1 ? '' : 's'} about its fit to this case (see the method).` : '';
    const paragraph = escapeMarkdown([opening, ...sides, critical].join(' ')) + warned;
    const verdict = `> **Verdict (elastic energy method):** ${escapeMarkdown(verdictSentence(r))}\n>\n> ${escapeMarkdown(verdictInPlainWords(r))}`;
    return `${paragraph}\n\n${verdict}`;
  },
};
