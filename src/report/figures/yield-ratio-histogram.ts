import * as Plot from '@observablehq/plot';
import type { Results } from '../../results/results.ts';
import { sig } from '../../views/display-units.ts';
import { chanceOfYieldWords } from '../../views/uncertainty-summary.ts';
import { plotToSvg } from './plot-svg.ts';
import type { ReportFigure } from './report-figure.ts';
import { FIGURE_WIDTH } from './svg-frame.ts';

/** Bins of the histogram across the samples' range. */
const BINS = 40;

/**
 * The stress / shear yield of every Monte Carlo sample as a histogram, with the yield line (ratio 1), the
 * single run and the 5th and 95th percentiles marked. The samples and percentiles come from
 * `results.uncertainty`; the binning is the only thing done here. Undefined without an uncertainty run.
 */
export function yieldRatioHistogramFigure(r: Results): ReportFigure | undefined {
  const un = r.uncertainty;
  if (!un || un.yieldRatioSamples.length === 0) return undefined;
  const samples = Array.from(un.yieldRatioSamples);
  const [p5, , p95] = un.percentiles.yieldRatio;
  let lo = Infinity;
  let hi = -Infinity;
  for (const y of samples) {
    lo = Math.min(lo, y);
    hi = Math.max(hi, y);
  }
  // The yield line is always in view, so the figure shows how far the finding is from it.
  const pad = 0.04 * (Math.max(hi, 1) - Math.min(lo, 1) || 1);
  const domain: [number, number] = [Math.max(0, Math.min(lo, 1) - pad), Math.max(hi, 1) + pad];
  // A label reads away from the nearer edge of the plot.
  const side = (x: number) => (x > (domain[0] + domain[1]) / 2 ? 'end' : 'start');
  const top = (label: string, x: number, fill: string, dy: number, anchor: 'start' | 'end' = 'start') =>
    Plot.text([{ x }], { x: 'x', frameAnchor: 'top', text: () => label, dy, dx: anchor === 'start' ? 4 : -4, textAnchor: anchor, fill, ariaDescription: `${label.split(',')[0]} label` });
  const marks: Plot.Markish[] = [
    Plot.rectY(samples, Plot.binX<Plot.RectYOptions>({ y: 'count' }, { x: (d: number) => d, thresholds: BINS, fill: '#4e79a7', inset: 0.5, ariaDescription: 'samples' })),
    Plot.ruleY([0]),
    Plot.ruleX([p5, p95], { stroke: '#555', strokeDasharray: '2,3', ariaDescription: '5th and 95th percentiles' }),
    Plot.ruleX([r.yieldRatio], { stroke: 'black', strokeWidth: 1.5, strokeDasharray: '6,3', ariaDescription: 'single run' }),
    Plot.ruleX([1], { stroke: '#b22222', strokeWidth: 2, ariaDescription: 'yield line' }),
    top('yield, ratio 1', 1, '#b22222', 4, side(1)),
    top(`single run, ${sig(r.yieldRatio)}`, r.yieldRatio, 'black', 18, side(r.yieldRatio)),
  ];
  const options: Plot.PlotOptions = {
    width: FIGURE_WIDTH,
    height: 340,
    marginLeft: 60,
    marginRight: 20,
    marginTop: 36,
    marginBottom: 42,
    x: { domain, label: 'stress / shear yield (elastic method, kt applied)', labelAnchor: 'center' },
    y: { label: `samples (of ${un.samples})`, grid: true },
    marks,
  };
  const chance = chanceOfYieldWords(un);
  const title = 'Stress / shear yield over the tolerances (Monte Carlo)';
  const caption = `Stress / shear yield of each of the ${un.samples} samples (seed ${un.seed}); dotted lines: the 5th and 95th percentiles, ${sig(p5)} and ${sig(p95)}; dashed: the single run, ${sig(r.yieldRatio)}; red: yield (ratio 1). ${chance}.`;
  return { name: 'uncertainty-yield-ratio', title, caption, svg: plotToSvg(options, title, caption) };
}
