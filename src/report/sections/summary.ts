import type { Investigation } from '../../finding/investigation.ts';
import { show, sig } from '../../views/display-units.ts';
import { chanceSentence, findingSentence, ratioName } from '../../views/finding-words.ts';
import { escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';

/** The finding first (one verdict line, what to do, how sure), then one paragraph on what happened, in the finding's model's numbers. */
export const summarySection: ReportSection = {
  id: 'summary',
  title: 'Summary',
  render({ results: r }) {
    const f = r.finding;
    const u = r.case.units;
    const chance = chanceSentence(f);
    const verdict = [
      `> **Finding: ${escapeMarkdown(findingSentence(f, u))}**`,
      `> **What to do:** ${escapeMarkdown(f.disposition)}`,
      ...(chance ? [`> ${escapeMarkdown(chance)}`] : []),
      `> ${escapeMarkdown(`Why this model: ${f.basisReason}`)}`,
    ].join('\n>\n');
    return `${verdict}\n\n${whatHappened(r)}`;
  },
};

/** What stopped, how fast, the energy, and the finding's model's torque and stress; the energy method's figures only as a comparison. */
function whatHappened(r: Investigation): string {
  const u = r.case.units;
  const m = r.case.meta;
  const f = r.finding;
  const when = m.occurred ? `On ${m.occurred.replace('T', ' ')}, ` : '';
  const machine = m.machine ?? 'the machine';
  const opening = `${when}${when ? machine : machine[0].toUpperCase() + machine.slice(1)} stopped suddenly at "${r.case.stop.at}" while the shaft turned at ${show(r.speed, 'speed', u, 4)}.`;
  const energy = r.sides.map((s) => `On side ${s.side} (${s.stations.join(', ')}) the parts carried ${show(s.kineticEnergy, 'energy', u)} of kinetic energy into the shaft.`);
  const material = r.case.materials[f.piece.segment.material].name;
  const numbers = `By the ${f.basis}, the governing piece carried a peak torque of ${show(f.peakTorque, 'torque', u)}${f.peakTorque < f.elasticPeakTorque * (1 - 1e-6) ? ` (capped past yield; ${show(f.elasticPeakTorque, 'torque', u)} had it stayed elastic)` : ''}; had it stayed elastic its stress would be ${show(f.elasticStress, 'stress', u)} against a shear ${f.brittle ? 'strength' : 'yield'} of ${show(f.shearYield, 'stress', u)} (${material}): ${ratioName(f)} ${sig(f.yieldRatio)}.`;
  const comparison =
    f.basis === 'dynamic model'
      ? `For comparison, the energy method (all of a side's energy into its shaft at once, nothing else acting) gives an elastic peak torque of ${r.sides.map((s) => `${show(s.peakTorque, 'torque', u)} on side ${s.side}`).join(' and ')}; the finding does not stand on it (see Findings).`
      : '';
  const warned = r.warnings.length > 0 ? ` The model carries ${r.warnings.length} warning${r.warnings.length === 1 ? '' : 's'} about its fit to this case (see the method).` : '';
  return escapeMarkdown([opening, ...energy, numbers, comparison].filter((x) => x).join(' ')) + warned;
}

