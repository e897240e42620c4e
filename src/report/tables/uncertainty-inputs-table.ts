import type { Results } from '../../results/results.ts';
import { inDisplay, unitLabel } from '../../views/display-units.ts';
import { inputName, inputQuantity } from '../../views/uncertainty-summary.ts';
import type { ReportTable } from './report-table.ts';

/** SI labels of the inputs the case's display units do not cover. */
const SI_UNITS: Record<string, string> = { density: 'kg/m³', mass: 'kg' };

/** The distribution each input is drawn from, in words (README, "How sure the finding is"). */
export const DRAWN_AS = {
  band: 'normal; the stated ± band is 2σ',
  minimum: 'normal; the handbook minimum is its 5th percentile',
  typical: 'normal; the typical value is its mean',
} as const;

/**
 * The inputs the Monte Carlo varies: how each is drawn, its mean and standard deviation in the
 * case's units (SI for density and mass). Undefined without an uncertainty run.
 */
export function uncertaintyInputsTable(r: Results): ReportTable | undefined {
  const un = r.uncertainty;
  if (!un) return undefined;
  const u = r.case.units;
  return {
    name: 'uncertainty-inputs',
    title: 'Inputs varied by the Monte Carlo',
    columns: [{ label: 'input' }, { label: 'field' }, { label: 'drawn from' }, { label: 'unit' }, { label: 'mean' }, { label: 'standard deviation' }, { label: 'coefficient of variation (%)' }],
    rows: un.inputs.map((i) => {
      const kind = inputQuantity(i.path);
      const show = (v: number) => (kind ? inDisplay(v, kind, u) : v);
      const unit = kind ? unitLabel(kind, u) : (SI_UNITS[/\w+$/.exec(i.path)?.[0] ?? ''] ?? '');
      return [inputName(i.path), i.path, DRAWN_AS[i.basis], unit, show(i.mean), show(i.sd), i.mean !== 0 ? (100 * i.sd) / Math.abs(i.mean) : null];
    }),
  };
}
