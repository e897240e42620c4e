import { readdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { drawFigures } from '../../src/report/draw-figures.ts';
import type { FigureDrawer } from '../../src/report/figures/report-figure.ts';
import { checkFigure } from './figures/figure-checks.ts';
import { fixture, SAMPLE_CASES } from './report-fixtures.ts';

const CASES = [...readdirSync(SAMPLE_CASES).filter((f) => f.endsWith('.yaml')), 'two-sided-pump.yaml', 'elastic-fan.yaml', 'hostile.yaml'];

describe('drawFigures', () => {
  it.each(CASES)('every figure drawn for %s is a framed standalone SVG with its title and caption, each name once', (name) => {
    const figures = drawFigures(fixture(name).data);
    for (const { figure } of figures) checkFigure(figure, figure.name, []);
    const names = figures.map((f) => f.figure.name);
    expect(new Set(names).size).toBe(names.length);
  });

  it("drawFigures places each of a drawer's figures in its section and leaves out a drawer with nothing to show", () => {
    const one = { name: 'a', title: 'A', caption: 'a', svg: '<svg/>' };
    const registry: { section: string; draw: FigureDrawer }[] = [
      { section: 's1', draw: () => one },
      { section: 's2', draw: () => undefined },
      { section: 's3', draw: () => [one, { ...one, name: 'b' }] },
    ];
    expect(drawFigures(fixture('sample').data, registry).map((f) => `${f.section}:${f.figure.name}`)).toEqual(['s1:a', 's3:a', 's3:b']);
  });
});
