import * as Plot from '@observablehq/plot';
import type { Results } from '../../results/results.ts';
import { sig } from '../../views/display-units.ts';
import { inputName } from '../../views/uncertainty-summary.ts';
import { plotToSvg } from './plot-svg.ts';
import type { ReportFigure } from './report-figure.ts';
import { FIGURE_WIDTH, marginFor } from './svg-frame.ts';

const LOW = '#4e79a7';
const HIGH = '#f28e2b';

/**
 * One bar per varied input, from stress / shear yield with the input at the low end of its band to the
 * ratio at the high end (the others held at the single run's values), largest swing at the top, the
 * single run's ratio and, where it is in range, yield (ratio 1) marked. The swings come from
 * `results.uncertainty.sensitivity`. Undefined without an uncertainty run.
 */
export function sensitivityFigure(r: Results): ReportFigure | undefined {
  const swings = r.uncertainty?.sensitivity ?? [];
  if (swings.length === 0) return undefined;
  const rows = swings.map((s) => ({ name: inputName(s.input), low: s.low, high: s.high }));
  const names = rows.map((b) => b.name);
  const values = rows.flatMap((b) => [b.low, b.high]).concat(r.yieldRatio);
  const [lo, hi] = [Math.min(...values), Math.max(...values)];
  // Yield (ratio 1) is brought into view when it lies within one span of the bars.
  const span = hi - lo || Math.abs(hi) || 1;
  const yieldInView = lo - span <= 1 && 1 <= hi + span;
  const [from, to] = yieldInView ? [Math.min(lo, 1), Math.max(hi, 1)] : [lo, hi];
  const pad = 0.15 * (to - from || 1);
  const domain: [number, number] = [from - pad, to + pad];
  // Each bar in two halves from the single run: to the input's low end (blue) and to its high end (orange).
  const half = (end: 'low' | 'high') => rows.map((b) => ({ name: b.name, x1: r.yieldRatio, x2: b[end], value: b[end] }));
  // Each end's value is written just outside its bar, away from the single run.
  const label = (end: 'low' | 'high', outward: 'left' | 'right') =>
    Plot.text(
      half(end).filter((d) => (outward === 'right' ? d.value >= r.yieldRatio : d.value < r.yieldRatio)),
      {
        x: 'x2',
        y: 'name',
        text: (d) => sig(d.value),
        dx: outward === 'right' ? 4 : -4,
        textAnchor: outward === 'right' ? 'start' : 'end',
        fill: end === 'low' ? LOW : HIGH,
        ariaDescription: `${end} end value`,
      },
    );
  const marks: Plot.Markish[] = [
    Plot.barX(half('low'), { x1: 'x1', x2: 'x2', y: 'name', fill: LOW, insetTop: 6, insetBottom: 6, ariaDescription: 'input at the low end of its band' }),
    Plot.barX(half('high'), { x1: 'x1', x2: 'x2', y: 'name', fill: HIGH, insetTop: 6, insetBottom: 6, ariaDescription: 'input at the high end of its band' }),
    label('low', 'left'),
    label('low', 'right'),
    label('high', 'left'),
    label('high', 'right'),
    Plot.ruleX([r.yieldRatio], { stroke: 'black', strokeWidth: 1.5, ariaDescription: 'single run' }),
    Plot.text([{ x: r.yieldRatio }], { x: 'x', frameAnchor: 'bottom', text: () => `single run ${sig(r.yieldRatio)}`, dy: -4, dx: 4, textAnchor: 'start', ariaDescription: 'single run label' }),
    ...(yieldInView
      ? [
          Plot.ruleX([1], { stroke: '#b22222', strokeWidth: 2, strokeDasharray: '5,3', ariaDescription: 'yield line' }),
          Plot.text([{ x: 1 }], { x: 'x', frameAnchor: 'top', text: () => 'yield, ratio 1', dy: -10, dx: 4, textAnchor: 'start', fill: '#b22222', ariaDescription: 'yield line label' }),
        ]
      : []),
  ];
  const options: Plot.PlotOptions = {
    width: FIGURE_WIDTH,
    height: 70 + 44 * rows.length,
    marginLeft: marginFor(names),
    marginRight: 30,
    marginTop: 30,
    marginBottom: 40,
    x: { domain, label: 'stress / shear yield in a run with this input at the end of its band', labelAnchor: 'center', grid: true },
    y: { domain: names, label: null },
    marks,
  };
  const top = swings[0];
  const title = 'Which input moves stress / shear yield most';
  const caption = `Each input swung across its band (±2σ), the others held at the single run's values: blue, the input at the low end; orange, at the high end; the black line is the single run's ${sig(r.yieldRatio)}${yieldInView ? ', the red dashed line yield' : ''}. Largest swing at the top: ${inputName(top.input)}, ${sig(top.low)} to ${sig(top.high)}.`;
  return { name: 'uncertainty-sensitivity', title, caption, svg: plotToSvg(options, title, caption) };
}
