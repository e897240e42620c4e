import * as Plot from '@observablehq/plot';
import type { Results } from '../../results/results.ts';
import type { TwistFinding } from '../../results/twist-findings.ts';
import { inDisplay, show, sig, unitLabel } from '../../views/display-units.ts';
import { plotToSvg } from './plot-svg.ts';
import type { ReportFigure } from './report-figure.ts';
import { FIGURE_WIDTH } from './svg-frame.ts';

/**
 * For each measured permanent twist: the predicted permanent twist between its stations against
 * the speed at the stop, with the recorded speed (and its band) and the measured twist marked, so
 * the back-calculated speed reads off where they cross. Measurements with no loaded shaft between
 * their stations have no curve and no figure; nor has a measured zero where no speed leaves any twist.
 */
export function permanentTwistSpeedFigures(r: Results): ReportFigure[] {
  return r.observedFindings.twist.flatMap((f, i) => (hasData(f) ? [figure(r, f, i)] : []));
}

/** A curve to draw, and not only zeros against a measured zero (nothing to read off). */
function hasData(f: TwistFinding): boolean {
  return f.curve.length > 0 && (f.measurement.angle > 0 || f.curve.some((p) => p.permanentTwist > 0));
}

function figure(r: Results, f: TwistFinding, i: number): ReportFigure {
  const u = r.case.units;
  const rpm = (w: number) => inDisplay(w, 'speed', u);
  const deg = (rad: number) => inDisplay(rad, 'angle', u);
  const curve = f.curve.map((p) => ({ x: rpm(p.speed), y: deg(p.permanentTwist) }));
  const measured = deg(f.measurement.angle);
  const tol = deg(f.angleTolerance);
  const yTop = Math.max(measured + tol, ...curve.map((p) => p.y)) * 1.1 || 1;
  // Judged over the case's tolerances, the shaded band is the 5–95 % interval of the speeds that
  // explain the measured twist; otherwise it is the band on the recorded speed.
  const [lo, hi] = f.speedRange;
  const explained = f.band.basis === 'monte-carlo' && lo !== undefined && hi !== undefined;
  const band = explained
    ? Plot.rectY([{ x1: rpm(lo), x2: rpm(hi) }], { x1: 'x1', x2: 'x2', y1: 0, y2: yTop, fill: '#59a14f', fillOpacity: 0.15, ariaDescription: 'speeds that explain the measured twist' })
    : Plot.rectY([{ x1: rpm(f.band.low), x2: rpm(f.band.high) }], { x1: 'x1', x2: 'x2', y1: 0, y2: yTop, fill: '#f28e2b', fillOpacity: 0.15, ariaDescription: 'recorded speed band' });
  const xMax = curve[curve.length - 1].x;
  const marks: Plot.Markish[] = [
    band,
    ...(tol > 0
      ? [
          Plot.rect([{ x1: 0, x2: xMax, y1: Math.max(0, measured - tol), y2: measured + tol }], {
            x1: 'x1',
            x2: 'x2',
            y1: 'y1',
            y2: 'y2',
            fill: '#59a14f',
            fillOpacity: 0.18,
            ariaDescription: 'measured twist band',
            title: () => `measured ${show(f.measurement.angle, 'angle', u)} ± ${show(f.angleTolerance, 'angle', u)}`,
          }),
        ]
      : []),
    Plot.ruleX([rpm(f.recordedSpeed)], { stroke: '#f28e2b', strokeWidth: 1.5, ariaDescription: 'recorded speed' }),
    Plot.ruleY([measured], { stroke: '#59a14f', strokeWidth: 1.5, strokeDasharray: '5,3', ariaDescription: 'measured twist' }),
    Plot.ruleY([0]),
    Plot.line(curve, { x: 'x', y: 'y', stroke: '#4e79a7', strokeWidth: 2, ariaDescription: 'permanent twist against speed' }),
    Plot.dot(curve, {
      x: 'x',
      y: 'y',
      r: 3,
      fill: 'transparent',
      stroke: 'none',
      title: (p: { x: number; y: number }) => `${sig(p.x)} ${unitLabel('speed', u)}: ${sig(p.y)} ${unitLabel('angle', u)} permanent twist`,
    }),
    Plot.text([{ x: rpm(f.recordedSpeed), y: yTop }], {
      x: 'x',
      y: 'y',
      text: () => `recorded ${show(f.recordedSpeed, 'speed', u, 4)}`,
      dy: 10,
      dx: 4,
      textAnchor: 'start',
      ariaDescription: 'recorded speed label',
    }),
    Plot.text([{ x: 0, y: measured }], {
      x: 'x',
      y: 'y',
      text: () => `measured ${show(f.measurement.angle, 'angle', u)}`,
      dy: -6,
      dx: 4,
      textAnchor: 'start',
      ariaDescription: 'measured twist label',
    }),
  ];
  if (f.speedForMeasured !== undefined && f.measurement.angle > 0) {
    const hit = { x: rpm(f.speedForMeasured), y: measured };
    marks.push(Plot.ruleX([hit.x], { y1: 0, y2: measured, stroke: '#59a14f', strokeDasharray: '2,2', ariaDescription: 'speed for measured twist' }));
    marks.push(Plot.dot([hit], { x: 'x', y: 'y', fill: '#59a14f', r: 4, ariaDescription: 'speed for measured twist point' }));
    marks.push(Plot.text([hit], { x: 'x', y: 'y', text: () => show(f.speedForMeasured!, 'speed', u, 4), dy: 14, dx: 4, textAnchor: 'start', ariaDescription: 'speed for measured twist label' }));
  }
  const [a, b] = f.measurement.between;
  const options: Plot.PlotOptions = {
    width: FIGURE_WIDTH,
    height: 300,
    marginLeft: 60,
    marginBottom: 45,
    x: { label: `speed at the stop (${unitLabel('speed', u)})`, domain: [0, xMax] },
    y: { label: `permanent twist (${unitLabel('angle', u)})`, domain: [0, yTop] },
    marks,
  };
  const read =
    f.speedForMeasured === undefined
      ? 'no speed leaves the measured twist'
      : f.measurement.angle > 0
        ? `the measured twist is left by a stop from ${show(f.speedForMeasured, 'speed', u, 4)}`
        : `no twist means a stop from at most ${show(f.speedForMeasured, 'speed', u, 4)}`;
  const bandWords = explained
    ? ` (orange line); shaded green, the 5–95 % interval of the speeds that explain the measured twist over the case's tolerances, ${show(lo, 'speed', u, 4)} to ${show(hi, 'speed', u, 4)}`
    : ` with its ${f.band.basis === 'default' ? 'default ±10 %' : 'stated'} band (shaded orange)`;
  const title = `Permanent twist between "${a}" and "${b}" against the speed at the stop`;
  const caption = `Predicted permanent twist between the stations for a stop from each speed; the recorded ${show(f.recordedSpeed, 'speed', u, 4)}${bandWords}, and the measured ${show(f.measurement.angle, 'angle', u)}${tol > 0 ? ` ± ${show(f.angleTolerance, 'angle', u)} (its band shaded green across)` : ' (the case states no ± on it)'}: ${read}.`;
  return { name: `permanent-twist-speed-${i + 1}`, title, caption, svg: plotToSvg(options, title, caption) };
}
