import type { Results } from '../results/results.ts';
import type { PlasticPieceResult } from '../results/plastic-result.ts';
import type { TwistFinding } from '../results/twist-findings.ts';
import { show, sig } from './display-units.ts';
import { describePlasticPiece } from './piece-span.ts';

export { describePlasticPiece };
import { dynamicPastYieldLines, dynamicVerdictSentence } from './dynamic-past-yield.ts';

type Units = Results['case']['units'];

/** The overall verdict in one sentence, from the plastic balance and the elastic method; `text` escapes user text (labels) for the output format. */
export function overallVerdictSentence(r: Results, text: (s: string) => string = (s) => s): string {
  if (r.pastYieldBasis === 'dynamic model') return dynamicVerdictSentence(r, text);
  const u = r.case.units;
  const p = r.plastic;
  if (r.verdict === 'fracture predicted') {
    const side = p.sides.find((s) => s.verdict === 'fracture predicted')!;
    const first = side.firstToBreak === undefined ? undefined : side.pieces[side.firstToBreak];
    const what = first ? `${describePlasticPiece(first, u, text)} reaches its fracture ${first.brittle ? 'stress' : 'strain'}` : 'a piece reaches its fracture limit';
    return `FRACTURE PREDICTED: side ${side.side}, ${what}; the side can absorb ${show(side.fractureEnergy, 'energy', u)} before the first break and has ${show(side.energy, 'energy', u)}.`;
  }
  if (r.verdict === 'yielded' && p.verdict === 'yielded') {
    const side = p.sides.reduce((a, b) => (b.permanentTwist > a.permanentTwist ? b : a));
    return `YIELDED: the peak torque is capped by plasticity at ${show(p.peakTorque, 'torque', u)}; a permanent twist of ${show(side.permanentTwist, 'angle', u)} is predicted on side ${side.side}; no fracture is predicted.`;
  }
  if (r.verdict === 'yielded') {
    return 'YIELDED (locally): the net section stays elastic, but the stress at a stress raiser passes yield; no measurable permanent twist is predicted.';
  }
  return 'ELASTIC: no yield is predicted.';
}

/**
 * The result past yield for `check`, shown when the elastic yield ratio is at or above 1: the
 * dynamic model's where the verdict stands on it, then the energy balance (for comparison there).
 */
export function plasticLines(r: Results): string[] {
  const u = r.case.units;
  const p = r.plastic;
  const law = r.case.analysis.hardening === 'linear' ? 'linear strain hardening' : 'elastic–perfectly plastic';
  const dynamic = r.pastYieldBasis === 'dynamic model';
  const out: string[] = [
    ...(dynamic ? dynamicPastYieldLines(r) : []),
    '',
    dynamic ? `Past yield by the energy balance, for comparison (${law}; all of each side's energy into its shaft, nothing else acting):` : `Past yield (energy balance, ${law}):`,
  ];
  for (const s of p.sides) {
    const at = s.verdict === 'fracture predicted' ? ' at the break' : '';
    out.push(`  Side ${s.side}  peak torque${at} ${show(s.peakTorque, 'torque', u)}, twist ${show(s.totalTwist, 'angle', u)}, permanent twist ${show(s.permanentTwist, 'angle', u)}, highest shear strain ${sig(s.maxShearStrain)}`);
    for (const piece of s.pieces) {
      if (!piece.yielded && !piece.state.fractured) continue;
      const fs = piece.fractureStrain === undefined ? 'fracture strain unknown' : `fracture at ${sig(piece.fractureStrain)}`;
      out.push(`    ${describePlasticPiece(piece, u)}: permanent ${show(piece.state.permanentTwist, 'angle', u)} (surface offset ${show(piece.surfaceOffset, 'length', u)}, an axial line now at ${show(piece.helixAngle, 'angle', u)}), shear strain ${sig(piece.state.maxShearStrain)} (${fs})${piece.state.fractured ? ' BREAKS' : ''}`);
    }
    out.push(`    energy before the first break ${Number.isFinite(s.fractureEnergy) ? show(s.fractureEnergy, 'energy', u) : 'none can break'}; the side has ${show(s.energy, 'energy', u)}`);
  }
  for (const note of p.brittleNotes) out.push(`  ${note}`);
  out.push('  Assumptions:');
  for (const a of p.assumptions) out.push(`    - ${a}`);
  return out;
}

