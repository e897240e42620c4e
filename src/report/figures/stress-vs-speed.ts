import * as Plot from '@observablehq/plot';
import { buildShaftModel } from '../../model/shaft-model.ts';
import { energyMethodSide } from '../../physics/energy-method.ts';
import type { Results } from '../../results/results.ts';
import { inDisplay, show, sig, unitLabel } from '../../views/display-units.ts';
import type { ReportFigure } from './report-figure.ts';
import { plotToSvg } from './plot-svg.ts';
import { FIGURE_WIDTH } from './svg-frame.ts';

/** Samples of the sweep from zero to 1.5 × the incident's speed. */
const SAMPLES = 30;
const SPAN = 1.5;

/**
 * The stress in the governing piece against the speed at the stop, from zero to 1.5 × the
 * incident's speed, each point from the engine's energy method itself (`energyMethodSide` on the
 * case at that speed; the dynamic model is not rerun for a figure of the elastic method).
 * In the elastic energy method the stress is proportional to the speed (T = √(2E/C), E ∝ ω²), so
 * yield begins at the incident speed divided by stress / shear yield; the sweep shows it and the
 * figure's test checks the engine agrees.
 */
export function stressVsSpeedFigure(r: Results): ReportFigure | undefined {
  const u = r.case.units;
  const rpm = (w: number) => inDisplay(w, 'speed', u);
  const stress = (pa: number) => inDisplay(pa, 'stress', u);
  const model = buildShaftModel(r.case);
  const points = Array.from({ length: SAMPLES + 1 }, (_, i) => {
    const speed = (SPAN * r.speed * i) / SAMPLES;
    const pieces = model.sides.flatMap((side) => energyMethodSide(side, speed, r.case.materials, r.case.analysis.criterion).pieces);
    const governing = pieces.reduce((a, b) => (b.yieldRatio > a.yieldRatio ? b : a));
    return { x: rpm(speed), y: stress(governing.shearStress) };
  });
  const tauY = stress(r.governing.piece.shearYield);
  const yieldSpeed = yieldOnsetSpeed(r);
  const incident = { x: rpm(r.speed), y: stress(r.governing.piece.shearStress) };
  const xMax = rpm(SPAN * r.speed);
  const top = Math.max(tauY, ...points.map((p) => p.y)) * 1.1;
  const yieldShown = yieldSpeed <= SPAN * r.speed;
  const options: Plot.PlotOptions = {
    width: FIGURE_WIDTH,
    height: 270,
    marginLeft: 60,
    marginRight: 20,
    x: { domain: [0, xMax], label: `speed at the stop (${unitLabel('speed', u)})`, labelAnchor: 'center' },
    y: { domain: [0, top], label: `shear stress (${unitLabel('stress', u)})`, grid: true },
    marks: [
      Plot.ruleY([0]),
      Plot.ruleY([tauY], { stroke: '#555', strokeDasharray: '6,4' }),
      Plot.text([{ x: xMax, y: tauY }], { x: 'x', y: 'y', text: () => 'shear yield', dy: -7, textAnchor: 'end', fill: '#555' }),
      ...(yieldShown
        ? [
            Plot.ruleX([rpm(yieldSpeed)], { stroke: '#c77800', strokeDasharray: '3,3' }),
            Plot.dot([{ x: rpm(yieldSpeed), y: tauY }], { x: 'x', y: 'y', r: 4, fill: '#c77800' }),
            Plot.text([{ x: rpm(yieldSpeed), y: top }], { x: 'x', y: 'y', text: () => `yield begins, ${show(yieldSpeed, 'speed', u)}`, dy: 8, dx: 4, textAnchor: 'start', fill: '#c77800' }),
          ]
        : []),
      Plot.line(points, { x: 'x', y: 'y', stroke: '#1f4e8c', strokeWidth: 2, strokeOpacity: r.yieldRatio > 1 ? 0.55 : 1, ariaDescription: 'elastic stress' }),
      Plot.dot(points, {
        x: 'x',
        y: 'y',
        r: 4,
        fill: 'transparent',
        stroke: 'none',
        title: (p: { x: number; y: number }) => `${sig(p.x)} ${unitLabel('speed', u)}: elastic ${sig(p.y)} ${unitLabel('stress', u)}`,
      }),
      ...(r.yieldRatio > 1
        ? [
            // Past yield the real stress is held at shear yield (elastic–perfectly plastic): the capped value.
            Plot.line(
              points.map((p) => ({ x: p.x, y: Math.min(p.y, tauY) })),
              { x: 'x', y: 'y', stroke: '#b22222', strokeWidth: 2.5, ariaDescription: 'capped stress' },
            ),
            Plot.text([incident], {
              x: 'x',
              y: 'y',
              text: () => 'elastic: fictitious past yield',
              dy: -14,
              dx: -8,
              textAnchor: 'end',
              fill: '#1f4e8c',
              fontStyle: 'italic',
              ariaDescription: 'elastic past yield note',
            }),
          ]
        : []),
      Plot.dot([incident], { x: 'x', y: 'y', r: 5, fill: '#b22222' }),
      Plot.text([incident], { x: 'x', y: 'y', text: () => `incident, ${show(r.speed, 'speed', u, 4)}`, dx: -8, textAnchor: 'end', fill: '#b22222' }),
    ],
  };
  const title = r.yieldRatio > 1 ? 'Peak shear stress against the speed at the stop: elastic values, fictitious past yield' : 'Peak shear stress against the speed at the stop';
  const where = yieldShown
    ? `yield begins at ${show(yieldSpeed, 'speed', u)}, ${sig((100 * yieldSpeed) / r.speed)} % of the incident's ${show(r.speed, 'speed', u, 4)}`
    : `yield would begin only at ${show(yieldSpeed, 'speed', u)}, beyond the plotted range`;
  const capped =
    r.yieldRatio > 1 ? ' Above yield the blue line is fictitious (no real stress exceeds shear yield); the red line is the stress the section can really carry, capped at shear yield.' : '';
  const caption = `The elastic stress in the most-loaded piece grows in proportion to the speed at the stop (energy method); ${where}.${capped}`;
  return { name: 'stress-vs-speed', title, caption, svg: plotToSvg(options, title, caption) };
}

/** The speed at the stop at which the governing piece just reaches shear yield, rad/s (stress ∝ speed). */
export function yieldOnsetSpeed(r: Results): number {
  return r.speed / r.yieldRatio;
}
