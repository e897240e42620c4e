import * as Plot from '@observablehq/plot';
import type { Part } from '../../case/case.ts';
import type { Results } from '../../results/results.ts';
import { inDisplay, sig, unitLabel } from '../../views/display-units.ts';
import type { ReportFigure } from './report-figure.ts';
import { plotToSvg } from './plot-svg.ts';
import { FIGURE_WIDTH } from './svg-frame.ts';

interface Block {
  x1: number;
  x2: number;
  y1: number;
  y2: number;
  toScale: boolean;
  label: string;
}

const MARGIN = { top: 34, right: 20, bottom: 40, left: 56 };

/**
 * The shaft as modelled, drawn to scale: each segment a rectangle of its length and diameter (bores
 * dashed), stations as thin lines, the stop in red, parts as blocks. A disc is drawn at its size; a
 * mass as the solid disc of the same radius of gyration (radius k·√2); a part given only by its
 * inertia, or turning through a ratio, as a dashed block not to scale.
 */
export function shaftSchematicFigure(r: Results): ReportFigure | undefined {
  const c = r.case;
  const u = c.units;
  const len = (m: number) => inDisplay(m, 'length', u);
  const segments = c.shaft.segments;
  if (segments.length === 0) return undefined;
  const shaftLength = segments[segments.length - 1].end;
  const diameterAt = (x: number) => (segments.find((s) => x >= s.start && x <= s.end) ?? segments[0]).diameter;

  const blocks: Block[] = [];
  for (const st of c.stations) {
    const sizes = st.parts.map((p) => partSize(p, diameterAt(st.at), shaftLength));
    const total = sizes.reduce((a, s) => a + s.width, 0);
    let x = st.at - total / 2;
    st.parts.forEach((p, i) => {
      const { width, height, toScale } = sizes[i];
      blocks.push({ x1: len(x), x2: len(x + width), y1: len(-height / 2), y2: len(height / 2), toScale, label: p.name });
      x += width;
    });
  }
  const radius = Math.max(...segments.map((s) => len(s.diameter / 2)), ...blocks.map((b) => b.y2));
  const xPad = len(shaftLength) * 0.04;
  const xDomain: [number, number] = [-xPad, len(shaftLength) + xPad];
  const yDomain: [number, number] = [-radius * 1.25, radius * 1.25];
  // Same scale on both axes: the plot's inner height follows from its inner width.
  const innerWidth = FIGURE_WIDTH - MARGIN.left - MARGIN.right;
  const natural = (innerWidth * (yDomain[1] - yDomain[0])) / (xDomain[1] - xDomain[0]);
  const innerHeight = Math.min(420, Math.max(120, natural));
  const stretch = innerHeight / natural;
  const stop = c.stations.find((s) => s.name === c.stop.at)!;

  const options: Plot.PlotOptions = {
    width: FIGURE_WIDTH,
    height: Math.round(innerHeight + MARGIN.top + MARGIN.bottom),
    ...Object.fromEntries(Object.entries(MARGIN).map(([k, v]) => [`margin${k[0].toUpperCase()}${k.slice(1)}`, v])),
    x: { domain: xDomain, label: `position from the shaft's start (${unitLabel('length', u)})`, labelAnchor: 'center' },
    y: { domain: yDomain, label: `radius (${unitLabel('length', u)})` },
    marks: [
      Plot.rect(blocks.filter((b) => b.toScale), { x1: 'x1', x2: 'x2', y1: 'y1', y2: 'y2', fill: '#d9c7a3', stroke: '#6b5a3a' }),
      Plot.rect(blocks.filter((b) => !b.toScale), { x1: 'x1', x2: 'x2', y1: 'y1', y2: 'y2', fill: '#efe6d3', stroke: '#6b5a3a', strokeDasharray: '4,3' }),
      Plot.rect(segments, { x1: (s) => len(s.start), x2: (s) => len(s.end), y1: (s) => len(-s.diameter / 2), y2: (s) => len(s.diameter / 2), fill: '#b8bec7', stroke: '#333' }),
      Plot.rect(segments.filter((s) => s.bore > 0), { x1: (s) => len(s.start), x2: (s) => len(s.end), y1: (s) => len(-s.bore / 2), y2: (s) => len(s.bore / 2), fill: 'white', stroke: '#333', strokeDasharray: '3,2' }),
      Plot.text(segments, { x: (s) => len((s.start + s.end) / 2), y: (s) => len(-s.diameter / 2), text: (s) => `Ø${sig(len(s.diameter), 3)}`, dy: 10, fontSize: 9 }),
      Plot.ruleX(c.stations.filter((s) => s !== stop), { x: (s) => len(s.at), stroke: '#777', strokeDasharray: '2,3' }),
      Plot.text(c.stations.filter((s) => s !== stop), { x: (s) => len(s.at), y: yDomain[1], text: 'name', dy: 6 }),
      Plot.ruleX([stop], { x: (s) => len(s.at), stroke: '#b22222', strokeWidth: 2.5 }),
      Plot.text([stop], { x: (s) => len(s.at), y: yDomain[1], text: (s) => `STOP: ${s.name}`, dy: -8, fill: '#b22222', fontWeight: 'bold' }),
      Plot.text(blocks, { x: (b) => (b.x1 + b.x2) / 2, y: 'y1', text: 'label', dy: 10, fontSize: 9, fill: '#6b5a3a' }),
    ],
  };
  const title = 'The shaft as modelled';
  const scale = Math.abs(stretch - 1) < 1e-9 ? 'drawn to scale' : `radii drawn ${sig(stretch, 2)} × the length scale`;
  const caption = `Segments (grey, each marked with Ø and its diameter) and parts (brown; dashed where the size is not known or the part turns through a ratio), ${scale}; the red line is the stop at "${stop.name}", where the shaft was held while the parts kept turning.`;
  return { name: 'shaft-schematic', title, caption, svg: plotToSvg(options, title, caption) };
}

/** A part's block, m: a disc at its size, a mass as the equivalent solid disc, anything else nominal. */
function partSize(p: Part, shaftDiameter: number, shaftLength: number): { width: number; height: number; toScale: boolean } {
  const nominalWidth = Math.min(shaftLength * 0.05, 2 * shaftDiameter);
  if (p.speedRatio === 1 && p.shape === 'disc') return { width: p.dimensions.thickness, height: p.dimensions.diameter, toScale: true };
  if (p.speedRatio === 1 && p.shape === 'mass') return { width: nominalWidth * 2, height: 2 * Math.SQRT2 * p.dimensions.radius_of_gyration, toScale: false };
  return { width: nominalWidth, height: 2 * shaftDiameter, toScale: false };
}
