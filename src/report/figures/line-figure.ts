import * as Plot from '@observablehq/plot';
import type { FigureData } from '../../views/dynamic-figure-data.ts';
import { plotToSvg } from './plot-svg.ts';

const LEGEND_LINE = 14;

/**
 * A line chart of named series with its legend drawn as text marks in the top margin (Plot's own
 * legends are HTML and would be lost from a standalone SVG).
 */
export function lineFigureSvg(data: FigureData, title: string, caption: string, opts: { markers?: boolean } = {}): string {
  const names = [...new Set(data.points.map((p) => p.series))];
  const marks: Plot.Markish[] = [Plot.ruleY([0], { stroke: '#bbb' }), Plot.lineY(data.points, { x: 'x', y: 'y', z: 'series', stroke: 'series', strokeWidth: 1.5 })];
  if (opts.markers) marks.push(Plot.dot(data.points, { x: 'x', y: 'y', stroke: 'series', r: 2 }));
  names.forEach((name, i) => {
    marks.push(
      Plot.text([name], { frameAnchor: 'top-left', dx: 8, dy: -LEGEND_LINE * (names.length - i) - 8, text: (d: string) => `— ${d}`, fill: (d: string) => d, textAnchor: 'start', fontSize: 11 }),
    );
  });
  return plotToSvg(
    {
      width: 760,
      height: 260 + LEGEND_LINE * names.length,
      marginTop: 24 + LEGEND_LINE * names.length,
      marginLeft: 64,
      marginRight: 24,
      x: { label: data.xLabel },
      y: { label: data.yLabel, grid: true },
      color: { type: 'categorical', domain: names },
      marks,
    },
    title,
    caption,
  );
}
