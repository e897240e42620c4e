import { show } from '../../views/display-units.ts';
import { bulletList, escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';

/** Each gap in the drive as the dynamic model followed it; left out where the case has none. */
export const backlashSection: ReportSection = {
  id: 'backlash',
  title: 'Appendix: backlash',
  render({ results: r }) {
    const u = r.case.units;
    const gaps = r.dynamic.gaps;
    if (gaps.length === 0) return undefined;
    const lines = gaps.map(
      (g) =>
        `A gap of ${show(g.gap, 'angle', u)} in ${g.segment.label ? `"${g.segment.label}"` : `segment ${g.segment.index + 1}`}: it closed ${g.contacts} time${g.contacts === 1 ? '' : 's'} in the window.`,
    );
    return [
      bulletList(lines.map(escapeMarkdown)),
      escapeMarkdown(
        "Inside a gap no torque passes; the side that drives gains speed across it and meets the elastic stop harder: the energy at contact is ½·J·ω² plus the drive's torque times the gap. Where no running torque held a gap closed, it is taken fully open against the impact's sense at the stop, the worst case.",
      ),
    ].join('\n\n');
  },
};
