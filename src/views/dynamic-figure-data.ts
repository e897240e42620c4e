import type { Investigation } from '../finding/investigation.ts';
import { pieceTorqueHistory } from '../results/dynamic-result.ts';
import type { Results } from '../results/results.ts';
import { inDisplay, unitLabel } from './display-units.ts';

/** One point of a plotted series, in the case's display units. */
export interface FigurePoint {
  x: number;
  y: number;
  series: string;
}

/** The data of one figure: its points and axis labels. Pure: from Results only, nothing recomputed. */
export interface FigureData {
  points: FigurePoint[];
  xLabel: string;
  yLabel: string;
}

/**
 * Torque against time in the finding's governing piece (the same span in the dynamic model) and in
 * every slip element (ms, torque units); the piece is named as the finding names it.
 */
export function torqueHistoryData(r: Investigation): FigureData {
  const h = r.dynamic.histories;
  const u = r.case.units;
  const g = pieceTorqueHistory(r.dynamic, r.finding.piece);
  const governing = g ? [{ ...g, name: `${g.name} (the finding's governing piece)` }] : [];
  const points = [...governing, ...h.torques]
    .flatMap((s) => Array.from(s.values, (v, i) => ({ x: h.time[i] * 1000, y: inDisplay(v, 'torque', u), series: s.name })))
    .filter((p) => Number.isFinite(p.y));
  return { points, xLabel: 'time from the stop, ms', yLabel: `torque, ${unitLabel('torque', u)}` };
}

/** Station speeds against time (ms, rpm at shaft speed). */
export function stationSpeedData(r: Results): FigureData {
  const h = r.dynamic.histories;
  const u = r.case.units;
  const points = h.speeds.flatMap((s) => Array.from(s.values, (v, i) => ({ x: h.time[i] * 1000, y: inDisplay(v, 'speed', u), series: s.name })));
  return { points, xLabel: 'time from the stop, ms', yLabel: `speed at shaft speed, ${unitLabel('speed', u)}` };
}

/** Shapes of the lowest three modes along the shaft (position in length units, amplitude largest 1). */
export function modeShapeData(r: Results): FigureData {
  const u = r.case.units;
  const points = r.dynamic.modes.flatMap((m, k) =>
    m.at.map((x, i) => ({ x: inDisplay(x, 'length', u), y: m.amplitude[i], series: `mode ${k + 1}: ${m.frequency.toPrecision(3)} Hz (side ${m.side})` })),
  );
  return { points, xLabel: `position along the shaft, ${unitLabel('length', u)}`, yLabel: 'relative amplitude' };
}
