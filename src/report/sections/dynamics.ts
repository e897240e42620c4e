import type { Results } from '../../results/results.ts';
import type { DynamicResult } from '../../results/dynamic-result.ts';
import { show, sig } from '../../views/display-units.ts';
import { dampingSentence, ringingWords } from '../../views/damping-words.ts';
import { showSlipAngle } from '../../views/slip-angle.ts';
import { escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';

const MAX_EVENTS = 12;

/**
 * The report's dynamics section in Markdown: the verdict's basis, energy method against dynamic
 * model per side, peak torque along the shaft, what slipped or parted (with a belt's capstan
 * working), the natural frequencies with a note on what a vibration reading after repair might
 * show, the located events, and the model's assumptions. Every number comes from `Results`.
 */
export function renderDynamicsSection(r: Results): string {
  return `${renderDynamicsBody(r)}\n${renderDynamicsDetails(r)}`;
}

/** The dynamic model's evidence for the finding: its chain, energy method against it per side, peak torque along the shaft, what slipped. */
export function renderDynamicsBody(r: Results): string {
  const d = r.dynamic;
  const u = r.case.units;
  const out: string[] = [];
  out.push(
    `The shaft is modelled as a chain of ${d.elements} shaft element${d.elements === 1 ? '' : 's'} between lumped inertias and solved in time over ${sig(d.duration * 1000)} ms from the start of the stop. ${r.verdictReason}`,
    '',
  );

  out.push('### Energy method against dynamic model', '');
  out.push('| side | stations | peak torque, energy method (elastic) | peak torque as carried, dynamic model | stress / shear yield, energy method | stress / shear yield, dynamic model |');
  out.push('|---|---|---|---|---|---|');
  for (const s of d.sides) {
    const stations =
      r.sides
        .find((x) => x.side === s.side)
        ?.stations.map(escapeMarkdown)
        .join(', ') ?? '';
    out.push(`| ${s.side} | ${stations} | ${show(s.energyPeakTorque, 'torque', u)} | ${show(s.dynamicPeakTorque, 'torque', u)} | ${sig(s.energyYieldRatio)} | ${sig(s.dynamicYieldRatio)} |`);
  }
  out.push(
    '',
    `The finding (page 1) stands on the ${r.verdictBasis}. The dynamic model's peak torque in this table is the one carried (capped past yield where a piece yields); its stress / shear yield is that of the same chain kept elastic, like for like with the energy method's.`,
    '',
  );

  const capped = d.pieces.some((p) => p.elasticPeakTorque > p.peakTorque * (1 + 1e-6));
  out.push('### Peak torque along the shaft, dynamic model', '');
  out.push(`| side | piece | from | to | peak torque | at |${capped ? ' peak torque had it stayed elastic |' : ''} shear stress with kt | stress / shear yield |`);
  out.push(`|---|---|---|---|---|---|${capped ? '---|' : ''}---|---|`);
  for (const p of d.pieces) {
    const seg = p.piece.segment;
    const name = seg.label ? escapeMarkdown(seg.label) : `segment ${seg.index + 1}`;
    out.push(
      `| ${p.side} | ${name} | ${show(p.piece.start, 'length', u)} | ${show(p.piece.end, 'length', u)} | ${show(p.peakTorque, 'torque', u)} | ${sig(p.peakTime * 1000)} ms |${capped ? ` ${show(p.elasticPeakTorque, 'torque', u)} |` : ''} ${show(p.shearStress, 'stress', u)} | ${sig(p.yieldRatio)} |`,
    );
  }
  out.push('');
  if (capped) {
    out.push(
      escapeMarkdown(
        "Past yield the shaft elements carry at most their fully plastic torque; the shear stress and stress / shear yield are those of the same chain solved with the shaft kept elastic (the elastic check, like the energy method's), which says how far past yield the incident went.",
      ),
      '',
    );
  }

  out.push(...protectionLines(r, d));
  return out.join('\n') + '\n';
}

/** The dynamic model's full tables: natural frequencies, located events, its assumptions and numerics. */
export function renderDynamicsDetails(r: Results): string {
  const d = r.dynamic;
  const out: string[] = [];
  out.push(...frequencyLines(r, d));

  if (d.events.length > 0) {
    out.push('### Events, located in time', '');
    for (const e of d.events.slice(0, MAX_EVENTS)) out.push(`- ${sig(e.time * 1000, 4)} ms: ${e.text}`);
    if (d.eventCount > MAX_EVENTS) out.push(`- … and ${d.eventCount - MAX_EVENTS} more.`);
    out.push('');
  }

  out.push('### Assumptions of the dynamic model', '');
  for (const a of d.assumptions) out.push(`- ${a}`);
  const e = d.energy;
  const balance = e.final - (e.initial + e.motorWork + e.boundaryWork - e.dampingWork - e.slipWork - e.released);
  out.push(
    `- Numerics: trapezoidal rule with a step of ${sig(d.timeStep * 1e6)} µs (finer through the stop and after each event), ${d.steps} steps; ${refinementText(d)} The energy books close to ${sig(Math.abs(balance) / Math.max(e.initial, 1e-300), 2)} of the energy at the start.`,
  );
  // Which damper took the energy where there are several, and that it still rings where it does:
  // one item beside the numerics (the report is held to its page budget; check says both always).
  const dd = d.damping;
  const damping = [dd.dampers.length > 1 ? dampingSentence(r) : undefined, dd.ringing?.ringsOn ? ringingWords(r) : undefined].filter((x): x is string => x !== undefined);
  if (damping.length > 0) out.push(`- ${escapeMarkdown(damping.join(' '))}`);
  for (const n of d.notes) out.push(`- ${n}`);
  return out.join('\n') + '\n';
}

function refinementText(d: DynamicResult): string {
  if (d.refinement.length <= 1) return `${d.elements} shaft element${d.elements === 1 ? '' : 's'}.`;
  const counts = d.refinement.map((x) => x.elements).join(', ');
  return `shaft split into ${counts} elements in turn${d.converged ? ", until no piece's peak torque changed by more than 0.5 %." : '; the peak torques had not yet settled to 0.5 %.'}`;
}

function protectionLines(r: Results, d: DynamicResult): string[] {
  const u = r.case.units;
  const out: string[] = [];
  if (d.slips.length === 0 && d.pins.length === 0) return out;
  out.push('### Slip elements and protection', '');
  if (d.slips.length > 0) {
    out.push('| element | slip torque | first slipped | slip angle | energy taken | at the end |');
    out.push('|---|---|---|---|---|---|');
    for (const s of d.slips) {
      const first = s.firstSlip === undefined ? 'did not slip' : `${sig(s.firstSlip * 1000)} ms`;
      out.push(
        `| ${escapeMarkdown(s.element)} | ${show(s.slipTorque, 'torque', u)} | ${first} | ${showSlipAngle(s.angle, u)} | ${show(s.energy, 'energy', u)} | ${s.slippingAtEnd ? 'still slipping' : 'holding'} |`,
      );
    }
    out.push('');
  }
  for (const p of d.pins) {
    out.push(
      `- ${escapeMarkdown(p.element)} (parting torque ${show(p.shearTorque, 'torque', u)}): ${p.partedAt === undefined ? 'held' : `parted at ${sig(p.partedAt * 1000)} ms; the shaft beyond it carried nothing afterwards`}.`,
    );
  }
  for (const b of d.belts) {
    const c = b.slip.capstan;
    const spec = r.case.stations.find((s) => s.name === b.station)?.drive?.belt;
    if (!c || spec?.kind !== 'capstan') {
      out.push(`- The belt at "${escapeMarkdown(b.station)}": slip torque ${show(b.slip.slipTorque, 'torque', u)} at the shaft, as stated in the case.`);
      continue;
    }
    const wedge = spec.grooveAngle !== undefined ? ` V-groove of ${show(spec.grooveAngle, 'angle', u)}, so μ_eff = μ/sin(β/2) = ${sig(c.effectiveFriction)};` : '';
    const tension = spec.tensionIs === 'installed' ? `installed tension ${sig(spec.tension)} N (F1 + F2 = 2F_i)` : `tight-side tension ${sig(spec.tension)} N`;
    out.push(
      `- The belt at "${escapeMarkdown(b.station)}", by the capstan relation F1/F2 = e^(μ_eff·φ) (Shigley, Mechanical Engineering Design 9th ed., Sec. 17-2 and 17-3): μ = ${sig(spec.friction)}, wrap φ = ${show(spec.wrapAngle, 'angle', u)};${wedge} F1/F2 = ${sig(c.tensionRatio)}; with ${tension}, F1 = ${sig(c.tightSide)} N and F2 = ${sig(c.slackSide)} N at slip, so the slip torque is (F1 − F2)·r = ${show(b.slip.slipTorque, 'torque', u)} at the ${show(2 * c.radius, 'length', u)} pulley.`,
    );
  }
  const limiters = d.slips.filter((s) => s.kind === 'torque limiter');
  if (limiters.length > 0) {
    const worst = Math.max(...d.pieces.map((p) => p.yieldRatio));
    out.push(
      `- ${limiters.some((s) => s.firstSlip !== undefined) ? 'The limiter slipped' : 'The limiter did not slip'}; the highest stress / shear yield anywhere on the shaft is ${sig(worst)}${worst < 1 ? ', so the shaft stayed below yield' : ''}.`,
    );
  }
  out.push('');
  return out;
}

function frequencyLines(r: Results, d: DynamicResult): string[] {
  const out: string[] = ['### Natural frequencies, stop held', ''];
  out.push("| mode | side | frequency | share of the side's energy after an instantaneous stop |");
  out.push('|---|---|---|---|');
  d.frequencies.forEach((m, i) => {
    out.push(`| ${i + 1} | ${m.side} | ${sig(m.frequency)} Hz | ${sig(100 * m.participation, 3)} % |`);
  });
  const lowest = ['A', 'B'].flatMap((side) => {
    const m = d.frequencies.find((x) => x.side === side);
    return m ? [`${sig(m.frequency)} Hz on side ${side}`] : [];
  });
  const running = r.speed / (2 * Math.PI);
  out.push(
    '',
    `What a vibration reading after repair might show: rebuilt as modelled, the shaft's torsional ringing, measured with a torsional transducer or heard as a tone when something knocks the drive, sits near ${lowest.join(' and ')}. These are computed with the stop station held, as while the jam held; in running, with the load free, the two sides join and the frequencies shift, so treat them as the order of the reading, not its exact value. A clearly lower frequency after repair points to something softer than modelled (a loose hub or key, a slipping fit, a cracked or yielded section); a replacement part of different inertia moves it too (about as 1/√J). Running speed is ${sig(running)} Hz; a torsional frequency near it or near twice it would ring in normal running.`,
    '',
  );
  return out;
}

/**
 * The dynamic model's details, an appendix where the finding stands on it (its evidence is in the
 * body, "Results of the governing model"); where the finding stands on the energy method, the whole
 * dynamic model is the other model, shown in the appendix "the other model, for comparison".
 */
export const dynamicsSection: ReportSection = {
  id: 'dynamics',
  title: 'Appendix: the dynamic model in detail',
  render: ({ results }) => (results.finding.basis === 'dynamic model' ? renderDynamicsDetails(results) : undefined),
};
