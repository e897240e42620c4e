import * as Plot from '@observablehq/plot';
import type { Results } from '../../results/results.ts';
import { show, sig } from '../../views/display-units.ts';
import type { ReportFigure } from './report-figure.ts';
import { plotToSvg } from './plot-svg.ts';
import { FIGURE_WIDTH, marginFor } from './svg-frame.ts';

/** Bars of each part's share of the kinetic energy the shaft had to take. */
export function energyShareFigure(r: Results): ReportFigure | undefined {
  const u = r.case.units;
  const bars = r.sides.flatMap((s) =>
    s.parts.map((p) => ({
      full: `${s.side} · ${p.station} · ${p.part.name}${p.part.count > 1 ? ` ×${p.part.count}` : ''}`,
      label: '',
      share: (100 * p.kineticEnergy) / r.kineticEnergy,
      energy: p.kineticEnergy,
    })),
  );
  const seen = new Map<string, number>();
  for (const b of bars) {
    const short = truncate(b.full, 48);
    const n = (seen.get(short) ?? 0) + 1;
    seen.set(short, n);
    b.label = n === 1 ? short : `${short} (${n})`;
  }
  if (bars.length === 0 || !(r.kineticEnergy > 0)) return undefined;
  const labels = bars.map((b) => b.label);
  const options: Plot.PlotOptions = {
    width: FIGURE_WIDTH,
    height: 50 + 32 * bars.length,
    marginLeft: marginFor(labels),
    marginRight: 110,
    x: { domain: [0, 100], label: 'share of the kinetic energy at the stop (%)', labelAnchor: 'center', grid: true },
    y: { domain: labels, label: null },
    marks: [
      Plot.barX(bars, { x: 'share', y: 'label', fill: '#4a78a8' }),
      Plot.text(bars, { x: 'share', y: 'label', text: (b) => `${sig(b.share)} % (${show(b.energy, 'energy', u)})`, textAnchor: 'start', dx: 4 }),
      Plot.ruleX([0]),
    ],
  };
  const top = bars.reduce((a, b) => (b.share > a.share ? b : a));
  const title = 'Share of the kinetic energy by part';
  const caption = `Each bar is one part's share of the ${show(r.kineticEnergy, 'energy', u)} the shaft had to take at the stop (side · station · part); the largest share, ${sig(top.share)} %, is "${top.full}", the part whose inertia matters most.`;
  return { name: 'energy-share', title, caption, svg: plotToSvg(options, title, caption) };
}

function truncate(text: string, n: number): string {
  return text.length <= n ? text : `${text.slice(0, n - 1)}…`;
}
