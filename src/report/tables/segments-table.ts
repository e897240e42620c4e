import type { Results } from '../../results/results.ts';
import { inDisplay, unitLabel } from '../../views/display-units.ts';
import type { ReportTable } from './report-table.ts';

/** The shaft's segments as modelled: position, length, diameters, material and kt. */
export function segmentsTable(r: Results): ReportTable {
  const u = r.case.units;
  const len = (m: number) => inDisplay(m, 'length', u);
  return {
    name: 'segments',
    title: 'Shaft segments',
    columns: [
      { label: 'no.' },
      { label: 'segment' },
      { label: 'from', unit: unitLabel('length', u), digits: 4 },
      { label: 'to', unit: unitLabel('length', u), digits: 4 },
      { label: 'length', unit: unitLabel('length', u), digits: 4 },
      { label: 'diameter', unit: unitLabel('length', u), digits: 4 },
      { label: 'bore', unit: unitLabel('length', u), digits: 4 },
      { label: 'material' },
      { label: 'kt' },
    ],
    rows: r.case.shaft.segments.map((s) => [s.index + 1, s.label ?? null, len(s.start), len(s.end), len(s.end - s.start), len(s.diameter), s.bore > 0 ? len(s.bore) : null, s.material, s.kt]),
  };
}
