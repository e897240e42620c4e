import type { Results } from '../../results/results.ts';
import { show } from '../../views/display-units.ts';
import { stationSpeedData } from '../../views/dynamic-figure-data.ts';
import { ringingSentence, ringsOn } from '../../views/ringing.ts';
import type { ReportFigure } from './report-figure.ts';
import { lineFigureSvg } from './line-figure.ts';

/** Station speeds against time (a rotor behind a belt at shaft speed too). */
export function dynamicSpeedsFigure(r: Results): ReportFigure {
  const title = 'Station speeds against time, dynamic model';
  const ringing = r.dynamic.histories.speeds.flatMap((s) => {
    const a = ringsOn(s.values);
    return a === undefined ? [] : [{ name: s.name, amplitude: show(a, 'speed', r.case.units) }];
  });
  const caption = `Speed of each station (and of a motor rotor behind a belt, reflected to shaft speed) from the stop's start. The stop station follows the prescribed stop${r.case.stop.duration > 0 ? ` over ${(r.case.stop.duration * 1000).toPrecision(3)} ms` : ''}.${ringingSentence(r, ringing)}`;
  return { name: 'dynamic-speeds', title, caption, svg: lineFigureSvg(stationSpeedData(r), title, caption) };
}
