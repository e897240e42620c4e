import { describe, expect, it } from 'vitest';
import { yieldRatioHistogramFigure } from '../../../src/report/figures/yield-ratio-histogram.ts';
import { fixture } from '../report-fixtures.ts';
import { checkFigure, xScaleFromTicks } from './figure-checks.ts';

describe('yieldRatioHistogramFigure', () => {
  const r = fixture('screw-conveyor-jam-us.yaml').results;
  const f = yieldRatioHistogramFigure(r)!;

  it('yieldRatioHistogramFigure is a framed SVG with its title, caption and labelled axes', () => {
    checkFigure(f, 'uncertainty-yield-ratio', [/^stress \/ shear yield \(elastic method, kt applied\)/, /samples \(of 10000\)/, /^yield, ratio 1$/, /^single run, 0\.855$/]);
    expect(f.caption).toContain(`seed ${r.uncertainty!.seed}`);
    expect(f.caption).toContain('% of the 10000 samples reach a stress / shear yield of 1 or more');
  });

  it('yieldRatioHistogramFigure draws the yield line at a ratio of exactly 1 and the single run at its ratio', () => {
    const document = checkFigure(f, 'uncertainty-yield-ratio', []);
    const x = xScaleFromTicks(document);
    const at = (mark: string) => Number(document.querySelector(`[aria-description="${mark}"] line`)!.getAttribute('x1'));
    expect(at('yield line')).toBeCloseTo(x(1), 1);
    expect(at('single run')).toBeCloseTo(x(r.yieldRatio), 1);
  });

  it('yieldRatioHistogramFigure has bars spanning the samples, none drawn outside their range', () => {
    const document = checkFigure(f, 'uncertainty-yield-ratio', []);
    const x = xScaleFromTicks(document);
    const bars = [...document.querySelectorAll('[aria-description="samples"] rect')];
    expect(bars.length).toBeGreaterThan(10);
    const samples = Array.from(r.uncertainty!.yieldRatioSamples);
    const [lo, hi] = [Math.min(...samples), Math.max(...samples)];
    // Bins are rounded out to tick steps of the data's range: allow one bin width either side.
    const width = Number(bars[0].getAttribute('width')) + 1;
    for (const b of bars) {
      const left = Number(b.getAttribute('x'));
      expect(left).toBeGreaterThanOrEqual(x(lo) - 2 * width);
      expect(left).toBeLessThanOrEqual(x(hi) + width);
    }
  });

  it('yieldRatioHistogramFigure is drawn only with an uncertainty run, and the same seed draws the same bytes', () => {
    expect(yieldRatioHistogramFigure(fixture('sample').results)).toBeUndefined();
    expect(yieldRatioHistogramFigure(r)!.svg).toBe(f.svg);
  });
});
