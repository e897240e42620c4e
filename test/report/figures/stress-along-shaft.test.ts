import { describe, expect, it } from 'vitest';
import { stressAlongShaftFigure } from '../../../src/report/figures/stress-along-shaft.ts';
import { drawFigures } from '../../../src/report/draw-figures.ts';
import { fixture } from '../report-fixtures.ts';
import { checkFigure, roundNumbers } from './figure-checks.ts';

describe('stressAlongShaftFigure', () => {
  it('stressAlongShaftFigure has its title, caption, axes with units and the kt labels', () => {
    checkFigure(stressAlongShaftFigure(fixture('sample').results)!, 'stress-along-shaft', [
      /^position from the shaft's start \(mm\)/,
      /shear stress \(MPa\)/,
      /^kt 2.2$/,
      /^kt 1.4$/,
      /^shear yield$/,
      /^stop$/,
    ]);
  });

  it("the steps stand in the ratio of the pieces' stresses (kt applied)", () => {
    const r = fixture('sample').results;
    const f = stressAlongShaftFigure(r)!;
    // The elastic stress line visits each piece's two ends at that piece's height.
    const group = f.svg.slice(f.svg.indexOf('aria-description="elastic stress"'));
    const path = /<path d="(M[^"]+)"/.exec(group)![1];
    const ys = path
      .split(/[ML]/)
      .filter(Boolean)
      .map((p) => Number(p.split(',')[1]));
    const baseline = Number(/aria-label="rule"><line[^>]*y1="([\d.]+)"/.exec(f.svg)![1]);
    const pieces = [...r.sides[0].pieces].sort((a, b) => a.piece.start - b.piece.start);
    const heights = pieces.map((_, i) => baseline - ys[2 * i]);
    pieces.forEach((p, i) => expect(heights[i] / heights[0]).toBeCloseTo(p.shearStress / pieces[0].shearStress, 2));
  });

  it('every figure is drawn the same, byte for byte, when drawn again', () => {
    const { data } = fixture('two-sided-pump.yaml');
    expect(drawFigures(data).map((f) => f.figure.svg)).toEqual(drawFigures(data).map((f) => f.figure.svg));
  });

  it('the stress-along-shaft SVG of the two-sided case matches its snapshot after rounding', () => {
    expect(roundNumbers(stressAlongShaftFigure(fixture('two-sided-pump.yaml').results)!.svg)).toMatchSnapshot();
  });
});
