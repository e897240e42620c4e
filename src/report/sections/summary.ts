import type { Investigation } from '../../finding/investigation.ts';
import type { FindingAction } from '../../finding/finding.ts';
import type { ResizeResult } from '../../resize/resize-result.ts';
import { show } from '../../views/display-units.ts';
import { chanceSentence, findingSentence } from '../../views/finding-words.ts';
import { recommendedRemedy } from '../../views/remedy-words.ts';
import { noPickSentence } from '../../views/resize-words.ts';
import { linkTo } from '../anchor.ts';
import { escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';
import { beforeRunningItems, inspectionItems, SIGN_OFF_ROWS } from './checklists.ts';
import { findingsSection, TWIST_HEAD } from './findings.ts';
import { howSureSection } from './how-sure.ts';
import { machineSection } from './machine.ts';
import { observationsSection } from './observations.ts';
import { recommendationsSection } from './recommendations.ts';
import { resultsSection } from './results-per-side.ts';

/** The disposition as the person who signs reads it. */
const ACTION_WORDS: Record<FindingAction, string> = {
  'return to service': 'RETURN TO SERVICE after the checks below',
  'inspect before return': 'INSPECT BEFORE RETURN',
  replace: 'REPLACE THE SHAFT',
};

const e = escapeMarkdown;
const box = '☐';

/**
 * The first page: the incident finding for the person who signs. What happened, the one finding
 * (rendered by finding-words, never re-derived), what was observed against the model, the
 * disposition, the recommended remedy with its key figure and why, then the inspection at the
 * critical location and what must be done before the machine runs again, with sign-off lines.
 * Each part links to the section that supports it.
 */
export const summarySection: ReportSection = {
  id: 'summary',
  title: 'Incident finding',
  render({ results: r, resize }) {
    const f = r.finding;
    const u = r.case.units;
    const chance = chanceSentence(f);
    const finding = [
      `> **Finding: ${e(findingSentence(f, u))}** (${linkTo(resultsSection.title, 'the evidence')})`,
      ...(chance ? [`> ${e(chance)} (${linkTo(howSureSection.title, 'how sure')})`] : []),
    ].join('\n>\n');
    const out = [`**What happened.** ${e(whatHappened(r))}`, finding];
    const observed = observedLines(r);
    if (observed.length > 0)
      out.push(
        `**Observed, against the model** (${linkTo(findingsSection.title, 'the read-back')}, ${linkTo(observationsSection.title, 'the observations')}):\n\n${observed.map((l) => `- ${l}`).join('\n')}`,
      );
    out.push(`**Disposition: ${ACTION_WORDS[f.action]}.** ${e(f.disposition)}`);
    out.push(remedyParagraph(resize));
    const where = r.finding.piece.segment.label ? `"${r.finding.piece.segment.label}"` : `segment ${r.finding.piece.segment.index + 1}`;
    out.push(
      `### ${e(`Inspect at the critical location: ${where}, side ${f.side}`)} (${linkTo(machineSection.title, 'the machine')})`,
      inspectionItems(r)
        .map((i) => `- ${box} ${e(i)}`)
        .join('\n'),
      `### Before it runs again (${linkTo(recommendationsSection.title, 'guarding and restart')})`,
      beforeRunningItems(r)
        .map((i) => `- ${box} ${e(i)}`)
        .join('\n'),
      signOff(r),
    );
    return out.join('\n\n');
  },
};

/** One sentence: when, what stopped where, how fast, and the energy that went into the shaft. */
function whatHappened(r: Investigation): string {
  const m = r.case.meta;
  const u = r.case.units;
  const machine = m.machine ?? 'the machine';
  const when = m.occurred ? `On ${m.occurred.replace('T', ' ')} ` : '';
  const subject = when ? machine : machine[0].toUpperCase() + machine.slice(1);
  const energy = r.sides.map((s) => `${show(s.kineticEnergy, 'energy', u)} on side ${s.side} (${s.stations.join(', ')})`).join(' and ');
  return `${when}${subject} stopped suddenly at "${r.case.stop.at}" while the shaft turned at ${show(r.speed, 'speed', u, 4)}; the parts carried ${energy} of kinetic energy into the shaft.`;
}

/** Each measured twist and the fracture against the model, one line each, and what else was recorded. */
function observedLines(r: Investigation): string[] {
  const u = r.case.units;
  const f = r.finding;
  const lines = f.measured.map((m) => {
    const speed = m.speedForMeasured === undefined ? '' : m.finding === 'consistent' ? '' : `; a stop from ${show(m.speedForMeasured, 'speed', u, 4)} would leave it`;
    return e(
      `Permanent twist ${m.between.join(' – ')}: measured ${show(m.measured, 'angle', u)}, the model gives ${show(m.predicted, 'angle', u)} at the recorded ${show(r.speed, 'speed', u, 4)}: ${TWIST_HEAD[m.finding].toLowerCase()}${speed}.`,
    );
  });
  const fr = r.observedFindings.fracture;
  if (fr) {
    const word = fr.agreement === 'agrees' ? 'agrees with the model' : fr.agreement === 'disagrees' ? 'DISAGREES with the model' : 'cannot be compared with the model';
    lines.push(e(`Fracture: ${fr.observation.type === 'none' ? 'none found' : fr.observation.type}; ${word}.`));
  }
  const o = r.case.observed;
  const recorded = [
    ['key', o.key],
    ['hub', o.hub],
  ]
    .filter(([, v]) => v?.trim())
    .map(([label, v]) => `${label}: ${v!.trim()}`);
  if (recorded.length > 0) lines.push(e(`Recorded: ${recorded.join('; ')}.`));
  return lines;
}

/** The recommended remedy with its key figure and why that one. */
function remedyParagraph(z: ResizeResult): string {
  const remedy = recommendedRemedy(z);
  const link = linkTo(recommendationsSection.title, 'what goes back in');
  if (!remedy) return `**Recommended remedy:** ${e(noPickSentence(z))} (${link}).`;
  return `**Recommended remedy:** ${e(`${remedy.action}.`)} ${e(`Key figure: ${remedy.figure}. Why this one: ${remedy.why.replace(/\.$/, '')}.`)} (${link})`;
}

/** Sign-off lines in plain words, the investigator's name on the first. */
function signOff(r: Investigation): string {
  const who = r.case.meta.investigator?.trim() ? e(r.case.meta.investigator) : '';
  return ['| | Name | Signature | Date |', '| :--- | :--- | :--- | :--- |', `| Report prepared by | ${who} | | |`, ...SIGN_OFF_ROWS.map((row) => `| ${row} | | | |`)].join('\n');
}
