import * as Plot from '@observablehq/plot';
import type { Results } from '../../results/results.ts';
import { inDisplay, show, sig, unitLabel } from '../../views/display-units.ts';
import { describeDynamicPiece } from '../../views/dynamic-past-yield.ts';
import { plotToSvg } from './plot-svg.ts';
import type { ReportFigure } from './report-figure.ts';
import { FIGURE_WIDTH } from './svg-frame.ts';

/**
 * Torque against twist of the piece the dynamic model left most twisted, as it went through the
 * incident: the path sampled in time (loading, yield, the reversals as the machine rang down) and
 * the permanent twist it keeps once unloaded. Every number comes from `results.dynamic`. Drawn
 * where the verdict past yield stands on the dynamic model and a piece took a permanent twist.
 */
export function torqueTwistInTimeFigure(r: Results): ReportFigure | undefined {
  const path = r.dynamic.yieldPath;
  if (r.pastYieldBasis !== 'dynamic model' || !path) return undefined;
  const u = r.case.units;
  const p = r.dynamic.pieces[path.piece];
  const deg = (rad: number) => inDisplay(rad, 'angle', u);
  const tq = (nm: number) => inDisplay(nm, 'torque', u);
  const points = Array.from(path.twist, (t, i) => ({ x: deg(t), y: tq(path.torque[i]) }));
  const rest = { x: deg(p.permanentTwist), y: 0 };
  const top = Math.max(...points.map((q) => Math.abs(q.y)), tq(p.peakTorque)) * 1.12 || 1;
  const xs = [...points.map((q) => q.x), rest.x, 0];
  const marks: Plot.Markish[] = [
    Plot.ruleY([0]),
    Plot.ruleX([0]),
    Plot.line(points, { x: 'x', y: 'y', stroke: '#4e79a7', strokeWidth: 1.8, ariaDescription: 'path in time' }),
    Plot.dot([points[0]], { x: 'x', y: 'y', fill: '#4e79a7', r: 3, ariaDescription: 'start' }),
    Plot.dot([rest], { x: 'x', y: 'y', fill: '#000', r: 3.5, ariaDescription: 'permanent twist' }),
    Plot.text([rest], { x: 'x', y: 'y', text: () => `permanent twist ${show(p.permanentTwist, 'angle', u)}`, dy: 14, textAnchor: 'end', ariaDescription: 'permanent twist label' }),
    Plot.ruleY([tq(p.peakTorque)], { stroke: '#999', strokeDasharray: '2,3', ariaDescription: 'peak torque' }),
    Plot.text([{ x: Math.min(...xs), y: tq(p.peakTorque) }], {
      x: 'x',
      y: 'y',
      text: () => `peak ${show(p.peakTorque, 'torque', u)}`,
      dy: -7,
      textAnchor: 'start',
      fill: '#666',
      ariaDescription: 'peak label',
    }),
  ];
  const options: Plot.PlotOptions = {
    width: FIGURE_WIDTH,
    height: 300,
    marginLeft: 70,
    marginBottom: 45,
    x: { label: `twist of the piece (${unitLabel('angle', u)})`, domain: [Math.min(...xs) * 1.05, Math.max(...xs) * 1.08 || 1] },
    y: { label: `torque (${unitLabel('torque', u)})`, domain: [-top, top] },
    marks,
  };
  const title = `Torque against twist of the most twisted piece in time (side ${p.side}, dynamic model)`;
  const caption =
    `${describeDynamicPiece(p, u)}: the path through the incident, sampled in time (${r.dynamic.histories.time.length} samples over ${sig(r.dynamic.duration * 1000)} ms), ` +
    `with the torque capped by plasticity at ${show(p.peakTorque, 'torque', u)} and a permanent twist of ${show(p.permanentTwist, 'angle', u)} once unloaded${path.plasticWork > 0 ? `; the piece turned ${show(path.plasticWork, 'energy', u)} into heat by plastic flow (the area inside the path)` : ''}. ${r.case.analysis.hardening === 'linear' ? 'Linear strain hardening' : 'Elastic–perfectly plastic'} on the net section, no kt; Masing's rule on reversals.`;
  return { name: 'torque-twist', title, caption, svg: plotToSvg(options, title, caption) };
}
