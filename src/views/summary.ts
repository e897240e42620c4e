import { assetHistorySentences, FATIGUE_CAUTIONS, fatigueSentence } from './fatigue-words.ts';
import type { PieceResult } from '../physics/energy-method.ts';
import type { Investigation } from '../finding/investigation.ts';
import type { Results } from '../results/results.ts';
import { findingLines } from './finding-words.ts';
import { dampingSentence, ringingWords } from './damping-words.ts';
import { dynamicPastYieldLines } from './dynamic-past-yield.ts';
import { elasticDynamicPeak, whyTheModelsDiffer } from './model-comparison.ts';
import { show, sig } from './display-units.ts';
import { renderUncertaintyLines } from './uncertainty-summary.ts';
import { observedLines, plasticLines } from './plastic-lines.ts';
import { showSlipAngle } from './slip-angle.ts';
import { backstopSentences, couplingSentences, gearboxSentences, hubSentences } from './hub-lines.ts';
import { driveTrainRows, hasDriveTrain } from './drive-train-table.ts';
import { textTable } from './text-table.ts';

/**
 * The dynamic model's numbers: per side the peak torque as carried (capped past yield) and, like for
 * like with the energy method, the elastic peak and its stress over shear yield; the lowest
 * frequencies; what slipped or parted. `role` says whether it is the finding's model or a comparison.
 */
/**
 * ' in "bearing journal"': where along a side the largest torque as carried was. Past yield it is
 * often not the governing piece, which is capped at its fully plastic torque while a stouter
 * neighbour, with shaft inertia between them, carries more.
 */
function carriedWhere(d: Results['dynamic'], side: string): string {
  const mine = d.pieces.filter((p) => p.side === side);
  if (mine.length < 2) return '';
  const top = mine.reduce((a, b) => (b.peakTorque > a.peakTorque ? b : a));
  const seg = top.piece.segment;
  return ` in ${seg.label ? `"${seg.label}"` : `segment ${seg.index + 1}`}`;
}

export function dynamicLines(r: Results, role: string): string[] {
  const d = r.dynamic;
  const u = r.case.units;
  const out = [`Dynamic model (${role}: torsional chain, ${d.elements} shaft element${d.elements === 1 ? '' : 's'}, ${sig(d.duration * 1000)} ms from the stop):`];
  for (const s of d.sides) {
    const elastic = elasticDynamicPeak(d, s.side);
    const capped = elastic > s.dynamicPeakTorque * (1 + 1e-6);
    out.push(
      capped
        ? `  side ${s.side}  peak torque as carried ${show(s.dynamicPeakTorque, 'torque', u)}${carriedWhere(d, s.side)} (past yield a piece carries at most its fully plastic torque); elastic ${show(elastic, 'torque', u)}, stress / shear yield ${sig(s.dynamicYieldRatio)}`
        : `  side ${s.side}  peak torque ${show(s.dynamicPeakTorque, 'torque', u)} (elastic), stress / shear yield ${sig(s.dynamicYieldRatio)}`,
    );
  }
  const modes = d.frequencies.slice(0, 3);
  const rough = modes.some((m) => !m.converged) ? ' (* not resolved by this element count: low by more than 1 %)' : '';
  out.push(`  natural frequencies with the stop held: ${modes.map((m) => `${sig(m.frequency)}${m.converged ? '' : '*'} Hz (side ${m.side})`).join(', ')}${rough}`);
  for (const s of d.slips) {
    const what = s.firstSlip === undefined ? 'did not slip' : `slipped ${showSlipAngle(s.angle, u)} and took ${show(s.energy, 'energy', u)}${s.slippingAtEnd ? ', still slipping at the end' : ''}`;
    out.push(`  ${s.element} (slip torque ${show(s.slipTorque, 'torque', u)}) ${what}`);
  }
  for (const g of d.gaps) {
    out.push(
      `  backlash of ${show(g.gap, 'angle', u)} in ${g.segment.label ? `"${g.segment.label}"` : `segment ${g.segment.index + 1}`}: closed ${g.contacts} time${g.contacts === 1 ? '' : 's'} (taken fully open at the stop where no running torque held it closed)`,
    );
  }
  for (const p of d.protection) {
    const limit = p.torqueLimit === undefined ? '' : `held to ${show(p.torqueLimit, 'torque', u)} at the motor`;
    const trip = p.tripAfter === undefined ? '' : p.trippedAt === undefined ? `set to trip at ${sig(p.tripAfter * 1000)} ms, after the window` : `tripped at ${sig(p.trippedAt * 1000)} ms`;
    out.push(`  drive at "${p.station}" ${[limit, trip].filter(Boolean).join(', ')}`);
  }
  for (const p of d.pins) {
    out.push(`  ${p.element} (${show(p.shearTorque, 'torque', u)}) ${p.partedAt === undefined ? 'held' : `parted at ${sig(p.partedAt * 1000)} ms`}`);
  }
  for (const line of [dampingSentence(r), ringingWords(r)]) if (line) out.push(`  ${line}`);
  return out;
}

