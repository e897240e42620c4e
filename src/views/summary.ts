import type { PieceResult } from '../physics/energy-method.ts';
import { isBrittle } from '../physics/fracture.ts';
import type { ElasticVerdict, Results } from '../results/results.ts';
import { show, sig } from './display-units.ts';
import { renderUncertaintyLines } from './uncertainty-summary.ts';
import { observedLines, overallVerdictSentence, plasticLines } from './plastic-lines.ts';
import { showSlipAngle } from './slip-angle.ts';

/** The dynamic model beside the energy method: a few lines per side, the lowest frequencies, what slipped. */
export function dynamicLines(r: Results): string[] {
  const d = r.dynamic;
  const u = r.case.units;
  const out = [`Dynamic model (torsional chain, ${d.elements} shaft element${d.elements === 1 ? '' : 's'}, ${sig(d.duration * 1000)} ms from the stop)`];
  for (const s of d.sides) {
    const elastic = Math.max(0, ...d.pieces.filter((p) => p.side === s.side).map((p) => p.elasticPeakTorque));
    const capped = elastic > s.dynamicPeakTorque * (1 + 1e-6) ? `, ${show(elastic, 'torque', u)} had it stayed elastic` : '';
    out.push(
      `  side ${s.side}  peak torque ${show(s.dynamicPeakTorque, 'torque', u)}${capped} (energy method ${show(s.energyPeakTorque, 'torque', u)}), elastic yield ratio ${sig(s.dynamicYieldRatio)} (${sig(s.energyYieldRatio)})`,
    );
  }
  out.push(`  natural frequencies with the stop held: ${d.naturalFrequencies.slice(0, 3).map((f) => sig(f)).join(', ')} Hz`);
  for (const s of d.slips) {
    const what = s.firstSlip === undefined ? 'did not slip' : `slipped ${showSlipAngle(s.angle, u)} and took ${show(s.energy, 'energy', u)}${s.slippingAtEnd ? ', still slipping at the end' : ''}`;
    out.push(`  ${s.element} (slip torque ${show(s.slipTorque, 'torque', u)}) ${what}`);
  }
  for (const p of d.pins) {
    out.push(`  ${p.element} (${show(p.shearTorque, 'torque', u)}) ${p.partedAt === undefined ? 'held' : `parted at ${sig(p.partedAt * 1000)} ms`}`);
  }
  if (d.yielded) {
    const worst = d.pieces.reduce((b, p) => (p.permanentTwist > b.permanentTwist ? p : b), d.pieces[0]);
    // A piece that broke keeps no measurable twist; name the twist only where one is left.
    const twist = worst.permanentTwist > 0 ? `permanent twist ${showSlipAngle(worst.permanentTwist, u)} in ${describePiece(worst, u)}, ` : '';
    out.push(`  past yield in time: ${twist}plastic work ${show(d.plasticWork, 'energy', u)}`);
  }
  for (const p of d.pieces.filter((x) => x.broken)) {
    out.push(`  breaks in time: ${describePiece(p, u)} at ${sig((p.breakTime ?? 0) * 1000)} ms`);
  }
  return out;
}

/**
 * The elastic check's verdict in plain words, one sentence: by the energy method, or with
 * `basis: true` by the verdict's basis (the dynamic model where the case needs it).
 */
export function verdictSentence(r: Results, basis = false): string {
  const g = basis ? r.verdictGoverning : r.governing;
  const where = describePiece(g.piece, r.case.units);
  const ratio = sig(g.piece.yieldRatio, 3);
  // Brittle material (gray iron) has no yield point: its limit is its strength, and past it the
  // shaft cracks rather than twists.
  const brittle = isBrittle(r.case.materials[g.piece.piece.segment.material]);
  const words: Record<ElasticVerdict, string> = {
    elastic: `ELASTIC: the highest stress is ${ratio} of shear ${brittle ? 'strength' : 'yield'} (side ${g.side.side}, ${where}); no ${brittle ? 'fracture' : 'yield'} is predicted.`,
    yielded: brittle
      ? `OVER ITS STRENGTH: the elastic stress reaches ${ratio} × the shear limit of a brittle material (side ${g.side.side}, ${where}); it cracks or breaks rather than taking a permanent twist.`
      : `YIELDED: the elastic stress reaches ${ratio} × shear yield (side ${g.side.side}, ${where}); the shaft may have taken a permanent twist.`,
  };
  return words[g.piece.yieldRatio < 1 ? 'elastic' : 'yielded'];
}

/** "segment 2 "journal", 120–300 mm, Ø50 mm" */
export function describePiece(p: Pick<PieceResult, 'piece'>, units: Results['case']['units']): string {
  const seg = p.piece.segment;
  const name = seg.label ? `"${seg.label}"` : `segment ${seg.index + 1}`;
  const dia = `Ø${show(seg.diameter, 'length', units)}${seg.bore > 0 ? ` bore ${show(seg.bore, 'length', units)}` : ''}`;
  return `${name} at ${show(p.piece.start, 'length', units)} to ${show(p.piece.end, 'length', units)}, ${dia}`;
}

/** The compact terminal summary of `shaftcase check`, in the case's units. */
export function renderSummary(r: Results): string {
  const u = r.case.units;
  const m = r.case.meta;
  const out: string[] = [];
  out.push(`${m.id}${m.title ? `  ${m.title}` : ''}`);
  out.push(
    `Speed at the stop ${show(r.speed, 'speed', u, 4)}; stopped at "${r.case.stop.at}"; shear yield by ${r.case.analysis.criterion === 'max-shear' ? 'maximum shear (0.5·Sy)' : 'distortion energy (Sy/√3 ≈ 0.577·Sy)'}.`,
  );
  for (const s of r.sides) {
    const worst = s.pieces.reduce((a, b) => (b.yieldRatio > a.yieldRatio ? b : a));
    out.push('');
    out.push(`Side ${s.side}  (${s.stations.join(', ')})`);
    out.push(`  kinetic energy   ${show(s.kineticEnergy, 'energy', u)}`);
    out.push(`  peak torque      ${show(s.peakTorque, 'torque', u)}`);
    out.push(`  twist            ${show(s.twist, 'angle', u)}`);
    out.push(`  most stressed    ${describePiece(worst, u)}${worst.piece.segment.kt !== 1 ? `, kt ${worst.piece.segment.kt}` : ''}`);
    out.push(`  stress           ${show(worst.shearStress, 'stress', u)} against shear yield ${show(worst.shearYield, 'stress', u)} (ratio ${sig(worst.yieldRatio)})`);
  }
  const sure = renderUncertaintyLines(r);
  if (sure.length > 0) out.push('', ...sure);
  out.push('');
  out.push(...dynamicLines(r));
  out.push('');
  out.push(`Verdict (${r.verdictBasis === 'dynamic model' ? 'dynamic model' : 'elastic energy method'}): ${verdictSentence(r, true)}`);
  out.push(`  ${r.verdictReason}`);
  if (r.verdictYieldRatio >= 1 || r.yieldRatio >= 1 || r.verdict !== r.elasticVerdict) {
    out.push(...plasticLines(r));
    out.push('');
    out.push(`Verdict: ${overallVerdictSentence(r)}`);
  }
  out.push(...observedLines(r));
  if (r.warnings.length > 0) {
    out.push('');
    out.push('Warnings:');
    for (const w of r.warnings) out.push(`  - ${w}`);
  }
  out.push('');
  out.push('Cautions:');
  for (const c of r.cautions) out.push(`  - ${c}`);
  return out.join('\n') + '\n';
}
