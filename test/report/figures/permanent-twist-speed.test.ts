import { describe, expect, it } from 'vitest';
import { analyseCase } from '../../../src/results/analyse-case.ts';
import { permanentTwistSpeedFigures } from '../../../src/report/figures/permanent-twist-speed.ts';
import { ep5Case } from '../../data/ep5-case.ts';
import { parseSvg } from './parse-svg.ts';

describe('permanentTwistSpeedFigures', () => {
  const r = analyseCase(ep5Case({ observed: ['permanent_twist:', '  - { between: [seized bearing, disc], angle: 1.2 deg }'] }));
  const figs = permanentTwistSpeedFigures(r);

  it('draws one standalone SVG per measured twist', () => {
    expect(figs).toHaveLength(1);
    const root = parseSvg(figs[0].svg);
    expect(root.tagName.toLowerCase()).toBe('svg');
    expect(root.getAttribute('xmlns')).toBe('http://www.w3.org/2000/svg');
    expect(figs[0].name).toBe('permanent-twist-speed-1');
  });

  it('marks the curve, the recorded speed and its band, the measured twist and the speed read off the graph', () => {
    const root = parseSvg(figs[0].svg);
    const m = [...root.querySelectorAll('[aria-description]')].map((e) => e.getAttribute('aria-description'));
    for (const name of ['permanent twist against speed', 'recorded speed', 'recorded speed band', 'measured twist', 'speed for measured twist point']) expect(m).toContain(name);
    const speedRpm = (r.observedFindings.twist[0].speedForMeasured! * 60) / (2 * Math.PI);
    expect(figs[0].caption).toContain(`${Number(speedRpm.toPrecision(4))} rpm`);
    expect(figs[0].svg).toContain('measured 1.2°');
  });

  it('draws nothing for a measurement with no loaded shaft between its stations', () => {
    const none = analyseCase(
      ep5Case({
        segments: ['- { length: 500 mm, diameter: 40 mm }', '- { length: 200 mm, diameter: 40 mm }'],
        stations: ['- { name: coupling, at: 700 mm }'],
        observed: ['permanent_twist:', '  - { between: [disc, coupling], angle: 2 deg }'],
      }),
    );
    expect(permanentTwistSpeedFigures(none)).toEqual([]);
  });
});
