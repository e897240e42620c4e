import { readFileSync } from 'node:fs';
import { DOMParser } from 'linkedom';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../../src/case/parse-case.ts';
import { analyseCase } from '../../../src/results/analyse-case.ts';
import { resizeCase } from '../../../src/resize/resize-case.ts';
import { peakTorqueAgainstLimiterFigure } from '../../../src/report/figures/peak-torque-vs-limiter.ts';
import { yieldRatioAgainstDiameterFigure } from '../../../src/report/figures/yield-ratio-vs-diameter.ts';
import { withFinding } from '../../../src/finding/investigation.ts';

const load = (f: string, edit = (t: string) => t) => {
  const c = parseCase(edit(readFileSync(new URL(`../../../sample-cases/${f}`, import.meta.url), 'utf8')));
  const r = withFinding(analyseCase(c));
  return { r, z: resizeCase(c, r) };
};
const figures = [yieldRatioAgainstDiameterFigure, peakTorqueAgainstLimiterFigure];

describe('the resize figures', () => {
  it.each(['granulator-tramp-metal.yaml', 'screw-conveyor-jam-us.yaml', 'edger-arbor-two-sides.yaml'])('%s: standalone SVG with its namespace, name, title and caption', (f) => {
    const { r, z } = load(f);
    for (const draw of figures) {
      const fig = draw(r, z)!;
      expect(fig.name).toMatch(/^resize-[a-z-]+$/);
      expect(fig.title.length).toBeGreaterThan(10);
      expect(fig.caption).toMatch(/energy method/);
      expect(fig.svg.startsWith('<svg')).toBe(true);
      expect(fig.svg).toContain('xmlns="http://www.w3.org/2000/svg"');
      const doc = new DOMParser().parseFromString(fig.svg, 'image/svg+xml');
      expect(doc.querySelectorAll('path').length).toBeGreaterThan(0);
    }
  });

  it("the yield-ratio figure marks every stock size in its range and the design factor's line", () => {
    const { r, z } = load('screw-conveyor-jam-us.yaml');
    const fig = yieldRatioAgainstDiameterFigure(r, z)!;
    expect(fig.svg).toContain('1/N = 0.667 (N = 1.5)');
    expect(fig.svg).toContain('present');
    expect(fig.caption).toContain(z.stockSeries);
    expect(z.criticalSegment.stockSizes.length).toBeGreaterThan(5);
  });

  it('the limiter figure says when the window is empty', () => {
    const { r, z } = load('screw-conveyor-jam-us.yaml', (t) => t.replace('drive: { power: 15 hp }', 'drive: { running_torque: 4000 lbf*ft }'));
    expect(z.limiter.windowEmpty).toBe(true);
    const fig = peakTorqueAgainstLimiterFigure(r, z)!;
    expect(fig.caption).toMatch(/the window is empty/);
    expect(fig.svg).toContain('window empty');
  });

  it("the case's own text in a figure is escaped as SVG text", () => {
    const { r, z } = load('granulator-tramp-metal.yaml', (t) => t.replace('label: sheave seat', 'label: "seat <&> 1"'));
    const fig = yieldRatioAgainstDiameterFigure(r, z)!;
    expect(fig.svg).toContain('seat &lt;&amp;&gt; 1');
    expect(fig.svg).not.toContain('seat <&> 1');
  });
});
