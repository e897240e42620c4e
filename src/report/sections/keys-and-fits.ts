import { hubSentences } from '../../views/hub-lines.ts';
import { bulletList, escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';

/** Each key and shrink or press fit at the incident's torque; left out where the case has neither. */
export const keysAndFitsSection: ReportSection = {
  id: 'keys-and-fits',
  title: 'Appendix: keys and hub fits',
  render({ results: r }) {
    const lines = hubSentences(r);
    if (lines.length === 0) return undefined;
    return [
      bulletList(lines.map(escapeMarkdown)),
      escapeMarkdown(
        "Key stresses by Shigley 9th ed. Sec. 7-7; a fit's contact pressure by the thick-cylinder (Lamé) relations, Shigley 9th ed. Sec. 3-16, and its slip torque T = π·μ·p·d²·L/2, Sec. 7-8 (from memory). The friction at a seat scatters widely (0.08 to 0.2 is quoted for steel on steel); the slip torque is as good as the coefficient given. A key is a poor fuse: fit, fretting and wear change the torque it fails at.",
      ),
    ].join('\n\n');
  },
};
