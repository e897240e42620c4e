import * as Plot from '@observablehq/plot';
import type { Results } from '../../results/results.ts';
import { inDisplay, show, unitLabel } from '../../views/display-units.ts';
import { describePlasticPiece } from '../../views/plastic-lines.ts';
import { plotToSvg } from './plot-svg.ts';
import type { ReportFigure } from './report-figure.ts';
import { FIGURE_WIDTH } from './svg-frame.ts';
import { torqueTwistInTimeFigure } from './torque-twist-in-time.ts';

/**
 * Torque against twist of the most strained piece during the stop: the loading path to the peak,
 * the elastic unloading line down to the permanent twist, and the energy the piece absorbed
 * shaded under the loading path. Every number comes from `results.plastic`. Drawn only when the
 * shaft went past yield (an elastic stop's curve is a straight line with no permanent twist).
 * Where the verdict past yield stands on the dynamic model, its piece's path in time instead
 * (`torqueTwistInTimeFigure`).
 */
export function torqueTwistFigure(r: Results): ReportFigure | undefined {
  if (r.pastYieldBasis === 'dynamic model') return torqueTwistInTimeFigure(r);
  const u = r.case.units;
  const ms = r.plastic.mostStrained;
  if (r.plastic.verdict === 'elastic' || ms.curve.length < 2) return undefined;
  const side = r.plastic.sides.find((s) => s.side === ms.side)!;
  const piece = side.pieces[ms.index];
  const deg = (rad: number) => inDisplay(rad, 'angle', u);
  const tq = (nm: number) => inDisplay(nm, 'torque', u);
  const path = ms.curve.map((p) => ({ x: deg(p.twist), y: tq(p.torque) }));
  const peak = { x: deg(piece.state.twist), y: tq(side.peakTorque) };
  const rest = { x: deg(piece.state.permanentTwist), y: 0 };
  const unloading = [peak, rest];
  const xMax = peak.x * 1.08 || 1;
  const marks: Plot.Markish[] = [
    Plot.areaY(path, { x: 'x', y: 'y', fill: '#4e79a7', fillOpacity: 0.25, ariaDescription: 'absorbed energy' }),
    Plot.ruleY([0]),
    Plot.line(path, { x: 'x', y: 'y', stroke: '#4e79a7', strokeWidth: 2, ariaDescription: 'loading path' }),
    Plot.line(unloading, { x: 'x', y: 'y', stroke: '#e15759', strokeWidth: 1.5, strokeDasharray: '5,3', ariaDescription: 'unloading line' }),
    Plot.dot([peak], { x: 'x', y: 'y', fill: '#e15759', r: 3.5, ariaDescription: 'peak' }),
    Plot.dot([rest], { x: 'x', y: 'y', fill: '#000', r: 3.5, ariaDescription: 'permanent twist' }),
    Plot.text([peak], { x: 'x', y: 'y', text: () => `peak ${show(side.peakTorque, 'torque', u)}`, dy: -10, textAnchor: 'end', ariaDescription: 'peak label' }),
    Plot.text([rest], { x: 'x', y: 'y', text: () => `permanent twist ${show(piece.state.permanentTwist, 'angle', u)}`, dy: -10, dx: -6, textAnchor: 'end', ariaDescription: 'permanent twist label' }),
    Plot.text([{ x: peak.x * 0.5, y: peak.y * 0.45 }], { x: 'x', y: 'y', text: () => `absorbed ${show(piece.state.energy, 'energy', u)}`, ariaDescription: 'absorbed energy label' }),
  ];
  if (Number.isFinite(piece.yieldTorque) && piece.yielded) {
    marks.push(Plot.ruleY([tq(piece.plasticTorque)], { stroke: '#999', strokeDasharray: '2,3', ariaDescription: 'fully plastic torque' }));
    marks.push(
      Plot.text([{ x: 0, y: tq(piece.plasticTorque) }], {
        x: 'x',
        y: 'y',
        text: () => `fully plastic ${show(piece.plasticTorque, 'torque', u)}`,
        dy: -7,
        dx: 6,
        textAnchor: 'start',
        fill: '#666',
        ariaDescription: 'fully plastic label',
      }),
    );
  }
  const options: Plot.PlotOptions = {
    width: FIGURE_WIDTH,
    height: 300,
    marginLeft: 70,
    marginBottom: 45,
    x: { label: `twist of the piece (${unitLabel('angle', u)})`, domain: [0, xMax] },
    y: { label: `torque (${unitLabel('torque', u)})`, domain: [0, Math.max(peak.y, tq(Number.isFinite(piece.plasticTorque) ? piece.plasticTorque : 0)) * 1.12 || 1] },
    marks,
  };
  const where = describePlasticPiece(piece, u);
  const title = `Torque against twist of the most strained piece (side ${side.side})`;
  const caption =
    `${where}: loading path to the peak torque of ${show(side.peakTorque, 'torque', u)} at ${show(piece.state.twist, 'angle', u)}, ` +
    `elastic unloading to a permanent twist of ${show(piece.state.permanentTwist, 'angle', u)}; shaded, the ${show(piece.state.energy, 'energy', u)} the piece absorbed. ` +
    `${r.case.analysis.hardening === 'linear' ? 'Linear strain hardening assumed' : 'Elastic–perfectly plastic'}; net section, no kt.`;
  return { name: 'torque-twist', title, caption, svg: plotToSvg(options, title, caption) };
}