/** The speed band in words: "420 rpm ± 10 % (default band: the case states no tolerance on speed)". */
export function bandText(f: TwistFinding, u: Units): string {
  if (f.band.basis === 'monte-carlo') {
    const [lo, hi] = f.speedRange;
    return `${show(f.recordedSpeed, 'speed', u, 4)}, judged against the speeds that explain the measured twist over every stated tolerance (5–95 %: ${lo === undefined ? '?' : show(lo, 'speed', u, 4)} to ${hi === undefined ? '?' : show(hi, 'speed', u, 4)})`;
  }
  const half = (f.band.high - f.band.low) / 2;
  const pct = f.recordedSpeed > 0 ? (100 * half) / f.recordedSpeed : 0;
  const spread = f.band.basis === 'default' ? `± ${sig(pct, 2)} % (default band: the case states no tolerance on speed)` : `± ${show(half, 'speed', u)} (stated in the case)`;
  return `${show(f.recordedSpeed, 'speed', u, 4)} ${spread}`;
}

const FINDING_WORDS: Record<TwistFinding['finding'], string> = {
  consistent: 'CONSISTENT with the recorded speed',
  more: 'MORE than the recorded speed explains',
  less: 'LESS than the recorded speed explains',
  no_loaded_shaft: 'NO LOADED SHAFT between these stations',
  unexplained: 'NOT EXPLAINED by any speed',
};

/** One twist finding as lines of text, in the case's units. */
export function twistFindingLines(f: TwistFinding, u: Units): string[] {
  const [a, b] = f.measurement.between;
  const tol = f.angleTolerance > 0 ? ` ± ${show(f.angleTolerance, 'angle', u)}` : '';
  const out = [`  Permanent twist between "${a}" and "${b}": measured ${show(f.measurement.angle, 'angle', u)}${tol}, predicted ${show(f.predicted, 'angle', u)} at the recorded speed.`];
  if (f.speedForMeasured !== undefined) {
    const zero = f.measurement.angle === 0;
    out.push(
      zero
        ? `    No twist means a stop from at most ${show(f.speedForMeasured, 'speed', u, 4)}; recorded ${bandText(f, u)}.`
        : `    The measured twist needs a stop from ${show(f.speedForMeasured, 'speed', u, 4)} (kinetic energy ${show(f.energyForMeasured!, 'energy', u)}); recorded ${bandText(f, u)}.`,
    );
  }
  if (f.curve.length > 0 && !Number.isFinite(f.yieldOnsetSpeed)) {
    out.push('    The shaft between these stations does not yield at any speed: a weaker piece elsewhere in the run yields first and takes the energy.');
  }
  out.push(`    Finding: ${FINDING_WORDS[f.finding]}. ${f.meaning}`);
  if (f.beyondFracture) out.push('    At that speed the model predicts fracture: the measured twist is past the fracture estimate; check the measurement and the fracture strain.');
  return out;
}

/** The read-back of the recorded damage for `check`, shown when the case records observations. */
export function observedLines(r: Results): string[] {
  const u = r.case.units;
  const { twist, fracture } = r.observedFindings;
  if (twist.length === 0 && !fracture) return [];
  const out: string[] = ['', 'Read back from the damage:'];
  for (const f of twist) out.push(...twistFindingLines(f, u));
  if (fracture) {
    const at = fracture.observation.at === undefined ? '' : ` at ${typeof fracture.observation.at === 'number' ? show(fracture.observation.at, 'length', u) : `"${fracture.observation.at}"`}`;
    out.push(`  Fracture: ${fracture.observation.type}${at}. ${fracture.meaning}`);
    out.push(`    ${fracture.agreement === 'agrees' ? 'Agrees' : fracture.agreement === 'disagrees' ? 'Disagrees' : 'Not comparable'}: ${fracture.comparison}`);
    if (fracture.observation.type !== 'none') {
      out.push(`    Source: ${fracture.source}.`);
      out.push(`    ${fracture.caution}`);
    }
  }
  return out;
}
