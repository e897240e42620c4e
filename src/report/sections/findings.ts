import type { Results } from '../../results/results.ts';
import type { TwistFinding } from '../../results/twist-findings.ts';
import { show, sig } from '../../views/display-units.ts';
import { describeDynamicPiece, dynamicLawWords, mostTwisted } from '../../views/dynamic-past-yield.ts';
import { bandText } from '../../views/plastic-lines.ts';
import { describePiece } from '../../views/summary.ts';
import { elasticDynamicPeak, whyTheModelsDiffer } from '../../views/model-comparison.ts';
import type { Investigation } from '../../finding/investigation.ts';
import { bulletList, escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';
import { dynamicDamageTable } from '../tables/dynamic-damage-table.ts';
import { plasticPiecesTable } from '../tables/plastic-pieces-table.ts';
import { plasticSidesTable } from '../tables/plastic-sides-table.ts';
import { markdownTable } from '../tables/report-table.ts';

/** A measured twist's reading against the recorded speed, as a heading. */
export const TWIST_HEAD: Record<TwistFinding['finding'], string> = {
  consistent: 'Consistent with the recorded speed',
  more: 'More than the recorded speed explains',
  less: 'Less than the recorded speed explains',
  no_loaded_shaft: 'No loaded shaft between these stations',
  unexplained: 'Not explained by any speed',
};

/**
 * What the numbers establish: the overall verdict, the elastic method's, the result past yield,
 * each measured permanent twist read back to the stop and the fracture compared with the
 * prediction. Every number comes from the results; all text is escaped whole (it holds the case's
 * names). The observations themselves are in their own section, the cautions in theirs.
 */
export const findingsSection: ReportSection = {
  id: 'findings',
  title: 'Findings',
  render({ results: r }) {
    return [verdicts(r), pastYield(r), ...twistReadBack(r), ...fractureReading(r)].join('\n\n');
  },
};

/** How the finding stands: its model's numbers, then the other model's as a comparison, like for like. No verdict of its own: the summary states it. */
function verdicts(r: Investigation): string {
  const u = r.case.units;
  const f = r.finding;
  const items = [
    `The finding (page 1) stands on the ${f.basis}; past yield on the ${f.pastYieldModel}.`,
    ...(f.basis === 'dynamic model'
      ? r.dynamic.sides.map(
          (s) =>
            `Dynamic model, side ${s.side}: peak torque as carried ${show(s.dynamicPeakTorque, 'torque', u)}; elastic peak ${show(elasticDynamicPeak(r.dynamic, s.side), 'torque', u)}, stress / shear yield ${sig(s.dynamicYieldRatio)}.`,
        )
      : []),
    ...r.sides.map((s) => {
      const worst = s.pieces.reduce((a, b) => (b.yieldRatio > a.yieldRatio ? b : a));
      const role = f.basis === 'energy method' ? 'Energy method' : 'For comparison, the energy method';
      return `${role}, side ${s.side} (${s.stations.join(', ')}): elastic peak torque ${show(s.peakTorque, 'torque', u)}; the most stressed piece on this side is ${describePiece(worst, u)} at ${show(worst.shearStress, 'stress', u)}, stress / shear yield ${sig(worst.yieldRatio)}.`;
    }),
    whyTheModelsDiffer(r),
    ...(r.pastYieldBasis === 'dynamic model' && r.dynamic.yielded
      ? [
          `Past yield in time, the dynamic model caps the torque in ${describeDynamicPiece(mostTwisted(r), u)} at ${show(mostTwisted(r).peakTorque, 'torque', u)} and leaves a permanent twist of ${show(mostTwisted(r).permanentTwist, 'angle', u)} there.`,
        ]
      : []),
    ...(r.plastic.verdict === 'elastic'
      ? []
      : [
          `Past yield${r.pastYieldBasis === 'dynamic model' ? ', for comparison,' : ','} the energy balance caps the peak torque at ${show(r.plastic.peakTorque, 'torque', u)}${r.plastic.verdict === 'fracture predicted' ? ' (at the break)' : ''}: the torque every key, hub and coupling between the stop and the loaded stations had to carry.`,
        ]),
    r.warnings.length > 0
      ? `The engine raised ${r.warnings.length} warning${r.warnings.length === 1 ? '' : 's'} about the model's fit to this case (listed under the method); weigh the numbers with them.`
      : "The engine raised no warning about the model's fit to this case.",
  ];
  return bulletList(items.map(escapeMarkdown));
}

function pastYield(r: Results): string {
  const p = r.plastic;
  const law = r.case.analysis.hardening === 'linear' ? 'linear strain hardening' : 'elastic–perfectly plastic';
  const out = ['### Past yield'];
  if (r.pastYieldBasis === 'dynamic model') {
    const inTime = dynamicDamageTable(r);
    out.push(
      escapeMarkdown(
        r.plastic.sides.some((s) => s.pieces.some((x) => x.brittle))
          ? `The verdict past yield stands on the dynamic model (${dynamicLawWords(r)}), with the slip, the drive and the stop followed in time.`
          : `The verdict past yield stands on the dynamic model: its shaft elements yield as the net section does (${law}, no kt, Masing's rule on reversals) and break at their fracture strain, with the slip, the drive and the stop followed in time.`,
      ),
      inTime ? markdownTable(inTime) : escapeMarkdown('In the dynamic model no piece of shaft passes yield over its net section.'),
      escapeMarkdown("For comparison, the energy balance past yield puts all of each side's kinetic energy into its run of shaft with nothing else acting:"),
    );
  } else {
    out.push(escapeMarkdown(`The energy balance past yield (${law}, net section, no kt): each side's kinetic energy is taken up by its run of shaft with the torque capped by plasticity.`));
  }
  out.push(markdownTable(plasticSidesTable(r)));
  const pieces = plasticPiecesTable(r);
  if (!pieces) {
    out.push(escapeMarkdown('No piece of shaft passes yield over its net section: no permanent twist is predicted.'));
  } else {
    const atBreak = p.sides.some((s) => s.verdict === 'fracture predicted');
    out.push(`**${escapeMarkdown(`The pieces that went past yield${atBreak ? ' (at the break, where fracture is predicted)' : ''}`)}**`, markdownTable(pieces));
    out.push(
      escapeMarkdown(
        "The permanent twist shows on the shaft as the surface offset between a piece's ends and the helix angle an originally axial line (keyway wall, grinding mark, paint line) now makes.",
      ),
    );
  }
  if (p.brittleNotes.length > 0) out.push(bulletList(p.brittleNotes.map(escapeMarkdown)));
  return out.join('\n\n');
}

function twistReadBack(r: Results): string[] {
  const u = r.case.units;
  const { twist } = r.observedFindings;
  if (twist.length === 0) return [];
  const head = '| between | measured | predicted at the recorded speed | speed that leaves the measured twist | kinetic energy at that speed | finding |\n| :--- | ---: | ---: | ---: | ---: | :--- |';
  const rows = twist.map((f) => {
    const tol = f.angleTolerance > 0 ? ` ± ${show(f.angleTolerance, 'angle', u)}` : '';
    const speed = f.speedForMeasured === undefined ? '—' : `${f.measurement.angle === 0 ? 'at most ' : ''}${show(f.speedForMeasured, 'speed', u, 4)}`;
    const energy = f.energyForMeasured === undefined || f.measurement.angle === 0 ? '—' : show(f.energyForMeasured, 'energy', u);
    const cells = [f.measurement.between.join(' – '), `${show(f.measurement.angle, 'angle', u)}${tol}`, show(f.predicted, 'angle', u), speed, energy, TWIST_HEAD[f.finding]];
    return `| ${cells.map(escapeMarkdown).join(' | ')} |`;
  });
  const words = twist.map((f) => {
    const [a, b] = f.measurement.between;
    const shielded =
      f.loadedShaft && !Number.isFinite(f.yieldOnsetSpeed)
        ? ' The shaft between these stations does not yield at any speed: a weaker piece elsewhere in the run yields first and takes the energy.'
        : '';
    const fracture = f.beyondFracture ? ' At that speed the model predicts fracture: check the measurement and the fracture strain.' : '';
    const text = `**${escapeMarkdown(`${a} – ${b}: ${TWIST_HEAD[f.finding].toLowerCase()}.`)}** ${escapeMarkdown(`Recorded speed ${bandText(f, u)}.${shielded} ${f.meaning}${fracture}`)}`;
    return f.measurement.method ? `${text}\n\n${escapeMarkdown(`Measured by: ${f.measurement.method}`)}` : text;
  });
  return ['### Measured permanent twist, read back to the stop', `${head}\n${rows.join('\n')}`, ...words];
}

function fractureReading(r: Results): string[] {
  const u = r.case.units;
  const f = r.observedFindings.fracture;
  if (!f) return [];
  const o = f.observation;
  const at = o.at === undefined ? '' : ` at ${typeof o.at === 'number' ? show(o.at, 'length', u) : `"${o.at}"`}`;
  const word = f.agreement === 'agrees' ? 'Agrees with the prediction' : f.agreement === 'disagrees' ? 'Disagrees with the prediction' : 'Not comparable with the prediction';
  const out = [
    '### Fracture',
    `Observed: **${escapeMarkdown(`${o.type}${at}`)}**.${o.notes ? ` ${escapeMarkdown(o.notes)}` : ''}`,
    escapeMarkdown(f.meaning),
    `**${word}.** ${escapeMarkdown(f.comparison)}`,
  ];
  if (o.type !== 'none') out.push(escapeMarkdown(`Source: ${f.source}.`), `> ${escapeMarkdown(f.caution)}`);
  return out;
}
