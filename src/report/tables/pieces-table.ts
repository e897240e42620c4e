import type { Results } from '../../results/results.ts';
import { inDisplay, unitLabel } from '../../views/display-units.ts';
import type { ReportTable } from './report-table.ts';

/** Every loaded piece of shaft (segments cut at stations): torque, stress with kt, twist, stress / shear yield. */
export function piecesTable(r: Results): ReportTable {
  const u = r.case.units;
  return {
    name: 'pieces',
    title: 'Shaft pieces under load',
    columns: [
      { label: 'side' },
      { label: 'segment' },
      { label: 'from', unit: unitLabel('length', u), digits: 4 },
      { label: 'to', unit: unitLabel('length', u), digits: 4 },
      { label: 'torque', unit: unitLabel('torque', u) },
      { label: 'kt' },
      { label: 'shear stress', unit: unitLabel('stress', u) },
      { label: 'twist', unit: unitLabel('angle', u) },
      { label: 'stress / shear yield' },
    ],
    rows: r.sides.flatMap((s) =>
      s.pieces.map((p) => [
        s.side,
        segmentName(p.piece.segment),
        inDisplay(p.piece.start, 'length', u),
        inDisplay(p.piece.end, 'length', u),
        inDisplay(p.torque, 'torque', u),
        p.piece.segment.kt,
        inDisplay(p.shearStress, 'stress', u),
        inDisplay(p.twist, 'angle', u),
        p.yieldRatio,
      ]),
    ),
  };
}

/** "2 bearing journal", or "2" for a segment without a label. */
export function segmentName(s: { index: number; label?: string }): string {
  return s.label ? `${s.index + 1} ${s.label}` : String(s.index + 1);
}
