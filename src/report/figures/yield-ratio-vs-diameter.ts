import * as Plot from '@observablehq/plot';
import type { ResizeResult } from '../../resize/resize-result.ts';
import { sideYieldRatio } from '../../resize/side-ratio.ts';
import type { Results } from '../../results/results.ts';
import { inDisplay, sig, unitLabel } from '../../views/display-units.ts';
import { segName } from '../../views/resize-words.ts';
import { plotToSvg } from './plot-svg.ts';
import type { ReportFigure } from './report-figure.ts';
import { FIGURE_WIDTH } from './svg-frame.ts';

/**
 * Repeat-incident stress / shear yield of the governing side against the diameter of its critical segment
 * (the others as they are), with the line of the design factor (1/N) and the stock sizes marked.
 * Every point is a rerun of the engine made by the resize options; nothing is computed here.
 * Undefined when the sweep has no points.
 */
export function yieldRatioAgainstDiameterFigure(results: Results, resize: ResizeResult): ReportFigure | undefined {
  const u = results.case.units;
  const k = resize.criticalSegment;
  if (k.sweep.length < 2) return undefined;
  const d = (m: number) => inDisplay(m, 'length', u);
  const seg = segName(k.segment);
  const sidePoints = k.sweep.map((p) => ({ x: d(p.diameter), y: p.sideYieldRatio }));
  const ownPoints = k.sweep.map((p) => ({ x: d(p.diameter), y: p.segmentYieldRatio }));
  const ys = [...sidePoints, ...ownPoints].map((p) => p.y).concat(1 / resize.designFactor);
  const yMin = Math.min(...ys) * 0.8;
  const yMax = Math.max(...ys) * 1.1;
  const log = yMax / yMin > 20;
  const tickTop = log ? yMin * 1.12 : yMin + (yMax - yMin) * 0.04;
  const marks: Plot.Markish[] = [
    Plot.ruleX(k.stockSizes.map(d), { y1: yMin, y2: tickTop, stroke: '#888' }),
    Plot.ruleY([1 / resize.designFactor], { stroke: '#b00', strokeDasharray: '5 3' }),
    Plot.text([{ x: d(k.sweep[k.sweep.length - 1].diameter), y: 1 / resize.designFactor }], {
      x: 'x',
      y: 'y',
      text: () => `1/N = ${sig(1 / resize.designFactor)} (N = ${sig(resize.designFactor)})`,
      dy: -7,
      textAnchor: 'end',
      fill: '#b00',
    }),
    Plot.ruleX([d(k.segment.diameter)], { stroke: '#555', strokeDasharray: '2 3' }),
    Plot.text([{ x: d(k.segment.diameter), y: yMax }], { x: 'x', y: 'y', text: () => 'present', dy: 8, dx: 4, textAnchor: 'start' }),
    Plot.line(ownPoints, { x: 'x', y: 'y', stroke: '#6a8fc7', strokeDasharray: '4 2' }),
    Plot.line(sidePoints, { x: 'x', y: 'y', stroke: '#1f4e9c', strokeWidth: 2 }),
  ];
  if (k.stockDiameter !== undefined && k.stockRerun) {
    const pt = [{ x: d(k.stockDiameter), y: sideYieldRatio(k.stockRerun, k.side) }];
    marks.push(
      Plot.dot(pt, { x: 'x', y: 'y', r: 4, fill: 'black' }),
      Plot.text(pt, { x: 'x', y: 'y', text: () => `stock Ø${sig(pt[0].x)} ${unitLabel('length', u)}`, dx: 6, dy: -8, textAnchor: 'start' }),
    );
  }
  const options: Plot.PlotOptions = {
    width: FIGURE_WIDTH,
    height: 300,
    marginLeft: 56,
    marginRight: 24,
    marginBottom: 42,
    x: { label: `diameter of ${seg} (${unitLabel('length', u)})`, labelAnchor: 'center' },
    y: { type: log ? 'log' : 'linear', domain: [yMin, yMax], label: 'repeat-incident stress / shear yield', grid: true, tickFormat: '~g' },
    marks,
  };
  const title = `Repeat-incident stress / shear yield against the diameter of ${seg}`;
  const caption = `Highest stress / shear yield on side ${k.side} (solid) and of ${seg} itself (dashed) in a repeat of the incident, the other segments as they are and the bore ratio kept; each point is a rerun of the elastic energy method. Dashed red line: 1/N for the design factor N = ${sig(resize.designFactor)}. Ticks at the foot: stock sizes (${resize.stockSeries}).`;
  return { name: 'resize-yield-ratio-vs-diameter', title, caption, svg: plotToSvg(options, title, caption) };
}
