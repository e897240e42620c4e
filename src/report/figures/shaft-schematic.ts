import * as Plot from '@observablehq/plot';
import type { Part } from '../../case/case.ts';
import type { Results } from '../../results/results.ts';
import { inDisplay, sig, unitLabel } from '../../views/display-units.ts';
import type { ReportFigure } from './report-figure.ts';
import { plotToSvg } from './plot-svg.ts';
import { FIGURE_WIDTH } from './svg-frame.ts';
import { placeLabels, type PlacedLabel } from './label-layout.ts';

interface Block {
  x1: number;
  x2: number;
  y1: number;
  y2: number;
  toScale: boolean;
  label: string;
  /** The part's station, display units. */
  at: number;
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

  // Every part centred at its station, as wide as it is thick: parts at one station overlap, as they sit there.
  const blocks: Block[] = [];
  for (const st of c.stations) {
    for (const p of st.parts) {
      const { width, height, toScale } = partSize(p, diameterAt(st.at), shaftLength);
      blocks.push({ x1: len(st.at - width / 2), x2: len(st.at + width / 2), y1: len(-height / 2), y2: len(height / 2), toScale, label: p.name, at: len(st.at) });
    }
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
  // Labels placed so that none overlaps another or runs past the figure's edge (placeLabels).
  const px = (x: number) => MARGIN.left + ((x - xDomain[0]) / (xDomain[1] - xDomain[0])) * innerWidth;
  const stationText = (s: (typeof c.stations)[number]) => (s === stop ? `STOP: ${s.name}` : s.name);
  const stationLabels = placeLabels(c.stations, (s) => px(len(s.at)), stationText, FIGURE_WIDTH);
  const partLabels = placeLabels(
    blocks,
    (b) => px(b.at),
    (b) => b.label,
    FIGURE_WIDTH,
  );
  const rows = Math.max(1, ...stationLabels.map((l) => l.row + 1));
  const partRows = Math.max(1, ...partLabels.map((l) => l.row + 1));
  // Plot's text anchor and offset are one value per mark: one mark per anchor and row.
  const anchored = <T>(labels: PlacedLabel<T>[], mark: (ls: PlacedLabel<T>[], anchor: 'start' | 'middle' | 'end', row: number) => Plot.Markish) =>
    (['start', 'middle', 'end'] as const).flatMap((a) =>
      [...new Set(labels.map((l) => l.row))].map((row) =>
        mark(
          labels.filter((l) => l.anchor === a && l.row === row),
          a,
          row,
        ),
      ),
    );

  const options: Plot.PlotOptions = {
    width: FIGURE_WIDTH,
    height: Math.round(innerHeight + MARGIN.top + MARGIN.bottom + 12 * (rows - 1) + 11 * (partRows - 1)),
    ...Object.fromEntries(Object.entries(MARGIN).map(([k, v]) => [`margin${k[0].toUpperCase()}${k.slice(1)}`, v])),
    marginTop: MARGIN.top + 12 * (rows - 1),
    marginBottom: MARGIN.bottom + 11 * (partRows - 1),
    x: { domain: xDomain, label: `position from the shaft's start (${unitLabel('length', u)})`, labelAnchor: 'center' },
    y: { domain: yDomain, label: `radius (${unitLabel('length', u)})` },
    marks: [
      Plot.rect(
        blocks.filter((b) => !b.toScale),
        { x1: 'x1', x2: 'x2', y1: 'y1', y2: 'y2', fill: '#efe6d3', stroke: '#6b5a3a', strokeDasharray: '4,3', title: (b: Block) => `${b.label} (not to scale)` },
      ),
      Plot.rect(
        blocks.filter((b) => b.toScale),
        {
          x1: 'x1',
          x2: 'x2',
          y1: 'y1',
          y2: 'y2',
          fill: '#d9c7a3',
          stroke: '#6b5a3a',
          fillOpacity: 0.9,
          title: (b: Block) => `${b.label}: ${sig(b.x2 - b.x1, 3)} × Ø${sig(b.y2 - b.y1, 3)} ${unitLabel('length', u)}, centred at ${sig(b.at, 4)}`,
        },
      ),
      Plot.rect(segments, {
        x1: (s) => len(s.start),
        x2: (s) => len(s.end),
        y1: (s) => len(-s.diameter / 2),
        y2: (s) => len(s.diameter / 2),
        fill: '#b8bec7',
        stroke: '#333',
        title: (s: (typeof segments)[number]) => `${s.label ?? `segment ${s.index + 1}`}: Ø${sig(len(s.diameter), 3)} ${unitLabel('length', u)}, ${sig(len(s.start), 4)} to ${sig(len(s.end), 4)}`,
      }),
      Plot.rect(
        segments.filter((s) => s.bore > 0),
        { x1: (s) => len(s.start), x2: (s) => len(s.end), y1: (s) => len(-s.bore / 2), y2: (s) => len(s.bore / 2), fill: 'white', stroke: '#333', strokeDasharray: '3,2' },
      ),
      Plot.text(segments, { x: (s) => len((s.start + s.end) / 2), y: (s) => len(-s.diameter / 2), text: (s) => `Ø${sig(len(s.diameter), 3)}`, dy: 10, fontSize: 9 }),
      Plot.ruleX(
        c.stations.filter((s) => s !== stop),
        { x: (s) => len(s.at), stroke: '#777', strokeDasharray: '2,3' },
      ),
      Plot.ruleX([stop], { x: (s) => len(s.at), stroke: '#b22222', strokeWidth: 2.5 }),
      ...anchored(stationLabels, (ls, a, row) =>
        Plot.text(ls, {
          x: (l) => len(l.item.at),
          y: yDomain[1],
          text: (l) => stationText(l.item),
          textAnchor: a,
          lineAnchor: 'bottom',
          dy: -4 - 12 * row,
          fill: (l) => (l.item === stop ? '#b22222' : '#333'),
          fontWeight: 'bold',
          ariaDescription: 'station label',
        }),
      ),
      ...anchored(partLabels, (ls, a, row) =>
        Plot.text(ls, {
          x: (l) => l.item.at,
          y: yDomain[0],
          text: (l) => l.item.label,
          textAnchor: a,
          lineAnchor: 'bottom',
          dy: -3 - 11 * row,
          fontSize: 9,
          fill: '#6b5a3a',
          ariaDescription: 'part label',
        }),
      ),
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
