import { balancePieceOf } from '../../results/plastic-result.ts';
import type { Results } from '../../results/results.ts';
import { inDisplay, unitLabel } from '../../views/display-units.ts';
import { segmentName } from './pieces-table.ts';
import type { ReportTable } from './report-table.ts';

/**
 * Every piece the dynamic model took past yield or broke, where the verdict stands on it: its
 * peak torque (capped by its fully plastic torque), the permanent twist and how it shows on the
 * surface, the largest shear strain against the fracture strain, and when it broke. Undefined
 * when the verdict past yield is the energy balance's, or no piece yielded.
 */
export function dynamicDamageTable(r: Results): ReportTable | undefined {
  if (r.pastYieldBasis !== 'dynamic model') return undefined;
  const hit = r.dynamic.pieces.filter((p) => p.permanentTwist > 0 || p.broken);
  if (hit.length === 0) return undefined;
  const u = r.case.units;
  return {
    name: 'past-yield-in-time',
    title: 'Past yield in time (dynamic model), the pieces that yielded or broke',
    columns: [
      { label: 'side' },
      { label: 'segment' },
      { label: 'from', unit: unitLabel('length', u), digits: 4 },
      { label: 'to', unit: unitLabel('length', u), digits: 4 },
      { label: 'peak torque', unit: unitLabel('torque', u) },
      { label: 'permanent twist', unit: unitLabel('angle', u) },
      { label: 'surface offset', unit: unitLabel('length', u) },
      { label: 'shear strain' },
      { label: 'fracture strain' },
      { label: 'breaks at', unit: 'ms' },
    ],
    rows: hit.map((p) => {
      const f = balancePieceOf(r.plastic, p)?.piece;
      return [
        p.side,
        segmentName(p.piece.segment),
        inDisplay(p.piece.start, 'length', u),
        inDisplay(p.piece.end, 'length', u),
        inDisplay(p.peakTorque, 'torque', u),
        inDisplay(p.permanentTwist, 'angle', u),
        inDisplay((p.piece.segment.diameter / 2) * p.permanentTwist, 'length', u),
        p.maxShearStrain,
        f?.fractureStrain ?? 'unknown',
        p.broken && p.breakTime !== undefined ? p.breakTime * 1000 : '',
      ];
    }),
  };
}
