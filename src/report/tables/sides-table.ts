import type { Results } from '../../results/results.ts';
import { inDisplay, unitLabel } from '../../views/display-units.ts';
import type { ReportTable } from './report-table.ts';

/** One row per loaded side of the stop: energy, peak torque, twist and highest stress. */
export function sidesTable(r: Results): ReportTable {
  const u = r.case.units;
  return {
    name: 'sides',
    title: 'Results per side',
    columns: [
      { label: 'side' },
      { label: 'stations with parts' },
      { label: 'kinetic energy', unit: unitLabel('energy', u) },
      { label: "shaft's own kinetic energy, not included", unit: unitLabel('energy', u) },
      { label: 'peak torque', unit: unitLabel('torque', u) },
      { label: 'twist', unit: unitLabel('angle', u) },
      { label: 'highest shear stress', unit: unitLabel('stress', u) },
    ],
    rows: r.sides.map((s) => [
      s.side,
      s.stations.join(', '),
      inDisplay(s.kineticEnergy, 'energy', u),
      s.shaftKineticEnergy === undefined ? null : inDisplay(s.shaftKineticEnergy, 'energy', u),
      inDisplay(s.peakTorque, 'torque', u),
      inDisplay(s.twist, 'angle', u),
      inDisplay(Math.max(...s.pieces.map((p) => p.shearStress)), 'stress', u),
    ]),
  };
}
