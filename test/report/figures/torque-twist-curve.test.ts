import { describe, expect, it } from 'vitest';
import { analyseCase } from '../../../src/results/analyse-case.ts';
import { torqueTwistFigure } from '../../../src/report/figures/torque-twist-curve.ts';
import { ep5Case } from '../../data/ep5-case.ts';
import { parseSvg } from './parse-svg.ts';

const marks = (root: Element) => [...root.querySelectorAll('[aria-description]')].map((e) => e.getAttribute('aria-description'));

describe('torqueTwistFigure', () => {
  const r = analyseCase(ep5Case());
  const fig = torqueTwistFigure(r)!;

  it('is standalone SVG: an <svg> root with the svg namespace', () => {
    expect(fig.svg.startsWith('<svg')).toBe(true);
    const root = parseSvg(fig.svg);
    expect(root.tagName.toLowerCase()).toBe('svg');
    expect(root.getAttribute('xmlns')).toBe('http://www.w3.org/2000/svg');
  });

  it('draws the loading path, the unloading line, the shaded absorbed energy and the permanent twist', () => {
    const m = marks(parseSvg(fig.svg));
    for (const name of ['absorbed energy', 'loading path', 'unloading line', 'peak', 'permanent twist', 'fully plastic torque']) expect(m).toContain(name);
    const root = parseSvg(fig.svg);
    const line = root.querySelector('[aria-description="loading path"] path');
    expect(line?.getAttribute('d')).toMatch(/^M[\d.]+,[\d.]+(L[\d.]+,[\d.]+)+$/);
    expect(root.querySelector('[aria-description="absorbed energy"] path')).not.toBeNull();
  });

  it('names the numbers it shows from the results: peak torque, permanent twist and absorbed energy', () => {
    const side = r.plastic.sides[0];
    const piece = side.pieces[r.plastic.mostStrained.index];
    expect(fig.name).toBe('torque-twist');
    expect(fig.caption).toContain(`${Number(side.peakTorque.toPrecision(3))} N·m`);
    expect(fig.caption).toContain(`${Number(((piece.state.permanentTwist * 180) / Math.PI).toPrecision(3))}°`);
    expect(fig.caption).toContain(`${Number(piece.state.energy.toPrecision(3))} J`);
    expect(fig.svg).toContain(`permanent twist ${Number(((piece.state.permanentTwist * 180) / Math.PI).toPrecision(3))}°`);
  });

  it('torqueTwistFigure draws nothing for an elastic stop (a straight line, no permanent twist)', () => {
    const slow = analyseCase(ep5Case({ speed: '20 rpm' }));
    expect(slow.plastic.verdict).toBe('elastic');
    expect(torqueTwistFigure(slow)).toBeUndefined();
  });

  it("draws in the case's units (US: lbf·ft)", () => {
    const us = analyseCase({ ...ep5Case(), units: 'us' });
    expect(torqueTwistFigure(us)!.svg).toMatch(/torque \(lbf·ft\)/);
  });
});
