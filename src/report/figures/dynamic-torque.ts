import type { Investigation } from '../../finding/investigation.ts';
import { sig, unitLabel } from '../../views/display-units.ts';
import { torqueHistoryData } from '../../views/dynamic-figure-data.ts';
import { ringingSentence, ringsOn } from '../../views/ringing.ts';
import type { ReportFigure } from './report-figure.ts';
import { lineFigureSvg } from './line-figure.ts';

/** Torque against time in the finding's governing piece of shaft and in every slip element. */
export function dynamicTorqueFigure(r: Investigation): ReportFigure {
  const d = r.dynamic;
  const title = 'Torque against time, dynamic model';
  const data = torqueHistoryData(r);
  const governing = data.points.length > 0 ? data.points[0].series : undefined;
  const series = data.points.filter((p) => p.series === governing).map((p) => p.y);
  const a = ringsOn(series);
  const ringing = a === undefined || governing === undefined ? [] : [{ name: governing, amplitude: `${sig(a)} ${unitLabel('torque', r.case.units)}` }];
  const caption = `Torque in the finding's governing piece of shaft${d.slips.length > 0 ? ' and in each slip element' : ''} from the stop's start, positive where it resists the stop. Time step ${(d.timeStep * 1e6).toPrecision(3)} µs; ${d.elements} shaft element${d.elements === 1 ? '' : 's'}.${ringingSentence(r, ringing)}`;
  return { name: 'dynamic-torque', title, caption, svg: lineFigureSvg(data, title, caption) };
}
