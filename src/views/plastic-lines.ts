import type { Results } from '../results/results.ts';
import type { TwistFinding } from '../results/twist-findings.ts';
import { ANGLE_RESOLUTION, show, sig } from './display-units.ts';
import { describePlasticPiece } from './piece-span.ts';

export { describePlasticPiece };

type Units = Results['case']['units'];

/**
 * The energy balance past yield for `check`: per side the capped peak torque, the twist and the
 * permanent twist, and each piece that yields or breaks. `role` heads it as the finding's model
 * past yield or as a comparison.
 */
export function plasticLines(r: Results, role: string): string[] {
  const u = r.case.units;
  const p = r.plastic;
  const law = r.case.analysis.hardening === 'linear' ? 'linear strain hardening' : 'elastic–perfectly plastic';
  const out: string[] = ['', `Past yield by the energy balance (${role}; ${law}; all of each side's energy into its shaft, nothing else acting):`];
  for (const s of p.sides) {
    const at = s.verdict === 'fracture predicted' ? ' at the break' : '';
    const left = s.verdict === 'fracture predicted' ? 'broken: no permanent twist to measure' : `permanent twist ${show(s.permanentTwist, 'angle', u)}`;
    out.push(`  Side ${s.side}  peak torque${at} ${show(s.peakTorque, 'torque', u)}, twist ${show(s.totalTwist, 'angle', u)}, ${left}, highest shear strain ${sig(s.maxShearStrain)}`);
    for (const piece of s.pieces) {
      // A piece that only grazes yield (a permanent twist no instrument resolves) is not listed.
      if (!piece.state.fractured && !(piece.yielded && piece.state.permanentTwist >= ANGLE_RESOLUTION)) continue;
      const fs = piece.fractureStrain === undefined ? 'fracture strain unknown' : `fracture at ${sig(piece.fractureStrain)}`;
      out.push(
        piece.state.fractured
          ? `    ${describePlasticPiece(piece, u)}: BREAKS, shear strain ${sig(piece.state.maxShearStrain)} (${fs})`
          : `    ${describePlasticPiece(piece, u)}: permanent ${show(piece.state.permanentTwist, 'angle', u)} (surface offset ${show(piece.surfaceOffset, 'length', u)}, an axial line now at ${show(piece.helixAngle, 'angle', u)}), shear strain ${sig(piece.state.maxShearStrain)} (${fs})`,
      );
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
  if (f.loadedShaft && !Number.isFinite(f.yieldOnsetSpeed)) {
    out.push('    The shaft between these stations does not yield at any speed: a weaker piece elsewhere in the run yields first and takes the energy.');
  }
  out.push(`    Read-back: ${FINDING_WORDS[f.finding]}. ${f.meaning}`);
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
