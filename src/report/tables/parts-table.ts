import type { Results } from '../../results/results.ts';
import { inDisplay, unitLabel } from '../../views/display-units.ts';
import type { Cell, ReportTable } from './report-table.ts';

/**
 * Every part of every station with its inertia and its share of the kinetic energy. Parts that
 * release no energy into the shaft (at the stop itself) keep their row with the energy left empty.
 */
export function partsTable(r: Results): ReportTable {
  const u = r.case.units;
  const rows: Cell[][] = [];
  for (const station of r.case.stations) {
    for (const part of station.parts) {
      const side = r.sides.find((s) => s.parts.some((p) => p.part === part));
      const energy = side?.parts.find((p) => p.part === part);
      const where = side ? side.side : station.name === r.case.stop.at ? 'the stop' : 'at the stop';
      rows.push([
        station.name,
        inDisplay(station.at, 'length', u),
        where,
        part.name,
        part.shape,
        part.count,
        part.speedRatio,
        inDisplay(part.inertia, 'inertia', u),
        energy ? inDisplay(energy.reflectedInertia, 'inertia', u) : null,
        energy ? inDisplay(energy.kineticEnergy, 'energy', u) : null,
        energy ? (100 * energy.kineticEnergy) / r.kineticEnergy : null,
      ]);
    }
  }
  return {
    name: 'parts',
    title: 'Stations and parts',
    columns: [
      { label: 'station' },
      { label: 'position', unit: unitLabel('length', u), digits: 4 },
      { label: 'side' },
      { label: 'part' },
      { label: 'shape' },
      { label: 'count' },
      { label: 'speed ratio', digits: 4 },
      { label: 'inertia, each', unit: unitLabel('inertia', u) },
      { label: 'inertia at shaft speed', unit: unitLabel('inertia', u) },
      { label: 'kinetic energy', unit: unitLabel('energy', u) },
      { label: 'share of the energy', unit: '%' },
    ],
    rows,
  };
}
