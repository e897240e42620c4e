import type { Results } from '../../results/results.ts';
import { inDisplay, unitLabel } from '../../views/display-units.ts';
import type { ReportTable } from './report-table.ts';

/** One row per loaded side: the energy balance past yield (torque capped by plasticity, permanent twist, fracture margin). */
export function plasticSidesTable(r: Results): ReportTable {
  const u = r.case.units;
  return {
    name: 'past-yield-sides',
    title: 'Past yield, per side',
    columns: [
      { label: 'side' },
      { label: 'kinetic energy', unit: unitLabel('energy', u) },
      { label: 'peak torque', unit: unitLabel('torque', u) },
      { label: 'peak twist', unit: unitLabel('angle', u) },
      { label: 'permanent twist', unit: unitLabel('angle', u) },
      { label: 'highest shear strain' },
      { label: 'energy before the first break', unit: unitLabel('energy', u) },
      { label: 'verdict' },
    ],
    rows: r.plastic.sides.map((s) => [
      s.side,
      inDisplay(s.energy, 'energy', u),
      inDisplay(s.peakTorque, 'torque', u),
      inDisplay(s.totalTwist, 'angle', u),
      inDisplay(s.permanentTwist, 'angle', u),
      s.maxShearStrain,
      Number.isFinite(s.fractureEnergy) ? inDisplay(s.fractureEnergy, 'energy', u) : 'none can break',
      s.verdict,
    ]),
  };
}
