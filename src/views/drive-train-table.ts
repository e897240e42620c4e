import type { Finding, OrderedElement } from '../finding/finding.ts';
import type { Results } from '../results/results.ts';
import { show, sig } from './display-units.ts';

/** The `drive_train` rows of the JSON, in the finding's order, SI. */
export function driveTrainJson(f: Finding): Record<string, unknown>[] {
  return f.driveTrain.map((e) => ({
    element: e.element,
    kind: e.kind,
    station_or_segment: e.where,
    capacity_Nm: Number.isFinite(e.capacity) ? e.capacity : null,
    gives_way_by: e.givesWayBy,
    torque_Nm: e.torque,
    ratio: e.ratio,
    order: e.order,
  }));
}

/** Whether the drive train has more than the shaft's own pieces (a key, fit, coupling, limiter or pin). */
export function hasDriveTrain(f: Finding): boolean {
  return f.driveTrain.some((e) => e.kind !== 'shaft');
}

/** The table's rows as text cells: order, element, capacity, torque, ratio, how it gives way. */
export function driveTrainRows(f: Finding, u: Results['case']['units']): string[][] {
  return f.driveTrain.map((e: OrderedElement) => [
    String(e.order),
    e.element,
    Number.isFinite(e.capacity) ? show(e.capacity, 'torque', u) : '—',
    show(e.torque, 'torque', u),
    // Without a capacity (a backstop with no rating given) there is no ratio to show.
    Number.isFinite(e.capacity) ? sig(e.ratio) : '—',
    e.givesWayBy,
  ]);
}

/** One sentence naming the weakest element, for the finding's lines; undefined where only the shaft is in the train. */
export function weakestSentence(f: Finding, u: Results['case']['units']): string | undefined {
  const w = f.weakest;
  if (!w || !hasDriveTrain(f)) return undefined;
  const gave = w.ratio >= 1 ? 'gave way first' : 'is the weakest, though it held';
  return `In the drive train, ${w.element} ${gave}: ${show(w.torque, 'torque', u)} against ${show(w.capacity, 'torque', u)} at which it ${w.givesWayBy} (${sig(w.ratio)} of it).`;
}
