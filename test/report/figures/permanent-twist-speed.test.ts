import { describe, expect, it } from 'vitest';
import { parseCase } from '../../../src/case/parse-case.ts';
import { analyseCase } from '../../../src/results/analyse-case.ts';
import { investigate } from '../../../src/finding/investigate.ts';
import { show } from '../../../src/views/display-units.ts';
import { permanentTwistSpeedFigures } from '../../../src/report/figures/permanent-twist-speed.ts';
import { ep5Case, ep5CaseText } from '../../data/ep5-case.ts';
import { fixture } from '../report-fixtures.ts';
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

  it('judged over the tolerances, the shaded band is the interval of speeds that explain the measured twist', () => {
    const c = parseCase(ep5CaseText({ speed: '300 rpm ± 4 %', observed: ['permanent_twist:', '  - { between: [seized bearing, disc], angle: 1.2 deg }'] }));
    const judged = investigate(c, { samples: 1000 });
    const f = judged.observedFindings.twist[0];
    expect(f.band.basis).toBe('monte-carlo');
    const [fig] = permanentTwistSpeedFigures(judged);
    const marks = [...parseSvg(fig.svg).querySelectorAll('[aria-description]')].map((e) => e.getAttribute('aria-description'));
    expect(marks).toContain('speeds that explain the measured twist');
    expect(marks).not.toContain('recorded speed band');
    expect(fig.caption).toContain(
      `the 5–95 % interval of the speeds that explain the measured twist over the case's tolerances, ${show(f.speedRange[0]!, 'speed', 'metric', 4)} to ${show(f.speedRange[1]!, 'speed', 'metric', 4)}`,
    );
  });

  it('draws nothing for a measured zero where no speed leaves any twist between the stations', () => {
    const r = fixture('exhaust-fan-seized-impeller.yaml').results;
    expect(r.observedFindings.twist[0].measurement.angle).toBe(0);
    expect(r.observedFindings.twist[0].curve.every((p) => p.permanentTwist === 0)).toBe(true);
    expect(permanentTwistSpeedFigures(r)).toEqual([]);
  });
});
