import { backstopSentences, gearboxSentences } from '../../views/hub-lines.ts';
import { bulletList, escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';

/** Each gearbox against its rating and each backstop with its rebound; left out where the case has neither. */
export const gearboxesSection: ReportSection = {
  id: 'gearboxes',
  title: 'Appendix: gearboxes and backstops',
  render({ results: r }) {
    const lines = [...gearboxSentences(r), ...backstopSentences(r)];
    if (lines.length === 0) return undefined;
    return [
      bulletList(lines.map(escapeMarkdown)),
      escapeMarkdown(
        "A gearbox is checked at its output against its rated output torque times its service factor (the catalogue's or the nameplate's); its input torque is the output's over ratio × efficiency, since in a jam the motor side drives into the stop (efficiency = output power over input power). The gears are rigid in the model: the motor side's inertia is reflected as J·ratio². A self-locking gearbox and a backstop are one-way stops: the shaft there is held at standstill once it would turn backwards, and the torque that takes is the rebound torque.",
      ),
    ].join('\n\n');
  },
};
