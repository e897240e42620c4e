import type { ResizeResult } from '../../resize/resize-result.ts';
import type { Results } from '../../results/results.ts';
import { optionRows, ROW_HEADINGS, type OptionRow } from '../../views/resize-rows.ts';
import { criticalSegmentSentence, factorSentence, keySentences, limiterSentences, materialsSentence, scaleSideSentence } from '../../views/resize-words.ts';
import { verdictSentence } from '../../views/summary.ts';
import { escapeMarkdown } from './escape-markdown.ts';

/**
 * The report's "What goes back in" section: the options table, each option in words, the guarding
 * recommendations and the cautions. Pure; every text (the case's names and labels among them) is
 * escaped. The figures come separately from src/report/figures/.
 */
export function renderResizeSection(results: Results, resize: ResizeResult): string {
  const e = escapeMarkdown;
  const keys = Object.keys(ROW_HEADINGS) as (keyof OptionRow)[];
  const row = (cells: string[]) => `| ${cells.join(' | ')} |`;
  const out: string[] = ['## What goes back in', ''];
  out.push(e(`Each option is checked against a repeat of the recorded incident by a rerun of the changed case through the elastic energy method. Present shaft: ${verdictSentence(results)}`), '');
  out.push(e(factorSentence(resize)), '');
  out.push(row(keys.map((k) => e(ROW_HEADINGS[k]))), row(keys.map(() => '---')));
  for (const r of optionRows(resize)) out.push(row(keys.map((k) => e(r[k]))));
  out.push('', e('Running factor: shear yield over the stress under the running torque, with kt (and static). Stiffness and natural frequency: new over present, the energy method\'s single-mass estimate.'), '');

  const part = (title: string, lines: string[]) => {
    out.push(`### ${e(title)}`, '', ...lines.map((l) => `- ${e(l)}`), '');
  };
  part('Scale the side', [scaleSideSentence(resize)]);
  part('Resize the critical segment only', [criticalSegmentSentence(resize)]);
  part('Another material', [materialsSentence(resize)]);
  part('Torque limiter or slip coupling', limiterSentences(resize));
  if (resize.keys.length === 0) part('The key as fuse', ['No key is given in the case.']);
  for (const k of resize.keys) part(`The key as fuse at "${k.station}"`, keySentences(resize, k));
  part('Guarding and restart', resize.guarding.map((g) => `${g.topic}: ${g.text}`));
  part('Notes', resize.notes);
  part('Cautions', [...resize.cautions]);
  return out.join('\n');
}
