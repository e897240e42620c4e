import { describe, expect, it } from 'vitest';
import { sensitivityFigure } from '../../../src/report/figures/sensitivity-chart.ts';
import { inputName } from '../../../src/views/uncertainty-summary.ts';
import { fixture } from '../report-fixtures.ts';
import { checkFigure, xScaleFromTicks } from './figure-checks.ts';

describe('sensitivityFigure', () => {
  const r = fixture('exhaust-fan-seized-impeller.yaml').results;
  const swings = r.uncertainty!.sensitivity;
  const f = sensitivityFigure(r)!;
  const document = checkFigure(f, 'uncertainty-sensitivity', [/^stress \/ shear yield in a run with this input at the end of its band/, /^single run 20\.5$/]);

  it('sensitivityFigure names every input down its side, largest swing at the top', () => {
    const labels = [...document.querySelectorAll('[aria-label="y-axis tick label"] text')];
    expect(labels.map((t) => t.textContent)).toEqual(swings.map((s) => inputName(s.input)));
    const ys = labels.map((t) => Number(/translate\([-\d.]+,([-\d.]+)\)/.exec(t.getAttribute('transform')!)![1]));
    expect([...ys].sort((a, b) => a - b)).toEqual(ys);
  });

  it('sensitivityFigure leaves room for the longest input name (Plot cannot measure text in Node)', () => {
    const longest = Math.max(...swings.map((s) => inputName(s.input).length));
    const tickX = Number(/translate\(([-\d.]+),/.exec(document.querySelector('[aria-label="y-axis tick label"] text')!.getAttribute('transform')!)![1]);
    // 10 px system-ui averages under 6 px a character.
    expect(tickX).toBeGreaterThanOrEqual(6 * longest);
  });

  it('sensitivityFigure draws each input from the single run to the ratio at each end of its band', () => {
    const x = xScaleFromTicks(document);
    for (const end of ['low', 'high'] as const) {
      const bars = [...document.querySelectorAll(`[aria-description="input at the ${end} end of its band"] rect`)];
      expect(bars).toHaveLength(swings.length);
      bars.forEach((b, i) => {
        const [x1, w] = [Number(b.getAttribute('x')), Number(b.getAttribute('width'))];
        const [a, c] = [x(r.yieldRatio), x(swings[i][end])].sort((p, q) => p - q);
        expect(x1).toBeCloseTo(a, 0);
        expect(x1 + w).toBeCloseTo(c, 0);
      });
    }
  });

  it('sensitivityFigure marks yield only when it lies near the bars', () => {
    expect(document.querySelector('[aria-description="yield line"]')).toBeNull();
    const near = checkFigure(sensitivityFigure(fixture('screw-conveyor-jam-us.yaml').results)!, 'uncertainty-sensitivity', [/^yield, ratio 1$/]);
    expect(near.querySelector('[aria-description="yield line"] line')).not.toBeNull();
    expect(sensitivityFigure(fixture('sample').results)).toBeUndefined();
  });
});
