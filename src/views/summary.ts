import type { PieceResult } from '../physics/energy-method.ts';
import type { ElasticVerdict, Results } from '../results/results.ts';
import { show, sig } from './display-units.ts';
import { renderUncertaintyLines } from './uncertainty-summary.ts';
import { observedLines, overallVerdictSentence, plasticLines } from './plastic-lines.ts';

/** The elastic energy method's verdict in plain words, one sentence. */
export function verdictSentence(r: Results): string {
  const where = describePiece(r.governing.piece, r.case.units);
  const ratio = sig(r.yieldRatio, 3);
  const words: Record<ElasticVerdict, string> = {
    elastic: `ELASTIC: the highest stress is ${ratio} of shear yield (side ${r.governing.side.side}, ${where}); no yield is predicted.`,
    yielded: `YIELDED: the elastic stress reaches ${ratio} × shear yield (side ${r.governing.side.side}, ${where}); the shaft may have taken a permanent twist.`,
  };
  return words[r.elasticVerdict];
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
    `Speed at the stop ${show(r.speed, 'speed', u, 4)}; stopped at "${r.case.stop.at}"; shear yield by ${r.case.analysis.criterion === 'max-shear' ? 'maximum shear (0.5·Sy)' : 'distortion energy (0.577·Sy)'}.`,
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
  out.push(`Verdict (elastic energy method): ${verdictSentence(r)}`);
  if (r.yieldRatio >= 1 || r.verdict !== r.elasticVerdict) {
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
