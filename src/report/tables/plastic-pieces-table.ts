import type { Results } from '../../results/results.ts';
import { inDisplay, unitLabel } from '../../views/display-units.ts';
import { segmentName } from './pieces-table.ts';
import type { ReportTable } from './report-table.ts';

/**
 * Every piece that went past yield, net section and no kt (at the break where fracture is
 * predicted): its limits, the permanent twist and how it shows on the surface, the strain against
 * fracture; a piece that breaks is marked so beside its segment (the material of each piece is in
 * the material table). Undefined when no piece passes yield over its net section.
 */
export function plasticPiecesTable(r: Results): ReportTable | undefined {
  if (r.plastic.verdict === 'elastic') return undefined;
  const u = r.case.units;
  const torque = (v: number) => (Number.isFinite(v) ? inDisplay(v, 'torque', u) : 'none (brittle)');
  return {
    name: 'past-yield-pieces',
    title: 'Past yield, the pieces that yielded or broke',
    columns: [
      { label: 'side' },
      { label: 'segment' },
      { label: 'from', unit: unitLabel('length', u), digits: 4 },
      { label: 'to', unit: unitLabel('length', u), digits: 4 },
      { label: 'yield torque', unit: unitLabel('torque', u) },
      { label: 'fully plastic torque', unit: unitLabel('torque', u) },
      { label: 'permanent twist', unit: unitLabel('angle', u) },
      { label: 'surface offset', unit: unitLabel('length', u) },
      { label: 'helix angle', unit: unitLabel('angle', u) },
      { label: 'shear strain' },
      { label: 'fracture strain' },
    ],
    rows: r.plastic.sides.flatMap((s) =>
      s.pieces
        .filter((p) => p.yielded || p.state.fractured)
        .map((p) => [
          s.side,
          `${segmentName(p.piece.segment)}${p.state.fractured ? ' (breaks)' : ''}`,
          inDisplay(p.piece.start, 'length', u),
          inDisplay(p.piece.end, 'length', u),
          torque(p.yieldTorque),
          torque(p.plasticTorque),
          inDisplay(p.state.permanentTwist, 'angle', u),
          inDisplay(p.surfaceOffset, 'length', u),
          inDisplay(p.helixAngle, 'angle', u),
          p.state.maxShearStrain,
          p.fractureStrain ?? 'unknown',
        ]),
    ),
  };
}
