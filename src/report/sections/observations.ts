import type { Observed } from '../../case/case.ts';
import { show } from '../../views/display-units.ts';
import { photoHref } from '../layout.ts';
import { escapeMarkdown, escapeParagraphs } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';

/** True when the case's `observed:` section records anything at all. */
export function recordsAnything(o: Observed): boolean {
  return o.permanentTwist.length > 0 || o.fracture !== undefined || o.photos.length > 0 || [o.key, o.hub, o.other, o.notes].some((t) => t?.trim());
}

/** What was seen afterwards, as the case file records it: measured twist, fracture, free text, photos. */
export const observationsSection: ReportSection = {
  id: 'observations',
  title: 'Observations and photos',
  render({ results: r }) {
    const o = r.case.observed;
    const u = r.case.units;
    if (!recordsAnything(o)) {
      return 'The case file records no observations. Record the key, the hubs, any permanent twist (a scribe line across two parts read with a protractor) and photos in its `observed` section.';
    }
    const out: string[] = [];
    if (o.permanentTwist.length > 0) {
      out.push('**Permanent twist measured**');
      out.push(
        [
          '| between | angle | how it was measured |',
          '| :--- | ---: | :--- |',
          ...o.permanentTwist.map((t) => `| ${escapeMarkdown(t.between.join(' and '))} | ${show(t.angle, 'angle', u)} | ${t.method ? escapeMarkdown(t.method) : '—'} |`),
        ].join('\n'),
      );
    }
    if (o.fracture) {
      const at = o.fracture.at === undefined ? '' : typeof o.fracture.at === 'number' ? ` at ${show(o.fracture.at, 'length', u, 4)}` : ` at "${o.fracture.at}"`;
      const notes = o.fracture.notes ? `: ${o.fracture.notes}` : '';
      out.push(`**Fracture:** ${escapeMarkdown(`${o.fracture.type === 'none' ? 'none found' : o.fracture.type}${at}${notes}`)}`);
    }
    const text: [string, string | undefined][] = [
      ['Key', o.key],
      ['Hub', o.hub],
      ['Other', o.other],
    ];
    for (const [label, v] of text) if (v?.trim()) out.push(`**${label}:** ${escapeMarkdown(v)}`);
    if (o.notes?.trim()) out.push(`**Notes:**\n\n${escapeParagraphs(o.notes)}`);
    if (o.photos.length > 0) {
      out.push('**Photos**');
      o.photos.forEach((p, i) => {
        const caption = p.caption?.trim() ? escapeMarkdown(p.caption) : '';
        const label = `Photo ${i + 1}${caption ? `: ${caption}` : ''}`;
        out.push(`![${label}](${photoHref(p.path)})\n*${label}* (${escapeMarkdown(p.path)})`);
      });
    }
    return out.join('\n\n');
  },
};
