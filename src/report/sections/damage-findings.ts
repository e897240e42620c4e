import type { Results } from '../../results/results.ts';
import type { TwistFinding } from '../../results/twist-findings.ts';
import { show, sig } from '../../views/display-units.ts';
import { bandText, describePlasticPiece, overallVerdictSentence } from '../../views/plastic-lines.ts';
import { escapeMarkdown as esc } from './escape-markdown.ts';

const FINDING_HEAD: Record<TwistFinding['finding'], string> = {
  consistent: 'Consistent with the recorded speed',
  more: 'More than the recorded speed explains',
  less: 'Less than the recorded speed explains',
  no_loaded_shaft: 'No loaded shaft between these stations',
  unexplained: 'Not explained by any speed',
};

/**
 * The "Findings" section of the report, in plain Markdown: the result past yield, each measured
 * permanent twist read back to the stop, the fracture compared with the verdict, and the other
 * observations. User text is escaped; every number comes from `results`.
 */
export function renderFindingsSection(r: Results): string {
  const u = r.case.units;
  const p = r.plastic;
  const out: string[] = ['## Findings', ''];

  out.push('### Past yield', '');
  out.push(`**Verdict: ${overallVerdictSentence(r, esc)}**`, '');
  out.push('| side | energy | peak torque | peak twist | permanent twist | highest shear strain | energy before the first break |');
  out.push('|---|---|---|---|---|---|---|');
  for (const s of p.sides) {
    const fe = Number.isFinite(s.fractureEnergy) ? show(s.fractureEnergy, 'energy', u) : 'none can break';
    out.push(`| ${s.side} | ${show(s.energy, 'energy', u)} | ${show(s.peakTorque, 'torque', u)} | ${show(s.totalTwist, 'angle', u)} | ${show(s.permanentTwist, 'angle', u)} | ${sig(s.maxShearStrain)} | ${fe} |`);
  }
  out.push('');
  for (const s of p.sides) {
    out.push(`Side ${s.side}, piece by piece (net section, no kt; ${s.verdict === 'fracture predicted' ? 'at the break' : 'at the end of the stop'}):`, '');
    out.push('| piece | material | yield torque | fully plastic torque | permanent twist | shear strain | fracture strain |');
    out.push('|---|---|---|---|---|---|---|');
    for (const piece of s.pieces) {
      const tq = (v: number) => (Number.isFinite(v) ? show(v, 'torque', u) : '— (brittle)');
      const fs = piece.fractureStrain === undefined ? 'unknown' : sig(piece.fractureStrain);
      out.push(`| ${describePlasticPiece(piece, u, esc)}${piece.state.fractured ? ' **breaks**' : ''} | ${esc(piece.material)} | ${tq(piece.yieldTorque)} | ${tq(piece.plasticTorque)} | ${show(piece.state.permanentTwist, 'angle', u)} | ${sig(piece.state.maxShearStrain)} | ${fs} |`);
    }
    out.push('');
  }
  for (const note of p.brittleNotes) out.push(`- ${note}`);
  for (const a of p.assumptions) out.push(`- ${a}`);
  out.push('');

  const { twist, fracture } = r.observedFindings;
  if (twist.length > 0) {
    out.push('### Measured permanent twist', '');
    out.push('| between | measured | predicted at the recorded speed | speed that leaves the measured twist | kinetic energy at that speed | finding |');
    out.push('|---|---|---|---|---|---|');
    for (const f of twist) {
      const [a, b] = f.measurement.between.map(esc);
      const tol = f.angleTolerance > 0 ? ` ± ${show(f.angleTolerance, 'angle', u)}` : '';
      const speed = f.speedForMeasured === undefined ? '—' : `${f.measurement.angle === 0 ? 'at most ' : ''}${show(f.speedForMeasured, 'speed', u, 4)}`;
      const energy = f.energyForMeasured === undefined || f.measurement.angle === 0 ? '—' : show(f.energyForMeasured, 'energy', u);
      out.push(`| ${a} – ${b} | ${show(f.measurement.angle, 'angle', u)}${tol} | ${show(f.predicted, 'angle', u)} | ${speed} | ${energy} | ${FINDING_HEAD[f.finding]} |`);
    }
    out.push('');
    for (const f of twist) {
      const [a, b] = f.measurement.between.map(esc);
      out.push(`**${a} – ${b}: ${FINDING_HEAD[f.finding].toLowerCase()}.** Recorded speed ${bandText(f, u)}. ${f.meaning}${f.beyondFracture ? ' At that speed the model predicts fracture: check the measurement and the fracture strain.' : ''}`);
      if (f.measurement.method) out.push('', `Measured by: ${esc(f.measurement.method)}`);
      out.push('');
    }
  }

  if (fracture) {
    const o = fracture.observation;
    out.push('### Fracture', '');
    const at = o.at === undefined ? '' : ` at ${typeof o.at === 'number' ? show(o.at, 'length', u) : esc(o.at)}`;
    out.push(`Observed: **${o.type}**${at}.${o.notes ? ` ${esc(o.notes)}` : ''}`, '');
    out.push(`${fracture.meaning}`, '');
    const word = fracture.agreement === 'agrees' ? 'Agrees with the prediction' : fracture.agreement === 'disagrees' ? 'Disagrees with the prediction' : 'Not comparable with the prediction';
    out.push(`**${word}.** ${fracture.comparison}`, '');
    if (o.type !== 'none') {
      out.push(`Source: ${fracture.source}.`, '');
      out.push(`> ${fracture.caution}`, '');
    }
  }

  const obs = r.case.observed;
  const other = [['Key', obs.key], ['Hub', obs.hub], ['Other', obs.other], ['Notes', obs.notes]].filter((x): x is [string, string] => x[1] !== undefined);
  if (other.length > 0 || obs.photos.length > 0) {
    out.push('### Other observations', '');
    for (const [k, v] of other) out.push(`- ${k}: ${esc(v)}`);
    for (const ph of obs.photos) out.push(`- Photo ${esc(ph.path)}${ph.caption ? `: ${esc(ph.caption)}` : ''}`);
    out.push('');
  }

  out.push('### Cautions', '');
  for (const c of r.cautions) out.push(`- ${c}`);
  return out.join('\n') + '\n';
}
