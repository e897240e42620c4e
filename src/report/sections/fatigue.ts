import { assetHistorySentences, FATIGUE_CAUTIONS, fatigueSentence } from '../../views/fatigue-words.ts';
import { sig } from '../../views/display-units.ts';
import { bulletList, escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';

/**
 * The incident's fatigue at the governing stress raiser (`finding.fatigue`) and, for a case with
 * `case.asset`, its place in the asset's history (`results.assetHistory`, found by the CLI).
 */
export const fatigueSection: ReportSection = {
  id: 'fatigue',
  title: 'Appendix: fatigue, what this jam used up',
  render({ results: r }) {
    const z = r.finding.fatigue;
    const out = [escapeMarkdown(fatigueSentence(z)), ''];
    const life = z.jamCycle.life;
    out.push(
      escapeMarkdown(
        `The jam alone (rest, peak, rest) is a cycle of local strain amplitude ${sig(z.jamCycle.strainAmplitude)} at the notch by Neuber's rule, ${life.cycles === undefined ? 'below the reach of the strain–life relation' : `a life of about ${sig(life.cycles, 2)} such cycles`} (Coffin–Manson–Basquin).`,
      ),
      '',
    );
    out.push(bulletList(z.notes.map(escapeMarkdown)), '');
    if (r.assetHistory) out.push("### This asset's history", '', ...assetHistorySentences(r.assetHistory).map((l) => escapeMarkdown(l) + '\n'));
    out.push(bulletList(FATIGUE_CAUTIONS.map((c) => `**${escapeMarkdown(c)}**`)));
    return out.join('\n');
  },
};
