import * as Plot from '@observablehq/plot';
import type { Results } from '../../results/results.ts';
import { inDisplay, show, sig, unitLabel } from '../../views/display-units.ts';
import type { ReportFigure } from './report-figure.ts';
import { plotToSvg } from './plot-svg.ts';
import { FIGURE_WIDTH } from './svg-frame.ts';

interface StepPoint {
  x: number;
  y: number;
  series: string;
}

/**
 * The incident's shear stress along the shaft, piece by piece (kt applied), as steps over position,
 * against the shear yield of each piece's material.
 */
export function stressAlongShaftFigure(r: Results): ReportFigure | undefined {
  const u = r.case.units;
  const len = (m: number) => inDisplay(m, 'length', u);
  const stress = (pa: number) => inDisplay(pa, 'stress', u);
  const stressPts: StepPoint[] = [];
  const cappedPts: StepPoint[] = [];
  const yieldPts: StepPoint[] = [];
  const ktLabels: { x: number; y: number; text: string }[] = [];
  for (const side of r.sides) {
    const pieces = [...side.pieces].sort((a, b) => a.piece.start - b.piece.start);
    for (const p of pieces) {
      const series = `side ${side.side}`;
      stressPts.push({ x: len(p.piece.start), y: stress(p.shearStress), series }, { x: len(p.piece.end), y: stress(p.shearStress), series });
      // Past yield the real stress is held at shear yield (elastic–perfectly plastic): the capped value.
      const capped = stress(Math.min(p.shearStress, p.shearYield));
      cappedPts.push({ x: len(p.piece.start), y: capped, series }, { x: len(p.piece.end), y: capped, series });
      yieldPts.push({ x: len(p.piece.start), y: stress(p.shearYield), series }, { x: len(p.piece.end), y: stress(p.shearYield), series });
      if (p.piece.segment.kt !== 1) ktLabels.push({ x: len((p.piece.start + p.piece.end) / 2), y: stress(p.shearStress), text: `kt ${p.piece.segment.kt}` });
    }
  }
  if (stressPts.length === 0) return undefined;
  const shaftEnd = len(r.case.shaft.segments[r.case.shaft.segments.length - 1].end);
  const stopAt = len(r.case.stations.find((s) => s.name === r.case.stop.at)!.at);
  const top = Math.max(...stressPts.map((p) => p.y), ...yieldPts.map((p) => p.y)) * 1.15;
  const firstYield = yieldPts.reduce((a, b) => (b.x < a.x ? b : a));
  const pastYield = r.sides.some((s) => s.pieces.some((p) => p.shearStress > p.shearYield));
  const highest = stressPts.reduce((a, b) => (b.y > a.y ? b : a));
  const options: Plot.PlotOptions = {
    width: FIGURE_WIDTH,
    height: 270,
    marginLeft: 60,
    marginRight: 20,
    x: { domain: [0, shaftEnd], label: `position from the shaft's start (${unitLabel('length', u)})`, labelAnchor: 'center' },
    y: { domain: [0, top], label: `shear stress (${unitLabel('stress', u)})`, grid: true },
    marks: [
      Plot.ruleY([0]),
      Plot.ruleX([stopAt], { stroke: '#b22222', strokeWidth: 2 }),
      Plot.text([{ x: stopAt, y: top }], { x: 'x', y: 'y', text: () => 'stop', fill: '#b22222', dy: 8, dx: 4, textAnchor: 'start', fontWeight: 'bold' }),
      Plot.line(yieldPts, { x: 'x', y: 'y', z: 'series', stroke: '#555', strokeDasharray: '6,4' }),
      Plot.text([firstYield], { x: 'x', y: 'y', text: () => 'shear yield', dy: 10, textAnchor: 'start', fill: '#555' }),
      Plot.line(stressPts, {
        x: 'x',
        y: 'y',
        z: 'series',
        stroke: '#1f4e8c',
        strokeWidth: 2,
        strokeOpacity: pastYield ? 0.55 : 1,
        ariaDescription: 'elastic stress',
        title: () => 'elastic shear stress (kt applied)',
      }),
      Plot.dot(stressPts, {
        x: 'x',
        y: 'y',
        r: 6,
        fill: 'transparent',
        stroke: 'none',
        title: (p: StepPoint) => `${p.series}, ${sig(p.x)} ${unitLabel('length', u)}: elastic ${sig(p.y)} ${unitLabel('stress', u)}`,
      }),
      ...(pastYield
        ? [
            Plot.line(cappedPts, {
              x: 'x',
              y: 'y',
              z: 'series',
              stroke: '#b22222',
              strokeWidth: 2.5,
              ariaDescription: 'capped stress',
              title: () => 'the real stress past yield: capped at shear yield',
            }),
            Plot.text([highest], {
              x: 'x',
              y: 'y',
              text: () => 'elastic: fictitious past yield',
              dy: -20,
              textAnchor: 'middle',
              fill: '#1f4e8c',
              fontStyle: 'italic',
              ariaDescription: 'elastic past yield note',
            }),
          ]
        : []),
      Plot.text(ktLabels, { x: 'x', y: 'y', text: 'text', dy: -8, fill: '#1f4e8c' }),
    ],
  };
  const g = r.governing;
  const title = pastYield ? 'Shear stress along the shaft at the stop: elastic values, fictitious past yield' : 'Shear stress along the shaft at the stop';
  const capNote = pastYield
    ? ` Past yield these elastic values are fictitious: no real stress exceeds shear yield. The red line is the stress the shaft can really carry there, capped at shear yield (elastic–perfectly plastic); how far past yield the incident went is their ratio, and the torque and twist past yield are in the findings.`
    : '';
  const caption = `The blue line is the elastic shear stress in each loaded piece of shaft (kt applied where given), the dashed line the shear yield of its material; the highest, ${show(g.piece.shearStress, 'stress', u)} on side ${g.side.side}, is ${sig(r.yieldRatio)} × yield.${capNote} Shaft beyond the last loaded station carries no torque.`;
  return { name: 'stress-along-shaft', title, caption, svg: plotToSvg(options, title, caption) };
}