/** "segment 2 "journal", 120–300 mm, Ø50 mm" */
export function describePiece(p: Pick<PieceResult, 'piece'>, units: Results['case']['units']): string {
  const seg = p.piece.segment;
  const name = seg.label ? `"${seg.label}"` : `segment ${seg.index + 1}`;
  const dia = `Ø${show(seg.diameter, 'length', units)}${seg.bore > 0 ? ` bore ${show(seg.bore, 'length', units)}` : ''}`;
  return `${name} at ${show(p.piece.start, 'length', units)} to ${show(p.piece.end, 'length', units)}, ${dia}`;
}

/** The energy method's numbers per side: the hand method for one mass stopped instantly. */
export function energyMethodLines(r: Results): string[] {
  const u = r.case.units;
  const out: string[] = [];
  for (const s of r.sides) {
    const worst = s.pieces.reduce((a, b) => (b.yieldRatio > a.yieldRatio ? b : a));
    out.push(`  Side ${s.side}  (${s.stations.join(', ')})`);
    out.push(`    kinetic energy   ${show(s.kineticEnergy, 'energy', u)}`);
    out.push(`    peak torque      ${show(s.peakTorque, 'torque', u)} (elastic)`);
    out.push(`    twist            ${show(s.twist, 'angle', u)}`);
    out.push(`    most stressed    ${describePiece(worst, u)}${worst.piece.segment.kt !== 1 ? `, kt ${worst.piece.segment.kt}` : ''}`);
    out.push(`    stress           ${show(worst.shearStress, 'stress', u)} against shear yield ${show(worst.shearYield, 'stress', u)} (stress / shear yield ${sig(worst.yieldRatio)})`);
  }
  return out;
}

/** The compact terminal summary of `shaftcase check`, in the case's units: the finding first, its model's numbers, then the other model for comparison. */
export function renderSummary(r: Investigation): string {
  const u = r.case.units;
  const m = r.case.meta;
  const f = r.finding;
  const out: string[] = [];
  out.push(`${m.id}${m.title ? `  ${m.title}` : ''}`);
  out.push(
    `Speed at the stop ${show(r.speed, 'speed', u, 4)}; stopped at "${r.case.stop.at}"; shear yield by ${r.case.analysis.criterion === 'max-shear' ? 'maximum shear (0.5·Sy)' : 'distortion energy (Sy/√3 ≈ 0.577·Sy)'}.`,
  );
  out.push('', ...findingLines(f, u));
  const pastYield = r.verdictYieldRatio >= 1 || r.yieldRatio >= 1 || r.verdict !== 'elastic';
  out.push('');
  if (f.basis === 'dynamic model') {
    out.push(...dynamicLines(r, "the finding's model"));
    if (pastYield && f.pastYieldModel === 'dynamic model') out.push(...dynamicPastYieldLines(r));
    if (pastYield && f.pastYieldModel === 'energy balance') out.push(...plasticLines(r, "the finding's model past yield"));
  } else {
    out.push("Energy method (the finding's model: all of a side's kinetic energy into its shaft at once):");
    out.push(...energyMethodLines(r));
    if (pastYield) out.push(...plasticLines(r, "the finding's model past yield"));
  }
  const hubs = hubSentences(r);
  if (hubs.length > 0) out.push('', 'Keys and hub fits at the incident torque:', ...hubs.map((h) => `  - ${h}`));
  const couplings = couplingSentences(r);
  if (couplings.length > 0) out.push('', 'Couplings at the incident torque:', ...couplings.map((h) => `  - ${h}`));
  const gears = [...gearboxSentences(r), ...backstopSentences(r)];
  if (gears.length > 0) out.push('', 'Gearboxes and backstops at the incident torque:', ...gears.map((h) => `  - ${h}`));
  if (hasDriveTrain(f)) {
    out.push('', 'What gave way first (the drive train, weakest first; torques at shaft speed):');
    out.push(...textTable([['order', 'element', 'capacity', 'torque', 'ratio', 'gives way when it'], ...driveTrainRows(f, u)]).map((l) => `  ${l}`));
  }
  const sure = renderUncertaintyLines(r);
  if (sure.length > 0) out.push('', ...sure);
  out.push(...observedLines(r));
  out.push('', fatigueSentence(f.fatigue));
  if (r.assetHistory) out.push(...assetHistorySentences(r.assetHistory).map((l) => `  ${l}`));
  out.push(...FATIGUE_CAUTIONS.map((c) => `  ${c}`));
  out.push('', ...comparisonLines(r, pastYield));
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

/** The model the finding does not stand on, headed as a comparison, with one sentence on why they differ. */
function comparisonLines(r: Investigation, pastYield: boolean): string[] {
  if (r.finding.basis === 'dynamic model') {
    const out = ['For comparison, the energy method (one mass stopped instantly, nothing else acting):', `  ${whyTheModelsDiffer(r)}`, ...energyMethodLines(r)];
    if (pastYield && r.finding.pastYieldModel === 'dynamic model') out.push(...plasticLines(r, 'for comparison'));
    return out;
  }
  return [...dynamicLines(r, 'for comparison'), `  ${whyTheModelsDiffer(r)}`];
}
