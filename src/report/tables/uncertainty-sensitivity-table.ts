import type { Results } from '../../results/results.ts';
import { inDisplay, unitLabel } from '../../views/display-units.ts';
import { inputName } from '../../views/uncertainty-summary.ts';
import type { ReportTable } from './report-table.ts';

/**
 * The inputs ranked by how far each, swung across its band with the others held at the single
 * run's values, moves stress / shear yield (largest first), with the permanent twist where some swing
 * leaves one. Undefined without an uncertainty run.
 */
export function uncertaintySensitivityTable(r: Results): ReportTable | undefined {
  const un = r.uncertainty;
  if (!un) return undefined;
  const u = r.case.units;
  const twist = un.sensitivity.some((s) => (s.twistLow ?? 0) > 0 || (s.twistHigh ?? 0) > 0);
  const deg = (v: number | undefined) => (v === undefined ? null : inDisplay(v, 'angle', u));
  return {
    name: 'uncertainty-sensitivity',
    title: 'Inputs by their effect on stress / shear yield',
    columns: [
      { label: 'rank' },
      { label: 'input' },
      { label: 'stress / shear yield, input at the low end of its band' },
      { label: 'stress / shear yield, input at the high end' },
      { label: 'swing of stress / shear yield' },
      ...(twist
        ? [
            { label: 'permanent twist, low end', unit: unitLabel('angle', u) },
            { label: 'permanent twist, high end', unit: unitLabel('angle', u) },
          ]
        : []),
    ],
    rows: un.sensitivity.map((s, i) => [i + 1, inputName(s.input), s.low, s.high, Math.abs(s.high - s.low), ...(twist ? [deg(s.twistLow), deg(s.twistHigh)] : [])]),
  };
}
