import * as Plot from '@observablehq/plot';
import type { IncidentLog } from '../log/build-log.ts';
import { occurredTime } from '../log/occurred-time.ts';
import { plotToSvg } from '../report/figures/plot-svg.ts';
import { marginFor } from '../report/figures/svg-frame.ts';

/** A figure of the log page: its file name (for the image link), title and SVG. */
export interface LogFigure {
  name: string;
  title: string;
  svg: string;
}

/** The finding's verdicts and the marker each has, named in the caption (Plot's legends are HTML and lost from an SVG). */
const VERDICT_SYMBOLS: [string, string][] = [
  ['elastic', 'circle'],
  ['yielded locally', 'triangle'],
  ['yielded', 'square'],
  ['fracture predicted', 'cross'],
];
const LINE = 14;

/** The three figures of the log page: incidents in time by verdict, cumulative damage per asset, stress / shear yield per incident. */
export function logFigures(log: IncidentLog): LogFigure[] {
  const dated = log.incidents.filter((r) => r.asset !== null && occurredTime(r.occurred) !== null).map((r) => ({ ...r, date: new Date(occurredTime(r.occurred)!) }));
  const figures: LogFigure[] = [];
  const assets = log.assets.map((a) => a.asset);
  if (dated.length > 0) {
    const title = 'Incidents over time per asset';
    figures.push({
      name: 'incidents-over-time',
      title,
      svg: plotToSvg(
        {
          width: 760,
          height: 120 + 40 * assets.length,
          marginLeft: marginFor(assets),
          x: { type: 'utc', label: 'date of the incident', grid: true },
          y: { label: null, domain: assets },
          symbol: { domain: VERDICT_SYMBOLS.map((v) => v[0]), range: VERDICT_SYMBOLS.map((v) => v[1]) },
          marks: [Plot.dot(dated, { x: 'date', y: 'asset', symbol: 'verdict', r: 6, stroke: 'black', strokeWidth: 1.5, ariaDescription: 'incident' })],
        },
        title,
        `Each marker is an incident. Markers by the finding's verdict: ${VERDICT_SYMBOLS.map(([v, s]) => `${s} ${v}`).join(', ')}.`,
      ),
    });
    const cumulative = assets.flatMap((asset) => {
      let sum = 0;
      return dated.filter((r) => r.asset === asset).map((r) => ({ asset, date: r.date, damage: (sum += r.damage) }));
    });
    const t2 = 'Cumulative fatigue damage per asset';
    const legend = assets.map((name, i) =>
      Plot.text([name], { frameAnchor: 'top-left', dx: 8, dy: -LINE * (assets.length - i) - 8, text: (d: string) => `— ${d}`, fill: (d: string) => d, textAnchor: 'start', fontSize: 11 }),
    );
    figures.push({
      name: 'cumulative-damage',
      title: t2,
      svg: plotToSvg(
        {
          width: 760,
          height: 340 + LINE * assets.length,
          marginTop: 24 + LINE * assets.length,
          marginLeft: 64,
          x: { type: 'utc', label: 'date of the incident', grid: true },
          y: { label: 'Miner sum (1 = crack initiation expected)', grid: true, domain: [0, Math.max(1.1, ...cumulative.map((c) => c.damage))] },
          color: { type: 'categorical', domain: assets },
          marks: [
            Plot.ruleY([1], { stroke: '#c00', strokeDasharray: '4 3', ariaDescription: 'life limit' }),
            Plot.lineY(cumulative, { x: 'date', y: 'damage', z: 'asset', stroke: 'asset', strokeWidth: 1.5, curve: 'step-after', ariaDescription: 'cumulative damage' }),
            Plot.dot(cumulative, { x: 'date', y: 'damage', stroke: 'asset', r: 3 }),
            ...legend,
          ],
        },
        t2,
        "The Palmgren–Miner sum of each asset's incidents, in the order they occurred, against 1 (dashed), where a crack is expected. Fatigue estimates scatter by a factor of several in life.",
      ),
    });
  }
  if (log.incidents.length > 0) {
    const labels = log.incidents.map((r) => (r.asset ? `${r.asset} · ${r.id}` : r.id));
    const rows = log.incidents.map((r, i) => ({ label: labels[i], ratio: r.yield_ratio, verdict: r.verdict }));
    const t3 = 'Stress over shear yield per incident';
    figures.push({
      name: 'yield-ratio-per-incident',
      title: t3,
      svg: plotToSvg(
        {
          width: 760,
          height: 80 + 24 * rows.length,
          marginLeft: marginFor(labels),
          x: { label: 'stress (kt applied) / shear yield', grid: true },
          y: { label: null, domain: labels },
          marks: [
            Plot.barX(rows, { x: 'ratio', y: 'label', fill: '#6a8caf', ariaDescription: 'incident ratio' }),
            Plot.ruleX([1], { stroke: '#c00', strokeDasharray: '4 3', ariaDescription: 'yield' }),
          ],
        },
        t3,
        "The finding's stress at the governing piece (kt applied) over shear yield, per incident; 1 (dashed) is yield at the stress raiser.",
      ),
    });
  }
  return figures;
}
