import { driveTrainRows, hasDriveTrain, weakestSentence } from '../../views/drive-train-table.ts';
import { escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';

/** The drive train in the finding's order of giving way; left out where only the shaft is in it. */
export const driveTrainSection: ReportSection = {
  id: 'drive-train',
  title: 'Appendix: what gave way first',
  render({ results: r }) {
    const f = r.finding;
    if (!hasDriveTrain(f)) return undefined;
    const u = r.case.units;
    const rows = driveTrainRows(f, u).map((cells) => `| ${cells.map(escapeMarkdown).join(' | ')} |`);
    return [
      escapeMarkdown(weakestSentence(f, u) ?? ''),
      ['| order | element | capacity | torque in the incident | ratio | gives way when it |', '| ---: | :--- | ---: | ---: | ---: | :--- |', ...rows].join('\n'),
      escapeMarkdown(
        "Torques at shaft speed, where each element sits, by the finding's model. A shaft piece's torque is its elastic peak, as the finding's stress over shear yield; a device that slipped or parted stands at a ratio of at least 1. The order is by ratio: the first to reach its capacity gives way first.",
      ),
    ].join('\n\n');
  },
};
