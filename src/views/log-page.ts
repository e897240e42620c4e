import type { IncidentLog } from '../log/build-log.ts';
import { escapeMarkdown } from '../report/markdown-text.ts';
import { renderHtml } from '../report/render-html.ts';
import { sig } from './display-units.ts';
import { logFigures } from './log-figures.ts';
import { damagePercent, LOG_CAUTIONS } from './log-table.ts';

/** A Markdown table cell: user text escaped, pipes too. */
const cell = (t: string) => escapeMarkdown(t).replace(/\|/g, '\\|');

/**
 * `log --html`: one self-contained page (the report's renderer, so the report's content security
 * policy: no scripts, no requests) with the assets' findings, the figures and the tables. Pure.
 */
export function renderLogPage(log: IncidentLog, ranAt: string, notes: readonly string[] = []): string {
  const figures = logFigures(log);
  const md: string[] = ['# Incident log', '', `${log.incidents.length} incidents, ${log.assets.length} assets; made ${escapeMarkdown(ranAt)}.`, ''];
  if (log.assets.length > 0) {
    md.push('## What the jams add up to', '');
    for (const a of log.assets) md.push(`- ${escapeMarkdown(a.finding.sentence)}`);
    md.push('');
  }
  md.push('## Cautions', '', ...LOG_CAUTIONS.map((c) => `- ${escapeMarkdown(c[0].toUpperCase() + c.slice(1))}`), '');
  md.push('## Figures', '');
  for (const f of figures) md.push(`![${f.title}](figures/${f.name}.svg)`, '');
  md.push('## Assets', '', '| asset | incidents | worst stress / shear yield | mean interval, days | life used (Miner sum) |', '|---|---|---|---|---|');
  for (const a of log.assets)
    md.push(`| ${cell(a.asset)} | ${a.incidents} | ${sig(a.worst_yield_ratio)} | ${a.mean_interval_days === null ? '—' : sig(a.mean_interval_days)} | ${damagePercent(a.damage)} (${sig(a.damage)}) |`);
  md.push('', '## Incidents', '', '| asset | id | occurred | verdict | basis | segment | stress / shear yield | peak torque, N·m | damage | from |', '|---|---|---|---|---|---|---|---|---|---|');
  for (const r of log.incidents) {
    md.push(
      `| ${cell(r.asset ?? '—')} | ${cell(r.id)} | ${cell(r.occurred ?? '—')} | ${r.verdict} | ${r.basis} | ${cell(r.segment)} | ${sig(r.yield_ratio)} | ${sig(r.peak_torque_Nm)} | ${sig(r.damage)} | ${r.report ? cell(r.report) : 'engine'} |`,
    );
  }
  if (notes.length > 0) md.push('', '## Notes', '', ...notes.map((n) => `- ${escapeMarkdown(n)}`));
  return renderHtml(md.join('\n') + '\n', { title: 'Incident log', figures: Object.fromEntries(figures.map((f) => [`figures/${f.name}.svg`, f.svg])), images: {} });
}
