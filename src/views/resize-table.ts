import type { ResizeResult } from '../resize/resize-result.ts';
import { show, sig } from './display-units.ts';
import { optionRows, ROW_HEADINGS, type OptionRow } from './resize-rows.ts';
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
} from './resize-words.ts';
import { findingSentence } from './finding-words.ts';
import { textTable } from './text-table.ts';

/** The terminal output of `shaftcase resize`: the options table, then each option in words. */
export function renderResize(z: ResizeResult): string {
  const r = z.results;
  const u = r.case.units;
  const m = r.case.meta;
  const keys = Object.keys(ROW_HEADINGS) as (keyof OptionRow)[];
  const rows = optionRows(z);
  const out: string[] = [];
  out.push(`${m.id}${m.title ? `  ${m.title}` : ''}`);
  out.push(`Present shaft, the finding: ${findingSentence(r.finding, u)}`);
  out.push(`  What to do: ${r.finding.disposition}`);
  out.push(
    'What goes back in: each option against a repeat of the recorded incident, checked by a rerun of the changed case through the elastic energy method (the design check; it leans to the high side where the finding stands on the dynamic model).',
  );
  out.push(factorSentence(z));
  const running = z.present.running.running;
  out.push(running ? `Running torque ${show(running.torque, 'torque', u)}: ${running.source}.` : 'Running torque: unknown; the case gives no drive power or running torque.');
  out.push('');
  out.push(...textTable([keys.map((k) => ROW_HEADINGS[k]), ...rows.map((row) => keys.map((k) => row[k]))]));
  out.push(
    "Running factor: shear yield over the stress under the running torque, static and with kt. Stiffness and natural frequency: new over present; the frequency is the dynamic model's lowest of the side where the verdict stands on it, else the energy method's single-mass estimate.",
  );
  out.push('', recommendedSentence(z));
  out.push(`  The rule: ${z.pickRule}`);
  const flagged = flaggedOptions(z);
  if (flagged.length > 0) {
    out.push('', 'Flagged: why these options are not advisable');
    for (const o of flagged) out.push(`  - ${o.name}: ${o.flags.join('; ')}.`);
  }

  const section = (title: string, lines: string[], table: string[] = []) => {
    out.push('', title);
    for (const l of lines) out.push(`  - ${l}`);
    for (const l of table) out.push(`      ${l}`);
  };
  section('Scale the side', [scaleSideSentence(z)]);
  section('Resize the critical segment only', [criticalSegmentSentence(z)]);
  section(
    'Another material',
    [materialsSentence(z)],
    textTable([
      ['material', 'repeat stress / shear yield', 'keeps N', 'peak torque', 'strength basis'],
      ...z.materials.map((x) => [x.material.key, sig(x.yieldRatio), x.keepsFactor ? 'yes' : 'no', `×${sig(x.change.peakTorque)}`, x.material.strengthBasis ?? '—']),
    ]),
  );
  section('Torque limiter or slip coupling', [...limiterSentences(z), `In the order of giving way, ${fuseWords(z.limiter.fuses, u)}.`]);
  if (z.combined.length > 0) {
    out.push('', 'Combined options', `  ${COMBINED_WHY}`);
    for (const o of z.combined) section(`  ${combinedName(o)}`, combinedSentences(z, o));
  }
  if (z.keys.length === 0) section('The key as fuse', ['No key is given: add key: { width, height, length, material } to the station whose hub is keyed to check it.']);
  for (const k of z.keys) section('The key as fuse', keySentences(z, k));
  section(
    'Guarding and restart',
    z.guarding.map((g) => `${g.topic}: ${g.text}`),
  );
  section('Notes', z.notes);
  if (r.warnings.length > 0) section('Warnings', r.warnings);
  section('Cautions', [...z.cautions]);
  return out.join('\n') + '\n';
}
