import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../../src/case/parse-case.ts';
import { dynamicModesFigure } from '../../../src/report/figures/dynamic-modes.ts';
import { dynamicSpeedsFigure } from '../../../src/report/figures/dynamic-speeds.ts';
import { dynamicTorqueFigure } from '../../../src/report/figures/dynamic-torque.ts';
import { analyseCase } from '../../../src/results/analyse-case.ts';
import { withFinding } from '../../../src/finding/investigation.ts';

const r = withFinding(analyseCase(parseCase(readFileSync(new URL('../../../sample-cases/roll-line-limiter-two-sides.yaml', import.meta.url), 'utf8'))));

describe("the dynamic model's figures", () => {
  it.each([
    ['dynamic-torque', dynamicTorqueFigure],
    ['dynamic-speeds', dynamicSpeedsFigure],
    ['dynamic-modes', dynamicModesFigure],
  ] as const)('%s is standalone SVG with its title, caption and a legend drawn as text', (name, figure) => {
    const f = figure(r);
    expect(f.name).toBe(name);
    expect(f.title.length).toBeGreaterThan(10);
    expect(f.caption.length).toBeGreaterThan(20);
    expect(f.svg).toMatch(/^<svg xmlns="http:\/\/www\.w3\.org\/2000\/svg"/);
    expect(f.svg).toMatch(/<path/);
    expect(f.svg).not.toMatch(/<figure|<div/);
    expect(f.svg).toContain('— ');
  });
});
