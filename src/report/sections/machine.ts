import { show } from '../../views/display-units.ts';
import { escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';
import { partsTable } from '../tables/parts-table.ts';
import { markdownTable } from '../tables/report-table.ts';
import { segmentsTable } from '../tables/segments-table.ts';

/** The stations, parts and segments the engine worked on, as tables (the figures follow). */
export const machineSection: ReportSection = {
  id: 'machine',
  title: 'The machine as modelled',
  render({ results: r }) {
    const c = r.case;
    const u = c.units;
    const segs = c.shaft.segments;
    const length = show(segs[segs.length - 1].end, 'length', u, 4);
    const intro = escapeMarkdown(
      `The shaft is modelled as ${segs.length} round segment${segs.length === 1 ? '' : 's'} end to end, ${length} in all, positions measured from its start. ${c.stations.length} station${c.stations.length === 1 ? '' : 's'} carry the parts; the stop is at "${c.stop.at}". Each part's inertia is felt at shaft speed through its speed ratio (inertia × ratio²), and its share is of the kinetic energy of all loaded sides.`,
    );
    return [intro, '**Stations and parts**', markdownTable(partsTable(r)), '**Shaft segments**', markdownTable(segmentsTable(r))].join('\n\n');
  },
};
