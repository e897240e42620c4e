import { couplingSentences } from '../../views/hub-lines.ts';
import { bulletList, escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';

/** Each coupling against the incident torque; left out where the case has none. */
export const couplingsSection: ReportSection = {
  id: 'couplings',
  title: 'Appendix: couplings',
  render({ results: r }) {
    const lines = couplingSentences(r);
    if (lines.length === 0) return undefined;
    return [
      bulletList(lines.map(escapeMarkdown)),
      escapeMarkdown(
        "A flexible coupling is a spring in series with the shaft: its compliance adds to the shaft's in both the energy method and the dynamic model, so it lowers the peak torque and the natural frequencies. The ratings are the maker's; its service factors and the coupling's condition govern.",
      ),
    ].join('\n\n');
  },
};
