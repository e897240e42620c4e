import type { Results } from '../../results/results.ts';
import { torqueHistoryData } from '../../views/dynamic-figure-data.ts';
import type { ReportFigure } from './report-figure.ts';
import { lineFigureSvg } from './line-figure.ts';

/** Torque against time in the most loaded piece of shaft and in every slip element. */
export function dynamicTorqueFigure(r: Results): ReportFigure {
  const d = r.dynamic;
  const title = 'Torque against time, dynamic model';
  const caption = `Torque in the most loaded piece of shaft${d.slips.length > 0 ? ' and in each slip element' : ''} from the stop's start, positive where it resists the stop. Time step ${(d.timeStep * 1e6).toPrecision(3)} µs; ${d.elements} shaft element${d.elements === 1 ? '' : 's'}.`;
  return { name: 'dynamic-torque', title, caption, svg: lineFigureSvg(torqueHistoryData(r), title, caption) };
}
