import type { ResizeResult } from '../../resize/resize-result.ts';
import { sig } from '../../views/display-units.ts';
import { optionRows, ROW_HEADINGS, type OptionRow } from '../../views/resize-rows.ts';
import {
  COMBINED_WHY,
  combinedName,
  combinedSentences,
  criticalSegmentSentence,
  factorSentence,
  fuseWords,
  flaggedOptions,
  recommendedSentence,
  keySentences,
  limiterSentences,
  materialsSentence,
  scaleSideSentence,
} from '../../views/resize-words.ts';
import { findingSentence } from '../../views/finding-words.ts';
import { linkTo } from '../anchor.ts';
import { bulletList, escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';

export const OPTIONS_TITLE = 'Appendix: every option for what goes back in';

/**
 * What goes back in (`shaftcase resize`, computed once before the report is rendered): the options
 * table, the recommended one, the guarding and restart recommendations, and what the investigator
 * decides. The rule of the pick, the columns, each option in words, and what they rest on, are in
 * the appendix (`optionsSection`), to keep the body short.
 * Every text (the case's names and labels among them) is escaped.
 */
export const recommendationsSection: ReportSection = {
  id: 'recommendations',
  title: 'Recommendations: what goes back in',
  render({ results, resize }) {
    const e = escapeMarkdown;
    const out = [
      e(
        `Each option is checked against a repeat of the recorded incident by a rerun of the changed case through the elastic energy method, and under the running torque. Present shaft, the finding: ${findingSentence(results.finding, results.case.units)}`,
      ),
      e(factorSentence(resize)),
      optionsTable(resize),
      `**${e(recommendedSentence(resize))}**`,
      `${e('The rule of the pick, the columns, why each flagged option is not advisable, each option in words, and what they rest on:')} ${linkTo(OPTIONS_TITLE, 'see the appendix')}.`,
    ];
    out.push('### Guarding and restart', bulletList(resize.guarding.map((g) => e(`${g.topic}: ${g.text}`))));
    const decision = [
      'The investigator decides which option goes back in, with the machine builder, and records the return-to-service decision.',
      ...(results.verdict !== 'elastic' ? ['A shaft that may have yielded is not returned to service on a calculation alone.'] : []),
    ];
    out.push(`*${e(decision.join(' '))}*`);
    return out.join('\n\n');
  },
};

/** Every option of `resize` in words, and what they rest on: an appendix to the recommendations. */
export const optionsSection: ReportSection = {
  id: 'options',
  title: OPTIONS_TITLE,
  render({ resize }) {
    const e = escapeMarkdown;
    const out: string[] = [
      e(`The rule: ${resize.pickRule}`),
      e(
        "Running factor: shear yield over the stress under the running torque, with kt (and static). Stiffness and natural frequency: new over present; the frequency is the dynamic model's lowest of the side where the verdict stands on it, else the energy method's single-mass estimate.",
      ),
    ];
    // The materials whose one flag is their factor go in one line, to keep the appendix short; the terminal lists each.
    const factorOnly = resize.materials.filter((m) => m.flags.length === 1 && !m.keepsFactor && m.running.keeps !== false);
    const grouped = factorOnly.length > 1 ? new Set(factorOnly.map((m) => `Material ${m.material.key}`)) : new Set<string>();
    const flagged = flaggedOptions(resize).filter((o) => !grouped.has(o.name));
    const lines = flagged.map((o) => `${o.name}: ${o.flags.join('; ')}.`);
    if (grouped.size > 0) {
      lines.splice(
        flagged.findIndex((o) => o.name.startsWith('Material ')) < 0 ? lines.length : flagged.findIndex((o) => o.name.startsWith('Material ')),
        0,
        `Materials ${factorOnly.map((m) => `${m.material.key} (${sig(m.yieldRatio)})`).join(', ')}: each fails its own design factor: a repeat of the incident takes it to the stress / shear yield in brackets, above the ${sig(1 / resize.designFactor)} that N = ${sig(resize.designFactor)} allows.`,
      );
    }
    if (lines.length > 0) out.push(`### ${e('Flagged: why these options are not advisable')}`, bulletList(lines.map(e)));
    const part = (title: string, lines: readonly string[]) => out.push(`### ${e(title)}`, bulletList(lines.map(e)));
    part('Scale the side', [scaleSideSentence(resize)]);
    part('Resize the critical segment only', [criticalSegmentSentence(resize)]);
    part('Another material', [materialsSentence(resize)]);
    part('Torque limiter or slip coupling', [...limiterSentences(resize), `In the order of giving way, ${fuseWords(resize.limiter.fuses, resize.results.case.units)}.`]);
    if (resize.combined.length > 0) {
      out.push(`### ${e('Combined options')}`, e(COMBINED_WHY));
      for (const o of resize.combined) part(combinedName(o), combinedSentences(resize, o));
    }
    if (resize.keys.length === 0) part('The key as fuse', ['No key is given in the case.']);
    for (const k of resize.keys) part(`The key as fuse at "${k.station}"`, keySentences(resize, k));
    part('What the options rest on', resize.notes);
    return out.join('\n\n');
  },
};

/** The options side by side, one row each, every cell escaped. */
function optionsTable(resize: ResizeResult): string {
  const keys = Object.keys(ROW_HEADINGS) as (keyof OptionRow)[];
  const row = (cells: string[]) => `| ${cells.join(' | ')} |`;
  return [row(keys.map((k) => escapeMarkdown(ROW_HEADINGS[k]))), row(keys.map(() => '---')), ...optionRows(resize).map((r) => row(keys.map((k) => escapeMarkdown(r[k]) || '—')))].join('\n');
}
