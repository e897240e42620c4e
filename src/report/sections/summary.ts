import type { Results } from '../../results/results.ts';
import { show, sig } from '../../views/display-units.ts';
import { describeDynamicPiece, mostTwisted } from '../../views/dynamic-past-yield.ts';
import { firstBrokenPiece } from '../../results/dynamic-result.ts';
import { describePlasticPiece, overallVerdictSentence } from '../../views/plastic-lines.ts';
import { describePiece, verdictSentence } from '../../views/summary.ts';
import { chanceOfYieldWords } from '../../views/uncertainty-summary.ts';
import { escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';

/** The overall verdict (`Results.verdict`) in plain words for someone who will not read further. */
export function verdictInPlainWords(r: Results): string {
  const u = r.case.units;
  const p = r.plastic;
  const inspect = 'Inspect it, and every key, hub and coupling between the stop and the loaded parts, before anything goes back into service.';
  if (r.pastYieldBasis === 'dynamic model' && (r.dynamic.fractured || r.dynamic.yielded)) {
    const broke = firstBrokenPiece(r.dynamic);
    if (r.verdict === 'fracture predicted' && broke) {
      return `The shaft is predicted to break: in the dynamic model ${describeDynamicPiece(broke, u)} reaches its fracture limit ${sig((broke.breakTime ?? 0) * 1000)} ms after the stop began. ${inspect}`;
    }
    const most = mostTwisted(r);
    const total = r.dynamic.pieces.reduce((sum, x) => sum + x.permanentTwist, 0);
    return `The shaft cannot have stayed elastic: the calculated elastic stress is ${sig(r.verdictYieldRatio)} times what its material takes before it yields. Past yield the torque in ${describeDynamicPiece(most, u)} is capped at ${show(most.peakTorque, 'torque', u)}, and the shaft is left with a permanent twist of ${show(total, 'angle', u)}, most of it there; no fracture is predicted. ${inspect}`;
  }
  if (r.verdict === 'fracture predicted') {
    const side = p.sides.find((s) => s.verdict === 'fracture predicted')!;
    const first = side.firstToBreak === undefined ? undefined : side.pieces[side.firstToBreak];
    const what = first ? `${describePlasticPiece(first, u)} reaches its fracture ${first.brittle ? 'stress' : 'strain'}` : 'its first piece breaks';
    return `The shaft is predicted to break: side ${side.side} had ${show(side.energy, 'energy', u)} of kinetic energy to take, and it can absorb only ${show(side.fractureEnergy, 'energy', u)} before ${what}. ${inspect}`;
  }
  if (r.verdict === 'yielded' && p.verdict === 'yielded') {
    const side = p.sides.reduce((a, b) => (b.permanentTwist > a.permanentTwist ? b : a));
    const ms = p.sides.find((s) => s.side === p.mostStrained.side)!.pieces[p.mostStrained.index];
    return `The shaft cannot have stayed elastic: the calculated elastic stress is ${sig(r.verdictYieldRatio)} times what its material takes before it yields. Past yield the torque is capped at ${show(p.peakTorque, 'torque', u)}, and the shaft is left with a permanent twist of ${show(side.permanentTwist, 'angle', u)} on side ${side.side}, most of it in ${describePlasticPiece(ms, u)}; no fracture is predicted. ${inspect}`;
  }
  if (r.verdict === 'yielded') {
    return `The net section of the shaft can have stayed elastic, but the calculated stress at the stress raiser (kt) of ${describePiece(r.verdictGoverning.piece, u)} is ${sig(r.verdictYieldRatio)} times its shear yield: expect local yielding there, with no measurable permanent twist. ${inspect}`;
  }
  const lean =
    r.verdictBasis === 'dynamic model'
      ? 'by the dynamic model, which follows the stop, the drive and any slip in time'
      : 'by the energy method, which puts all the energy into the shaft and so leans to the high side';
  return `The shaft can have stayed elastic: the highest calculated stress is ${sig(100 * r.verdictYieldRatio)} % of what its material takes before it yields, ${lean}; keys, hubs and couplings still need their own inspection.`;
}

/** One paragraph: what stopped, how fast, the energy, the torque, the stress; then the overall verdict. */
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
    const dynamic =
      r.verdictBasis === 'dynamic model'
        ? `${r.verdictReason} It gives a peak yield ratio of ${sig(r.verdictYieldRatio)} in ${describePiece(r.verdictGoverning.piece, u)} (see After the stop: the torsional chain in time).`
        : '';
    const paragraph = escapeMarkdown([opening, ...sides, critical, dynamic].filter((x) => x).join(' ')) + warned;
    const chance = r.uncertainty ? chanceOfYieldWords(r.uncertainty) : '';
    const sure = r.uncertainty ? ` Over the case's tolerances (see How sure the finding is), ${chance[0].toLowerCase()}${chance.slice(1)}.` : '';
    const verdict = [
      `> **Verdict: ${escapeMarkdown(overallVerdictSentence(r))}**`,
      `> ${escapeMarkdown(verdictInPlainWords(r) + sure)}`,
      `> ${escapeMarkdown(`Elastic energy method: ${verdictSentence(r)}`)}`,
      ...(r.verdictBasis === 'dynamic model' ? [`> ${escapeMarkdown(`Dynamic model: ${verdictSentence(r, true)}`)}`] : []),
    ].join('\n>\n');
    return `${paragraph}\n\n${verdict}`;
  },
};
