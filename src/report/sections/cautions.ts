import { bulletList, escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';

/** The cautions every output with a verdict carries (src/results/cautions.ts). */
export const cautionsSection: ReportSection = {
  id: 'cautions',
  title: 'Cautions',
  render({ results: r }) {
    return bulletList(r.cautions.map((c) => `**${escapeMarkdown(c)}**`));
  },
};
