import * as Plot from '@observablehq/plot';
import type { ResizeResult } from '../../resize/resize-result.ts';
import type { Results } from '../../results/results.ts';
import { inDisplay, unitLabel } from '../../views/display-units.ts';
import { plotToSvg } from './plot-svg.ts';
import type { ReportFigure } from './report-figure.ts';
import { FIGURE_WIDTH } from './svg-frame.ts';

/**
 * Repeat-incident peak torque against a torque limiter's setting, with the incident's unlimited
 * peak and the setting window (running torque × service factor to the shaft's allowable torque).
 * The points come from the resize options' limiter sweep (the energy method: a dynamic rerun at
 * every setting would be too slow); nothing is computed here. Undefined when the sweep has no points.
 */
export function peakTorqueAgainstLimiterFigure(results: Results, resize: ResizeResult): ReportFigure | undefined {
  const u = results.case.units;
  const l = resize.limiter;
  if (l.sweep.length < 2) return undefined;
  const t = (v: number) => inDisplay(v, 'torque', u);
  const label = unitLabel('torque', u);
  const points = l.sweep.map((s) => ({ x: t(s.setting), y: t(s.peakTorque) }));
  // The sweep is the energy method's; its own unlimited peak keeps the figure on one method.
  const unlimited = t(l.sweep[0].unlimitedTorque);
  const yMin = points[0].y * 0.9;
  const yMax = Math.max(unlimited, ...points.map((p) => p.y)) * 1.25;
  const xEnd = points[points.length - 1].x;
  const marks: Plot.Markish[] = [];
  if (l.min !== undefined && !l.windowEmpty) marks.push(Plot.rect([{ x1: t(l.min), x2: t(l.max) }], { x1: 'x1', x2: 'x2', y1: yMin, y2: yMax, fill: '#cfe3cf' }));
  marks.push(
    Plot.ruleY([unlimited], { stroke: '#b00', strokeDasharray: '5 3' }),
    Plot.text([{ x: points[0].x, y: unlimited }], { x: 'x', y: 'y', text: () => "no limiter: the incident's peak", dy: -7, dx: 4, textAnchor: 'start', fill: '#b00' }),
    Plot.ruleX([t(l.max)], { stroke: '#1f4e9c' }),
    Plot.text([{ x: t(l.max), y: yMax }], { x: 'x', y: 'y', text: () => 'allowable', dy: 8, dx: 4, textAnchor: 'start', fill: '#1f4e9c' }),
  );
  if (l.min !== undefined) {
    marks.push(
      Plot.ruleX([t(l.min)], { stroke: '#555', strokeDasharray: '2 3' }),
      Plot.text([{ x: t(l.min), y: yMin }], {
        x: 'x',
        y: 'y',
        text: () => (l.windowEmpty ? 'running × service factor (window empty)' : 'running × service factor'),
        dy: -8,
        dx: -4,
        textAnchor: 'end',
      }),
    );
  }
  marks.push(Plot.line(points, { x: 'x', y: 'y', stroke: 'black' }));
  const options: Plot.PlotOptions = {
    width: FIGURE_WIDTH,
    height: 300,
    marginLeft: 64,
    marginRight: 24,
    marginBottom: 42,
    x: { type: 'log', label: `limiter setting (${label})`, labelAnchor: 'center', domain: [points[0].x, xEnd], tickFormat: '~s' },
    y: { type: 'log', label: `repeat-incident peak torque (${label})`, domain: [yMin, yMax], grid: true, tickFormat: '~s' },
    marks,
  };
  const window = l.min === undefined ? 'the lower end is unknown (no running torque in the case)' : l.windowEmpty ? 'the window is empty' : 'shaded: the window of settings';
  const title = `Repeat-incident peak torque against the limiter's setting at "${l.station}"`;
  const caption = `Both axes logarithmic. Peak torque between the limiter and the stop in a repeat of the incident against the limiter's slip torque (${l.sweep[0].method}${l.slip.slipMethod === 'dynamic model' ? "; the option's own setting is checked through the dynamic model in the text" : ''}). Dashed red line: the incident's peak without a limiter. Blue line: the shaft's allowable torque at the design factor; ${window}.`;
  return { name: 'resize-peak-torque-vs-limiter', title, caption, svg: plotToSvg(options, title, caption) };
}
