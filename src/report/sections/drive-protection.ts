import { show, sig } from '../../views/display-units.ts';
import { bulletList, escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';

/** The drives' torque limits and trips as the dynamic model followed them; left out where no drive has either. */
export const driveProtectionSection: ReportSection = {
  id: 'drive-protection',
  title: "Appendix: the motor's protection",
  render({ results: r }) {
    const d = r.dynamic;
    const u = r.case.units;
    if (d.protection.length === 0) return undefined;
    const lines = d.protection.map((p) => {
      const out = [`Drive at "${p.station}":`];
      if (p.torqueLimit !== undefined)
        out.push(`the drive holds the motor's torque to ${show(p.torqueLimit, 'torque', u)} at the motor shaft (its torque limit), and the dynamic model follows that limit from the stop on.`);
      if (p.tripAfter !== undefined) {
        out.push(
          p.trippedAt === undefined
            ? `it is set to trip ${sig(p.tripAfter * 1000)} ms after the stop, later than the simulated window of ${sig(d.duration * 1000)} ms.`
            : `it tripped ${sig(p.trippedAt * 1000)} ms after the stop; from then on the motor gives no torque, so what slips comes to rest on its own friction.`,
        );
      }
      return out.join(' ');
    });
    const slipping = d.slips.filter((s) => s.slippingAtEnd);
    if (slipping.length > 0) lines.push(`Still slipping when the window ended: ${slipping.map((s) => s.element).join(', ')}; its energy is to that moment.`);
    return bulletList(lines.map(escapeMarkdown));
  },
};
