import { metricsOf } from '../../finding/investigate.ts';
import type { Results } from '../../results/results.ts';
import { inDisplay, unitLabel, type DisplayKind } from '../../views/display-units.ts';
import type { ReportTable } from './report-table.ts';

/**
 * The single run beside the 5th, 50th and 95th percentiles of the Monte Carlo, for each number it
 * samples (the single run's values are the ones each sample keeps, `metricsOf`); the permanent
 * twist only where some sample has one. Undefined without an uncertainty run.
 */
export function uncertaintyPercentilesTable(r: Results): ReportTable | undefined {
  const un = r.uncertainty;
  if (!un) return undefined;
  const u = r.case.units;
  const single = metricsOf(r);
  const p = un.percentiles;
  const row = (label: string, kind: DisplayKind | undefined, one: number, [p5, p50, p95]: readonly number[]) => {
    const d = (v: number) => (kind ? inDisplay(v, kind, u) : v);
    return [label, kind ? unitLabel(kind, u) : '', d(one), d(p5), d(p50), d(p95)];
  };
  return {
    name: 'uncertainty-percentiles',
    title: 'Single run and percentiles over the tolerances',
    columns: [{ label: 'quantity' }, { label: 'unit' }, { label: 'single run' }, { label: '5th percentile' }, { label: 'median' }, { label: '95th percentile' }],
    rows: [
      row('stress / shear yield (elastic method, kt applied)', undefined, single.yieldRatio, p.yieldRatio),
      row('highest shear stress (elastic method)', 'stress', single.maxShearStress, p.maxShearStress),
      row('peak torque (past yield: capped by plasticity)', 'torque', single.peakTorque, p.peakTorque),
      ...(p.permanentTwist && single.permanentTwist !== undefined && (p.permanentTwist[2] > 0 || single.permanentTwist > 0)
        ? [row('permanent twist (largest side)', 'angle', single.permanentTwist, p.permanentTwist)]
        : []),
    ],
  };
}
